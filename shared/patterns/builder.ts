import { assignAddresses } from '@/shared/address/assign';
import type { Adapter, Cable, Connector, Controller, Media, Network, Port, PortSpeed, Topology } from '@/shared/topology/schema';
import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import { layoutBands } from '@/shared/layout/bands';
import { emptyRecord } from '@/shared/keys/record';

/**
 * The small document builder the patterns share. Ids are readable and derived from names:
 * `vault-1.ctl-a.p1` is port 1 of controller ctl-a of vault-1, `fab-a.p7` port 7 of switch fab-a,
 * `wms-db-1.card-2.p1` port 1 of a host's second card, and cables are `cable-a-01`, `cable-m-03` by
 * group. Switch ports are taken in order, so the same options always give the same document.
 */
export type PortSpec = { name: string; role: Port['role']; speedGbps: PortSpeed; connector: Connector; networkId?: string };

export class PatternBuilder {
  readonly doc: Topology;
  private nextSwitchPort = new Map<string, number>();
  private cableCount = new Map<string, number>();
  private labelPrefix: string;

  constructor(name: string, labelPrefix = '') {
    this.doc = { format: TOPOLOGY_FORMAT, name, devices: [], cables: [], networks: [], layout: emptyRecord() };
    this.labelPrefix = labelPrefix;
  }

  port(owner: string, spec: PortSpec): Port {
    const port: Port = { id: `${owner}.${spec.name}`, name: spec.name, role: spec.role, speedGbps: spec.speedGbps, connector: spec.connector };
    if (spec.networkId) port.networkId = spec.networkId;
    return port;
  }

  group(owner: string, name: string, ports: PortSpec[]): Controller | Adapter {
    const id = `${owner}.${name}`;
    return { id, name, ports: ports.map((spec) => this.port(id, spec)) };
  }

  network(network: Network): void {
    this.doc.networks.push(network);
  }

  /** An array; with a target name (`iqn`) when the pattern was given an initiator-name prefix. */
  array(id: string, controllers: Controller[], iqn?: string): void {
    this.doc.devices.push({ id, kind: 'array', name: id, controllers, ...(iqn ? { iqn } : {}) });
  }

  switch(id: string, role: 'data' | 'management' | 'shared', count: number, speedGbps: PortSpeed, connector: Connector): void {
    const ports = Array.from({ length: count }, (_, i) => this.port(id, { name: `p${i + 1}`, role: role === 'management' ? 'management' : 'data', speedGbps, connector }));
    this.doc.devices.push({ id, kind: 'switch', name: id, role, ports });
  }

  /**
   * The target name a pattern gives its array: `<iqnPrefix>:storage.<array name>`, the name part
   * folded to the characters iSCSI names allow (RFC 3722 §6: letters, digits, "-", "." and ":").
   */
  static targetName(iqnPrefix: string | undefined, arrayName: string): string | undefined {
    if (!iqnPrefix) return undefined;
    const part = arrayName.toLowerCase().replace(/[^a-z0-9.:-]+/g, '-').replace(/^-+|-+$/g, '') || 'array';
    return `${iqnPrefix}:storage.${part}`;
  }

  host(id: string, adapters: Adapter[], iqn?: string): void {
    this.doc.devices.push({ id, kind: 'host', name: id, ...(iqn ? { iqn } : {}), adapters });
  }

  /** The next free port of a switch. */
  switchPort(switchId: string): string {
    const next = (this.nextSwitchPort.get(switchId) ?? 0) + 1;
    this.nextSwitchPort.set(switchId, next);
    return `${switchId}.p${next}`;
  }

  cable(group: string, a: string, b: string, media: Media, lengthM: number): Cable {
    const n = (this.cableCount.get(group) ?? 0) + 1;
    this.cableCount.set(group, n);
    const number = String(n).padStart(2, '0');
    const label = `${this.labelPrefix}${group.toUpperCase()}-${number}`;
    const cable: Cable = { id: `cable-${group}-${number}`, label, a, b, media, lengthM };
    this.doc.cables.push(cable);
    return cable;
  }

  /** Lay the devices out in bands, top first, by their drawn sizes (shared/layout/bands.ts). */
  arrange(bands: string[][]): void {
    const byId = new Map(this.doc.devices.map((device) => [device.id, device]));
    this.doc.layout = layoutBands(bands.map((band) => band.map((id) => byId.get(id)!)));
  }

  /** Static addresses for every port on a network, lowest first, in document order (arrays first). */
  assignAddresses(): void {
    for (const network of this.doc.networks) {
      const ports: Port[] = [];
      for (const device of this.doc.devices) {
        const groups = device.kind === 'array' ? device.controllers : device.kind === 'host' ? device.adapters : [];
        for (const group of groups) for (const port of group.ports) if (port.networkId === network.id) ports.push(port);
      }
      const ips = assignAddresses(network.cidr, ports.length, [], { gateway: network.gateway });
      ports.forEach((port, i) => {
        if (ips[i]) port.address = { mode: 'static', ip: ips[i] };
      });
    }
  }
}

/** Switch sizes as sold: the smallest of 12, 24 or 48 ports that fits, else a multiple of 48. */
export function switchSize(needed: number): number {
  for (const size of [12, 24, 48]) if (needed <= size) return size;
  return Math.ceil(needed / 48) * 48;
}
