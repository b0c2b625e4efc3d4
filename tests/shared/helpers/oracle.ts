import type { HostArrayResult } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';

/**
 * The brute-force method the analysis must agree with, written straight from
 * docs/analysis.md and sharing no code with it: count sessions by searching from every host
 * data port, then fail each unit in turn and search everything again. Quadratic on purpose.
 */
type PortInfo = {
  id: string;
  role: string;
  networkId?: string;
  owner: 'host' | 'controller' | 'switch';
  deviceId: string;
  unitId: string; // card, controller or switch the port dies with
  switchRole?: string;
};

function portsOf(doc: Topology): Map<string, PortInfo> {
  const ports = new Map<string, PortInfo>();
  for (const d of doc.devices) {
    if (d.kind === 'array') {
      for (const c of d.controllers) for (const p of c.ports) ports.set(p.id, { ...p, owner: 'controller', deviceId: d.id, unitId: c.id });
    } else if (d.kind === 'host') {
      for (const a of d.adapters) for (const p of a.ports) ports.set(p.id, { ...p, owner: 'host', deviceId: d.id, unitId: a.id });
    } else {
      for (const p of d.ports) ports.set(p.id, { ...p, owner: 'switch', deviceId: d.id, unitId: d.id, switchRole: d.role });
    }
  }
  return ports;
}

/** Host id → array id → sessions: nested Maps, so no id can be mistaken for a pair of others. */
type Entry = { sessions: number; controllers: Set<string> };
export type Table = Map<string, Map<string, Entry>>;

function entryOf(table: Table, host: string, array: string): Entry {
  let arrays = table.get(host);
  if (!arrays) table.set(host, (arrays = new Map()));
  let entry = arrays.get(array);
  if (!entry) arrays.set(array, (entry = { sessions: 0, controllers: new Set() }));
  return entry;
}

export function sessionsTable(doc: Topology, failed: Set<string>): Table {
  const ports = portsOf(doc);
  const alive = (p: PortInfo) => !failed.has(p.unitId);
  const cablesAt = new Map<string, string[]>();
  for (const c of doc.cables) {
    if (failed.has(c.id)) continue;
    cablesAt.set(c.a, [...(cablesAt.get(c.a) ?? []), c.b]);
    cablesAt.set(c.b, [...(cablesAt.get(c.b) ?? []), c.a]);
  }
  const switchPorts = new Map<string, string[]>();
  for (const p of ports.values()) if (p.owner === 'switch') switchPorts.set(p.deviceId, [...(switchPorts.get(p.deviceId) ?? []), p.id]);
  const table: Table = new Map();
  for (const hp of ports.values()) {
    if (hp.owner !== 'host' || hp.role !== 'data' || !alive(hp)) continue;
    // Breadth-first over ports: across cables, and through forwarding switches only.
    const seen = new Set<string>([hp.id]);
    const queue = [hp.id];
    const found = new Set<string>();
    while (queue.length) {
      const at = queue.shift()!;
      for (const far of cablesAt.get(at) ?? []) {
        const q = ports.get(far)!;
        if (!alive(q)) continue;
        if (q.owner === 'controller' && q.role === 'data') found.add(q.id);
        if (q.owner !== 'switch' || q.switchRole === 'management') continue;
        for (const sibling of switchPorts.get(q.deviceId)!) {
          if (!seen.has(sibling)) {
            seen.add(sibling);
            queue.push(sibling);
          }
        }
      }
    }
    for (const cpId of found) {
      const cp = ports.get(cpId)!;
      const pairs = doc.networks.length === 0 || !hp.networkId || !cp.networkId || hp.networkId === cp.networkId;
      if (!pairs) continue;
      const entry = entryOf(table, hp.deviceId, cp.deviceId);
      entry.sessions += 1;
      entry.controllers.add(cp.unitId);
    }
  }
  return table;
}

export function failureUnits(doc: Topology): string[] {
  const units = doc.cables.map((c) => c.id);
  for (const d of doc.devices) {
    if (d.kind === 'switch') units.push(d.id);
    if (d.kind === 'array') units.push(...d.controllers.map((c) => c.id));
    if (d.kind === 'host') units.push(...d.adapters.map((a) => a.id));
  }
  return units;
}

const order = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

export function bruteForceHosts(doc: Topology, failed: string[] = []): HostArrayResult[] {
  const down = new Set(failed);
  const base = sessionsTable(doc, down);
  const spof = new Map<Entry, string[]>();
  for (const unit of failureUnits(doc)) {
    if (down.has(unit)) continue;
    const without = sessionsTable(doc, new Set([...down, unit]));
    for (const [host, arrays] of base) {
      for (const [array, entry] of arrays) {
        if (!without.get(host)?.has(array)) spof.set(entry, [...(spof.get(entry) ?? []), unit]);
      }
    }
  }
  const result: HostArrayResult[] = [];
  for (const [host, arrays] of base) {
    for (const [array, entry] of arrays) {
      const units = (spof.get(entry) ?? []).sort(order);
      result.push({
        host,
        array,
        sessions: entry.sessions,
        controllersReached: [...entry.controllers].sort(order),
        singlePointsOfFailure: units,
        redundant: units.length === 0,
      });
    }
  }
  return result.sort((x, y) => order(x.host, y.host) || order(x.array, y.array));
}
