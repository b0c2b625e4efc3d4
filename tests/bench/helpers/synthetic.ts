import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import type { Cable, Device, Network, Port, Topology } from '@/shared/topology/schema';

/**
 * Synthetic designs for the benchmark: two fabrics, each a ring of 56-port edge switches (44 host
 * ports, two ring ports, the rest for controllers); four arrays of two controllers, each controller with two ports
 * per fabric cabled at points spread around the ring; hosts with two dual-port cards, port 1 of
 * card 1 on fabric A and port 1 of card 2 on fabric B; every 250th host single-homed (fabric A
 * only) so the report has single points of failure to find. Addresses from RFC 3849 (IPv6
 * documentation prefix), because 20,000 hosts do not fit an IPv4 documentation /24.
 */
const HOSTS_PER_SWITCH = 44;
const ARRAYS = 4;
const SINGLE_HOMED_EVERY = 250;

function port(id: string, extra: Partial<Port> = {}): Port {
  return { id, name: id.slice(id.lastIndexOf('.') + 1), role: 'data', speedGbps: 10, connector: 'rj45', ...extra };
}

export function syntheticDesign(hostCount: number): Topology {
  const fabrics = ['a', 'b'] as const;
  const ringSize = Math.max(3, Math.ceil(hostCount / HOSTS_PER_SWITCH));
  const networks: Network[] = fabrics.map((f) => ({ id: `net-${f}`, name: `fabric ${f}`, purpose: 'data', cidr: `2001:db8:${f}::/64`, vlan: f === 'a' ? 110 : 120, mtu: 9000 }));
  const devices: Device[] = [];
  const cables: Cable[] = [];
  const nextPort = new Map<string, number>();
  const switchPort = (sw: string) => {
    const n = (nextPort.get(sw) ?? 0) + 1;
    nextPort.set(sw, n);
    return `${sw}.p${n}`;
  };
  const addressOf = (f: string, n: number) => ({ mode: 'static' as const, ip: `2001:db8:${f}::${(n + 1).toString(16)}` });
  let addressCount = 0;
  const cable = (a: string, b: string) => cables.push({ id: `k${cables.length + 1}`, label: `K-${cables.length + 1}`, a, b, media: 'cat6a', lengthM: 3 });

  for (let k = 0; k < ARRAYS; k += 1) {
    const controllers = ['ctl-a', 'ctl-b'].map((c) => ({
      id: `array-${k}.${c}`,
      name: c,
      ports: [0, 1, 2, 3].map((p) => port(`array-${k}.${c}.p${p + 1}`, { networkId: `net-${fabrics[p % 2]}`, address: addressOf(fabrics[p % 2], addressCount++) })),
    }));
    devices.push({ id: `array-${k}`, kind: 'array', name: `array-${k}`, controllers });
  }
  for (const f of fabrics) {
    for (let s = 0; s < ringSize; s += 1) {
      const id = `edge-${f}-${s}`;
      devices.push({ id, kind: 'switch', name: id, role: 'data', ports: Array.from({ length: 56 }, (_, p) => port(`${id}.p${p + 1}`)) });
    }
    for (let s = 0; s < ringSize; s += 1) cable(switchPort(`edge-${f}-${s}`), switchPort(`edge-${f}-${(s + 1) % ringSize}`));
  }
  // Controller ports spread around each ring: 16 attachment points per fabric.
  devices.slice(0, ARRAYS).forEach((array, k) => {
    if (array.kind !== 'array') return;
    array.controllers.forEach((c, ci) =>
      c.ports.forEach((p, pi) => {
        const slot = (k * 4 + ci * 2 + (pi >> 1)) * ringSize;
        cable(p.id, switchPort(`edge-${fabrics[pi % 2]}-${Math.floor(slot / (ARRAYS * 4)) % ringSize}`));
      }),
    );
  });
  for (let h = 0; h < hostCount; h += 1) {
    const id = `host-${h}`;
    const edge = Math.floor(h / HOSTS_PER_SWITCH) % ringSize;
    const adapters = [0, 1].map((c) => ({
      id: `${id}.card-${c + 1}`,
      name: `card-${c + 1}`,
      ports: [port(`${id}.card-${c + 1}.p1`, { networkId: `net-${fabrics[c]}`, address: addressOf(fabrics[c], addressCount++) }), port(`${id}.card-${c + 1}.p2`)],
    }));
    devices.push({ id, kind: 'host', name: id, iqn: `iqn.2026-01.example.bench:${id}`, adapters });
    cable(`${id}.card-1.p1`, switchPort(`edge-a-${edge}`));
    if (h % SINGLE_HOMED_EVERY !== SINGLE_HOMED_EVERY - 1) cable(`${id}.card-2.p1`, switchPort(`edge-b-${edge}`));
  }
  return { format: TOPOLOGY_FORMAT, name: `synthetic ${hostCount}`, devices, cables, networks, security: { chap: 'mutual' } };
}

/**
 * The same design with power (format 2): two feeds, and two PSUs on every device, one on each feed;
 * every 100th host has a single PSU, on feed A, and one switch of each fabric has both PSUs on
 * feed A, so power shows up among the single points of failure and in the after-one exposure.
 */
export function syntheticPoweredDesign(hostCount: number): Topology {
  const doc = syntheticDesign(hostCount);
  doc.powerFeeds = [
    { id: 'feed-a', name: 'Feed A' },
    { id: 'feed-b', name: 'Feed B' },
  ];
  let hosts = 0;
  for (const device of doc.devices) {
    const one = device.kind === 'host' && hosts++ % 100 === 99;
    const shared = device.id === 'edge-a-1' || device.id === 'edge-b-2';
    device.psus = [
      { id: `${device.id}.psu1`, name: 'PSU 1', feedId: 'feed-a' },
      ...(one ? [] : [{ id: `${device.id}.psu2`, name: 'PSU 2', feedId: shared ? 'feed-a' : 'feed-b' }]),
    ];
  }
  return doc;
}
