import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import type { Cable, Device, Network, Port, Topology } from '@/shared/topology/schema';

/**
 * Seeded random designs for the oracle comparison: small enough for the brute-force method,
 * varied enough to hit every corner of the data-path rules — arrays of one to four controllers,
 * switches of all three roles, inter-switch links and loops, direct attach, management ports,
 * ports with and without networks, data ports on management networks, documents without networks,
 * static and DHCP addresses, ports cabled twice, and cables that go nowhere useful. The oracle test
 * counts how often each of these turns up, so a change here cannot quietly thin them out.
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function randomDesign(seed: number): Topology {
  const rnd = mulberry32(seed);
  const int = (lo: number, hi: number) => lo + Math.floor(rnd() * (hi - lo + 1));
  const pick = <T>(items: readonly T[]): T => items[Math.floor(rnd() * items.length)];
  const networks: Network[] = [];
  const networkCount = pick([0, 1, 2, 2, 3]);
  for (let n = 0; n < networkCount; n += 1) {
    // Now and then a management network, which data ports may land on by mistake: pairing goes by
    // networkId alone, whatever the network's purpose.
    const purpose = n > 0 && rnd() < 0.3 ? 'management' : 'data';
    networks.push({ id: `n${n}`, name: `net ${n}`, purpose, cidr: `198.51.${100 + n}.0/24` });
  }
  const noNetwork = rnd() < 0.25;
  const address = (): Pick<Port, 'address'> => {
    const r = rnd();
    if (r < 0.2) return { address: { mode: 'dhcp' } };
    return r < 0.6 ? { address: { mode: 'static', ip: `198.51.100.${1 + Math.floor(rnd() * 250)}` } } : {};
  };
  const port = (id: string, forSwitch = false): Port => ({
    id,
    name: id,
    role: forSwitch || rnd() < 0.85 ? 'data' : 'management',
    speedGbps: 10,
    connector: 'rj45',
    ...(!forSwitch && networks.length > 0 && !(noNetwork && rnd() < 0.5) ? { networkId: pick(networks).id } : {}),
    ...(forSwitch ? {} : address()),
  });
  const devices: Device[] = [];
  const hostPorts: string[] = [];
  const controllerPorts: string[] = [];
  const switchPorts: string[] = [];
  for (let a = 0; a < int(1, 2); a += 1) {
    const controllers = Array.from({ length: int(1, 4) }, (_, c) => ({
      id: `a${a}c${c}`,
      name: `ctl ${c}`,
      ports: Array.from({ length: int(1, 3) }, (_, p) => port(`a${a}c${c}p${p}`)),
    }));
    controllers.forEach((c) => controllerPorts.push(...c.ports.map((p) => p.id)));
    devices.push({ id: `a${a}`, kind: 'array', name: `array ${a}`, controllers });
  }
  for (let s = 0; s < int(0, 4); s += 1) {
    const ports = Array.from({ length: 8 }, (_, p) => port(`s${s}p${p}`, true));
    switchPorts.push(...ports.map((p) => p.id));
    devices.push({ id: `s${s}`, kind: 'switch', name: `sw ${s}`, role: pick(['data', 'data', 'data', 'shared', 'management'] as const), ports });
  }
  for (let h = 0; h < int(1, 5); h += 1) {
    const adapters = Array.from({ length: int(1, 3) }, (_, c) => ({
      id: `h${h}c${c}`,
      name: `card ${c}`,
      ports: Array.from({ length: int(1, 2) }, (_, p) => port(`h${h}c${c}p${p}`)),
    }));
    adapters.forEach((c) => hostPorts.push(...c.ports.map((p) => p.id)));
    devices.push({ id: `h${h}`, kind: 'host', name: `host ${h}`, adapters });
  }
  const all = [...hostPorts, ...controllerPorts, ...switchPorts];
  const cables: Cable[] = [];
  const used = new Set<string>();
  const free = (list: string[]) => {
    const open = list.filter((p) => !used.has(p) || rnd() < 0.05); // now and then a port is cabled twice
    return open.length ? pick(open) : pick(list);
  };
  // Half the designs start from a tidy shape (every card and controller on a switch, spread over
  // the switches) so that redundant pairs are common too; random cables then disturb it.
  if (switchPorts.length > 0 && rnd() < 0.5) structuredCables(devices, cables, used, int);
  const cableCount = int(2, 14);
  const first = cables.length;
  for (let k = first; k < first + cableCount; k += 1) {
    const shape = rnd();
    const [x, y] =
      switchPorts.length === 0 || shape < 0.12
        ? [hostPorts, controllerPorts]
        : shape < 0.5
          ? [hostPorts, switchPorts]
          : shape < 0.75
            ? [controllerPorts, switchPorts]
            : shape < 0.92
              ? [switchPorts, switchPorts]
              : [all, all];
    const a = free(x);
    const b = free(y);
    if (a === b) continue;
    used.add(a);
    used.add(b);
    cables.push({ id: `k${k}`, a, b, media: 'cat6a' });
  }
  return { format: TOPOLOGY_FORMAT, name: `random ${seed}`, devices, cables, networks };
}

function structuredCables(devices: Device[], cables: Cable[], used: Set<string>, int: (lo: number, hi: number) => number) {
  const switches = devices.filter((d) => d.kind === 'switch');
  const nextPort = new Map<string, number>();
  const plug = (portId: string, index: number) => {
    const sw = switches[index % switches.length];
    const slot = nextPort.get(sw.id) ?? 0;
    if (slot >= sw.ports.length) return;
    nextPort.set(sw.id, slot + 1);
    const target = sw.ports[slot].id;
    used.add(portId);
    used.add(target);
    cables.push({ id: `t${cables.length}`, a: portId, b: target, media: 'cat6a' });
  };
  const offset = int(0, 3);
  for (const d of devices) {
    if (d.kind === 'host') d.adapters.forEach((a, i) => plug(a.ports[0].id, i + offset));
    if (d.kind === 'array') d.controllers.forEach((c, i) => c.ports.forEach((p, j) => plug(p.id, i + j)));
  }
}

/** A few units of the design to fail for a what-if comparison. */
export function randomFailures(doc: Topology, seed: number, units: string[]): string[] {
  const rnd = mulberry32(seed ^ 0x5bd1e995);
  return units.filter(() => rnd() < 0.12).slice(0, 3);
}
