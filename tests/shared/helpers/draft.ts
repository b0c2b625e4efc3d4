import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import type { Cable, Device, HostDevice, Media, Network, Port, Rack, SwitchDevice, Topology } from '@/shared/topology/schema';

/**
 * A small builder for the named test topologies. Ids follow one readable scheme:
 * array `v`, controllers `v.a`/`v.b`, their ports `v.a.1`; switch `fa`, its ports `fa.1`;
 * host `h1`, cards `h1.c1`, their ports `h1.c1.1`; cables `k1`, `k2`… in the order made.
 */
type PortOptions = Partial<Pick<Port, 'role' | 'networkId' | 'address' | 'speedGbps' | 'connector'>>;

export class Draft {
  readonly doc: Topology = { format: TOPOLOGY_FORMAT, name: 'test design', devices: [], cables: [], networks: [] };
  private nextSwitchPort = new Map<string, number>();

  private makePort(id: string, options: PortOptions = {}): Port {
    return { id, name: id.split('.').pop()!, role: 'data', speedGbps: 10, connector: 'rj45', ...options };
  }

  network(id: string, cidr: string, extra: Partial<Network> = {}): this {
    this.doc.networks.push({ id, name: id, purpose: 'data', cidr, ...extra });
    return this;
  }

  /** `controllers`: controller suffix → number of data ports (or explicit port options). */
  array(id: string, controllers: Record<string, number | PortOptions[]>): this {
    this.doc.devices.push({
      id,
      kind: 'array',
      name: id,
      controllers: Object.entries(controllers).map(([c, ports]) => ({
        id: `${id}.${c}`,
        name: c,
        ports: (typeof ports === 'number' ? Array.from({ length: ports }, () => ({})) : ports).map((o, i) =>
          this.makePort(`${id}.${c}.${i + 1}`, o),
        ),
      })),
    });
    return this;
  }

  switch(id: string, role: SwitchDevice['role'] = 'data', ports = 12): this {
    this.doc.devices.push({
      id,
      kind: 'switch',
      name: id,
      role,
      ports: Array.from({ length: ports }, (_, i) => this.makePort(`${id}.${i + 1}`)),
    });
    return this;
  }

  /** `cards`: card suffix → number of data ports (or explicit port options). */
  host(id: string, cards: Record<string, number | PortOptions[]>, extra: Partial<HostDevice> = {}): this {
    this.doc.devices.push({
      id,
      kind: 'host',
      name: id,
      adapters: Object.entries(cards).map(([c, ports]) => ({
        id: `${id}.${c}`,
        name: c,
        ports: (typeof ports === 'number' ? Array.from({ length: ports }, () => ({})) : ports).map((o, i) =>
          this.makePort(`${id}.${c}.${i + 1}`, o),
        ),
      })),
      ...extra,
    });
    return this;
  }

  /** A rack of the room (format 2); 42U unless told. */
  rack(id: string, extra: Partial<Rack> = {}): this {
    (this.doc.racks ??= []).push({ id, name: id, ...extra });
    return this;
  }

  /** Put a device into a rack at its lowest unit `ru` (EIA-310 units from the bottom). */
  place(deviceId: string, rackId: string, ru: number, heightU?: number): this {
    this.device(deviceId).placement = { rackId, ru, ...(heightU === undefined ? {} : { heightU }) };
    return this;
  }

  /** A power feed of the room (format 2). */
  feed(id: string): this {
    (this.doc.powerFeeds ??= []).push({ id, name: id });
    return this;
  }

  /** Give a device PSUs `<device>.psu1`, `.psu2`… on these feeds (undefined: on no feed). */
  psus(deviceId: string, feeds: (string | undefined)[]): this {
    this.device(deviceId).psus = feeds.map((feedId, i) => ({ id: `${deviceId}.psu${i + 1}`, name: `PSU ${i + 1}`, ...(feedId === undefined ? {} : { feedId }) }));
    return this;
  }

  /** Cable two ports; a switch id as `b` takes that switch's next free port. */
  link(a: string, b: string, extra: Partial<Cable> = {}): this {
    const cable: Cable = { id: `k${this.doc.cables.length + 1}`, a: this.resolve(a), b: this.resolve(b), media: 'cat6a', lengthM: 3, ...extra };
    this.doc.cables.push(cable);
    return this;
  }

  private resolve(end: string): string {
    const device = this.doc.devices.find((d) => d.id === end);
    if (device?.kind !== 'switch') return end;
    const next = (this.nextSwitchPort.get(end) ?? 0) + 1;
    this.nextSwitchPort.set(end, next);
    return `${end}.${next}`;
  }

  port(id: string): Port {
    for (const d of this.doc.devices) {
      const groups: { ports: Port[] }[] = d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : [d];
      for (const g of groups) for (const p of g.ports) if (p.id === id) return p;
    }
    throw new Error(`no port ${id}`);
  }

  device(id: string): Device {
    const found = this.doc.devices.find((d) => d.id === id);
    if (!found) throw new Error(`no device ${id}`);
    return found;
  }

  media(cableId: string, media: Media, lengthM?: number): this {
    const cable = this.doc.cables.find((c) => c.id === cableId)!;
    cable.media = media;
    if (lengthM === undefined) delete cable.lengthM;
    else cable.lengthM = lengthM;
    return this;
  }

  build(): Topology {
    return JSON.parse(JSON.stringify(this.doc)) as Topology;
  }
}
