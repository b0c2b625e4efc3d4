import type { AfterOneResult, HostArrayResult } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';
import { failureUnits, sessionsTable, type Table } from './oracle';
import { mulberry32, randomDesign } from './random-design';

/**
 * The brute-force reference with power, written from docs/topology-format.md (format 2) and docs/api.md and
 * sharing no code with the analysis: a device is down when every PSU it has is down (the PSU failed
 * or its feed failed), and a device that is down takes its ports with it — a switch itself, an array
 * all its controllers, a host all its cards. Single points of failure: fail each unit, search
 * again. After one failure: fail each unit u of the listed kinds, then every other unit, search again.
 */
export function powerUnits(doc: Topology): string[] {
  const units = (doc.powerFeeds ?? []).map((f) => f.id);
  for (const d of doc.devices) for (const p of d.psus ?? []) units.push(p.id);
  return units;
}

export function allUnits(doc: Topology): string[] {
  return [...failureUnits(doc), ...powerUnits(doc)];
}

/** The ids the plain search must treat as failed: the units, and the parts of every unpowered device. */
function expand(doc: Topology, failed: Set<string>): Set<string> {
  const out = new Set(failed);
  for (const d of doc.devices) {
    const psus = d.psus ?? [];
    if (psus.length === 0) continue;
    const up = psus.some((p) => !failed.has(p.id) && !(p.feedId !== undefined && failed.has(p.feedId)));
    if (up) continue;
    if (d.kind === 'switch') out.add(d.id);
    if (d.kind === 'array') for (const c of d.controllers) out.add(c.id);
    if (d.kind === 'host') for (const a of d.adapters) out.add(a.id);
  }
  return out;
}

function table(doc: Topology, failed: Set<string>): Table {
  return sessionsTable(doc, expand(doc, failed));
}

const order = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

export function bruteForcePowerHosts(doc: Topology, failed: string[] = []): HostArrayResult[] {
  const down = new Set(failed);
  const base = table(doc, down);
  const result: HostArrayResult[] = [];
  const units = allUnits(doc).filter((u) => !down.has(u));
  const without = units.map((u) => [u, table(doc, new Set([...down, u]))] as const);
  for (const [host, arrays] of base) {
    for (const [array, entry] of arrays) {
      const spof = without.filter(([, t]) => !t.get(host)?.has(array)).map(([u]) => u).sort(order);
      result.push({
        host,
        array,
        sessions: entry.sessions,
        controllersReached: [...entry.controllers].sort(order),
        singlePointsOfFailure: spof,
        redundant: spof.length === 0,
      });
    }
  }
  return result.sort((x, y) => order(x.host, y.host) || order(x.array, y.array));
}

/** The units docs/api.md lists for `--after-one`: everything not owned by a single host. */
export function sharedUnits(doc: Topology): string[] {
  const hostPorts = new Set<string>();
  const units: string[] = [];
  for (const d of doc.devices) {
    if (d.kind === 'host') for (const a of d.adapters) for (const p of a.ports) hostPorts.add(p.id);
    if (d.kind === 'switch') units.push(d.id);
    if (d.kind === 'array') units.push(...d.controllers.map((c) => c.id));
    if (d.kind !== 'host') units.push(...(d.psus ?? []).map((p) => p.id));
  }
  for (const c of doc.cables) if (!hostPorts.has(c.a) && !hostPorts.has(c.b)) units.push(c.id);
  units.push(...(doc.powerFeeds ?? []).map((f) => f.id));
  return units.sort(order);
}

export function bruteForceAfterOne(doc: Topology): AfterOneResult[] {
  const before = bruteForcePowerHosts(doc);
  return sharedUnits(doc).map((failed) => {
    const after = bruteForcePowerHosts(doc, [failed]);
    const still = new Set(after.map((p) => JSON.stringify([p.host, p.array])));
    return {
      failed,
      exposed: after.filter((p) => !p.redundant).map((p) => ({ host: p.host, array: p.array, singlePointsOfFailure: p.singlePointsOfFailure })),
      cutOff: before.filter((p) => !still.has(JSON.stringify([p.host, p.array]))).map((p) => ({ host: p.host, array: p.array })),
    };
  });
}

/**
 * A random small design with power: zero to three feeds, and on most devices zero to three PSUs, each
 * on a random feed or, now and then, on none — so shared feeds, one-feed devices, unfed PSUs and
 * devices without PSUs all turn up.
 */
export function randomPowerDesign(seed: number): Topology {
  const doc = randomDesign(seed);
  const rnd = mulberry32(seed * 7919 + 17);
  const feedCount = Math.floor(rnd() * 4);
  const feeds = Array.from({ length: feedCount }, (_, i) => ({ id: `f${i}`, name: `feed ${i}` }));
  if (feeds.length > 0) doc.powerFeeds = feeds;
  for (const d of doc.devices) {
    if (rnd() < 0.2) continue;
    const count = Math.floor(rnd() * 4);
    if (count === 0) continue;
    d.psus = Array.from({ length: count }, (_, i) => {
      const feed = feeds.length > 0 && rnd() < 0.9 ? feeds[Math.floor(rnd() * feeds.length)].id : undefined;
      return { id: `${d.id}.ps${i}`, name: `PSU ${i}`, ...(feed === undefined ? {} : { feedId: feed }) };
    });
  }
  return doc;
}
