import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import type { Topology } from '@/shared/topology/schema';
import { iteratePorts } from '@/shared/topology';

/**
 * "bay": one array store-1 (id arr-1) with two controllers, two data switches, one host with two cards.
 *
 *   srv-1 ==card-1 p1== sw-a == ctl-a p1, ctl-b p1   (fabric A, 198.51.100.0/24)
 *   srv-1 ==card-2 p1== sw-b == ctl-a p2, ctl-b p2   (fabric B, 203.0.113.0/24)
 *
 * Addresses from RFC 5737; VLAN 110/120 and MTU 9000 as common practice for storage fabrics.
 */
export function bay(): Topology {
  const port = (id: string, networkId?: string, ip?: string) => ({
    id,
    name: id.slice(id.lastIndexOf('.') + 1),
    role: 'data' as const,
    speedGbps: 10 as const,
    connector: 'rj45' as const,
    ...(networkId ? { networkId } : {}),
    ...(ip ? { address: { mode: 'static' as const, ip } } : {}),
  });
  const switchPorts = (sw: string) => [1, 2, 3, 4].map((n) => port(`${sw}.p${n}`));
  const cable = (id: string, a: string, b: string, lengthM: number) => ({ id, label: `BAY-${id}`, a, b, media: 'cat6a' as const, lengthM });
  return {
    format: TOPOLOGY_FORMAT,
    name: 'Bay storage',
    racks: [{ id: 'rk-r1', name: 'R1', row: 'A', position: 1 }],
    devices: [
      {
        id: 'arr-1',
        kind: 'array',
        name: 'store-1',
        placement: { rackId: 'rk-r1', ru: 20 },
        controllers: [
          { id: 'arr-1.ctl-a', name: 'ctl-a', ports: [port('arr-1.ctl-a.p1', 'net-a', '198.51.100.1'), port('arr-1.ctl-a.p2', 'net-b', '203.0.113.1')] },
          { id: 'arr-1.ctl-b', name: 'ctl-b', ports: [port('arr-1.ctl-b.p1', 'net-a', '198.51.100.2'), port('arr-1.ctl-b.p2', 'net-b', '203.0.113.2')] },
        ],
      },
      { id: 'sw-a', kind: 'switch', name: 'sw-a', role: 'data', ports: switchPorts('sw-a') },
      { id: 'sw-b', kind: 'switch', name: 'sw-b', role: 'data', ports: switchPorts('sw-b') },
      {
        id: 'srv-1',
        kind: 'host',
        name: 'srv-1',
        iqn: 'iqn.2026-01.example.bay:srv-1',
        adapters: [
          { id: 'srv-1.card-1', name: 'card-1', ports: [port('srv-1.card-1.p1', 'net-a', '198.51.100.21'), port('srv-1.card-1.p2')] },
          { id: 'srv-1.card-2', name: 'card-2', ports: [port('srv-1.card-2.p1', 'net-b', '203.0.113.21')] },
        ],
      },
    ],
    cables: [
      cable('c-1', 'srv-1.card-1.p1', 'sw-a.p1', 5),
      cable('c-2', 'srv-1.card-2.p1', 'sw-b.p1', 5),
      cable('c-3', 'arr-1.ctl-a.p1', 'sw-a.p2', 3),
      cable('c-4', 'arr-1.ctl-b.p1', 'sw-a.p3', 3),
      cable('c-5', 'arr-1.ctl-a.p2', 'sw-b.p2', 3),
      cable('c-6', 'arr-1.ctl-b.p2', 'sw-b.p3', 3),
    ],
    networks: [
      { id: 'net-a', name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/24', vlan: 110, mtu: 9000 },
      { id: 'net-b', name: 'fabric B', purpose: 'data', cidr: '203.0.113.0/24', vlan: 120, mtu: 9000 },
    ],
    security: { chap: 'one-way' },
    layout: { 'arr-1': { x: 300, y: 40 }, 'sw-a': { x: 200, y: 280 }, 'sw-b': { x: 400, y: 280 }, 'srv-1': { x: 300, y: 520 } },
  };
}

/** A copy of `doc` changed by `change`; the original is left alone. */
export function edited(doc: Topology, change: (copy: Topology) => void): Topology {
  const copy = structuredClone(doc);
  change(copy);
  return copy;
}

export function portOf(doc: Topology, id: string) {
  for (const ref of iteratePorts(doc)) if (ref.port.id === id) return ref.port;
  throw new Error(`no port ${id}`);
}

export function deviceOf(doc: Topology, id: string) {
  const device = doc.devices.find((d) => d.id === id);
  if (!device) throw new Error(`no device ${id}`);
  return device;
}

export function cableOf(doc: Topology, id: string) {
  const cable = doc.cables.find((c) => c.id === id);
  if (!cable) throw new Error(`no cable ${id}`);
  return cable;
}
