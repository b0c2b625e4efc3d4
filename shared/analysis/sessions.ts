import { dataCables, networksPair, type AnalysisContext } from '@/shared/analysis/context';
import type { PortRef } from '@/shared/topology/index';

/**
 * Session counts: sessions(h, a) is the number of (host data port, controller data port) pairs of
 * host h and array a that a data path joins and whose networks pair (resilience-analysis.md).
 *
 * Data paths only ever run through data and shared switches, so two ports are joined exactly when
 * they are cabled to each other (direct attach) or cabled into the same cluster of switches joined
 * by inter-switch cables. Clusters come from a union–find over the switches (path halving); each
 * cluster keeps its controller ports, counted per array and network once, so a host port cabled
 * into one cluster costs one look-up per array. A host port with several cables (or a direct
 * cable) is counted pair by pair instead, so that no pair is counted twice.
 */
/** `controllers` holds each controller once; an array has at most four, so a list beats a set. */
export type PairSessions = { sessions: number; controllers: string[] };

/** Host id → array id → sessions and the controllers they reach. */
export type SessionTable = Map<string, Map<string, PairSessions>>;

type Tally = { count: number; controllers: string[] };
/** array id → network id ('' for none) → how many controller ports, on which controllers. */
type ClusterSummary = Map<string, Map<string, Tally>>;

class UnionFind {
  private parent = new Map<string, string>();
  find(x: string): string {
    let node = x;
    for (let up = this.parent.get(node); up !== undefined && up !== node; up = this.parent.get(node)) {
      const grand = this.parent.get(up) ?? up;
      this.parent.set(node, grand);
      node = grand;
    }
    return node;
  }
  union(a: string, b: string): void {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra !== rb) this.parent.set(ra, rb);
  }
}

function push<T>(map: Map<string, T[]>, key: string, value: T): void {
  const list = map.get(key);
  if (list) list.push(value);
  else map.set(key, [value]);
}

function summarise(ports: Map<string, PortRef>): ClusterSummary {
  const summary: ClusterSummary = new Map();
  for (const cp of ports.values()) {
    let byNetwork = summary.get(cp.device.id);
    if (!byNetwork) summary.set(cp.device.id, (byNetwork = new Map()));
    const key = cp.port.networkId ?? '';
    let tally = byNetwork.get(key);
    if (!tally) byNetwork.set(key, (tally = { count: 0, controllers: [] }));
    tally.count += 1;
    addOnce(tally.controllers, cp.controller!.id);
  }
  return summary;
}

function pairEntry(table: SessionTable, host: string, array: string): PairSessions {
  let arrays = table.get(host);
  if (!arrays) table.set(host, (arrays = new Map()));
  let pair = arrays.get(array);
  if (!pair) arrays.set(array, (pair = { sessions: 0, controllers: [] }));
  return pair;
}

function addOnce(list: string[], id: string): void {
  if (!list.includes(id)) list.push(id);
}

export function countSessions(ctx: AnalysisContext): SessionTable {
  const clusters = new UnionFind();
  const cables = dataCables(ctx);
  for (const ends of cables) {
    if (ends.roleA === 'switch' && ends.roleB === 'switch') clusters.union(ends.a.device.id, ends.b.device.id);
  }
  const clusterPorts = new Map<string, Map<string, PortRef>>();
  // For a host port: the far ends of its cables, a controller port or the cluster of a switch.
  const hostLinks = new Map<string, { hostPort: PortRef; links: (PortRef | string)[] }>();
  for (const ends of cables) {
    for (const [here, role, there, thereRole] of [
      [ends.a, ends.roleA, ends.b, ends.roleB],
      [ends.b, ends.roleB, ends.a, ends.roleA],
    ] as const) {
      if (role === 'controller' && thereRole === 'switch') {
        const cluster = clusters.find(there.device.id);
        if (!clusterPorts.has(cluster)) clusterPorts.set(cluster, new Map());
        clusterPorts.get(cluster)!.set(here.port.id, here);
      }
      if (role === 'host') {
        const entry = hostLinks.get(here.port.id) ?? { hostPort: here, links: [] };
        entry.links.push(thereRole === 'switch' ? clusters.find(there.device.id) : there);
        hostLinks.set(here.port.id, entry);
      }
    }
  }
  const summaries = new Map<string, ClusterSummary>();
  const table: SessionTable = new Map();
  for (const { hostPort, links } of hostLinks.values()) {
    const host = hostPort.device.id;
    const only = links.length === 1 ? links[0] : undefined;
    if (typeof only === 'string') {
      const ports = clusterPorts.get(only);
      if (!ports) continue;
      let summary = summaries.get(only);
      if (!summary) summaries.set(only, (summary = summarise(ports)));
      const net = ctx.hasNetworks ? hostPort.port.networkId : undefined;
      for (const [array, byNetwork] of summary) {
        for (const [key, tally] of byNetwork) {
          if (net !== undefined && key !== '' && key !== net) continue;
          const pair = pairEntry(table, host, array);
          pair.sessions += tally.count;
          for (const c of tally.controllers) addOnce(pair.controllers, c);
        }
      }
      continue;
    }
    const seen = new Set<string>();
    for (const link of links) {
      const candidates = typeof link === 'string' ? [...(clusterPorts.get(link)?.values() ?? [])] : [link];
      for (const cp of candidates) {
        if (seen.has(cp.port.id)) continue;
        seen.add(cp.port.id);
        if (!networksPair(ctx, hostPort.port.networkId, cp.port.networkId)) continue;
        const pair = pairEntry(table, host, cp.device.id);
        pair.sessions += 1;
        addOnce(pair.controllers, cp.controller!.id);
      }
    }
  }
  return table;
}
