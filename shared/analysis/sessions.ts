import { dataCables, networksPair, type AnalysisContext, type DataCableEnds, type EndRole } from '@/shared/analysis/context';
import type { PortRef } from '@/shared/topology/index';

/**
 * Session counts: sessions(h, a) is the number of (host data port, controller data port) pairs of
 * host h and array a that a data path joins and whose networks pair (docs/analysis.md).
 *
 * Data paths only ever run through data and shared switches, so two ports are joined exactly when
 * they are cabled to each other (direct attach) or cabled into the same cluster of switches joined
 * by inter-switch cables. Clusters come from a union–find over the switches (path halving); each
 * cluster keeps its controller ports, tallied once per network a host port may have, so a host
 * port with one cable into a cluster costs one look-up per array. A host port with several cables
 * (or a direct cable) is counted pair by pair instead, so that no pair is counted twice.
 */
/** `controllers` holds each controller once; an array has at most four, so a list beats a set. */
export type PairSessions = { sessions: number; controllers: string[] };

/** Host id → array id → sessions and the controllers they reach. */
export type SessionTable = Map<string, Map<string, PairSessions>>;

/** What one host port finds in one cluster, per array: how many controller ports, on which controllers. */
type ArrayTally = { array: string; count: number; controllers: string[] };

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

function addOnce(list: string[], id: string): void {
  if (!list.includes(id)) list.push(id);
}

/** The controller ports of one cluster that a host port on `hostNet` pairs with, tallied per array. */
function tallyFor(ctx: AnalysisContext, ports: Map<string, PortRef>, hostNet: string | undefined): ArrayTally[] {
  const byArray = new Map<string, ArrayTally>();
  for (const cp of ports.values()) {
    if (!networksPair(ctx, hostNet, cp.port.networkId)) continue;
    let tally = byArray.get(cp.device.id);
    if (!tally) byArray.set(cp.device.id, (tally = { array: cp.device.id, count: 0, controllers: [] }));
    tally.count += 1;
    addOnce(tally.controllers, cp.controller!.id);
  }
  return [...byArray.values()];
}

class Table {
  readonly sessions: SessionTable = new Map();
  add(host: string, array: string, count: number, controllers: readonly string[]): void {
    let arrays = this.sessions.get(host);
    if (!arrays) this.sessions.set(host, (arrays = new Map()));
    let pair = arrays.get(array);
    if (!pair) arrays.set(array, (pair = { sessions: 0, controllers: [] }));
    pair.sessions += count;
    for (const c of controllers) addOnce(pair.controllers, c);
  }
}

type EndVisitor = (here: PortRef, role: EndRole, there: PortRef, thereRole: EndRole) => void;

/** Every data cable seen from each of its two ends. */
function forEachEnd(cables: readonly DataCableEnds[], visit: EndVisitor): void {
  for (const ends of cables) {
    visit(ends.a, ends.roleA, ends.b, ends.roleB);
    visit(ends.b, ends.roleB, ends.a, ends.roleA);
  }
}

/** Switch clusters and the controller ports cabled into each, shared by the count and the pairing. */
type Clusters = { clusters: UnionFind; clusterPorts: Map<string, Map<string, PortRef>>; cables: readonly DataCableEnds[] };

function buildClusters(ctx: AnalysisContext): Clusters {
  const clusters = new UnionFind();
  const cables = dataCables(ctx);
  for (const ends of cables) {
    if (ends.roleA === 'switch' && ends.roleB === 'switch') clusters.union(ends.a.device.id, ends.b.device.id);
  }
  const clusterPorts = new Map<string, Map<string, PortRef>>();
  forEachEnd(cables, (here, role, there, thereRole) => {
    if (role !== 'controller' || thereRole !== 'switch') return;
    const cluster = clusters.find(there.device.id);
    let ports = clusterPorts.get(cluster);
    if (!ports) clusterPorts.set(cluster, (ports = new Map()));
    ports.set(here.port.id, here);
  });
  return { clusters, clusterPorts, cables };
}

/** One host data port and the controller data ports it forms a session with, each once. */
export type PortSessions = { hostPort: PortRef; controllerPorts: PortRef[] };

/**
 * The session pairing itself, pair by pair: for every host data port with at least one session,
 * the controller ports it pairs with (first seen first; cluster ports in the order they were
 * cabled). countSessions counts exactly these pairs; the login plan lists them.
 */
export function sessionPairs(ctx: AnalysisContext): PortSessions[] {
  const { clusters, clusterPorts, cables } = buildClusters(ctx);
  const links = new Map<string, { hostPort: PortRef; links: (PortRef | string)[] }>();
  forEachEnd(cables, (here, role, there, thereRole) => {
    if (role !== 'host') return;
    const link = thereRole === 'switch' ? clusters.find(there.device.id) : there;
    const entry = links.get(here.port.id);
    if (entry) entry.links.push(link);
    else links.set(here.port.id, { hostPort: here, links: [link] });
  });
  const out: PortSessions[] = [];
  for (const { hostPort, links: far } of links.values()) {
    const seen = new Set<string>();
    const controllerPorts: PortRef[] = [];
    for (const link of far) {
      const candidates = typeof link === 'string' ? [...(clusterPorts.get(link)?.values() ?? [])] : [link];
      for (const cp of candidates) {
        if (seen.has(cp.port.id)) continue;
        seen.add(cp.port.id);
        if (!networksPair(ctx, hostPort.port.networkId, cp.port.networkId)) continue;
        controllerPorts.push(cp);
      }
    }
    if (controllerPorts.length > 0) out.push({ hostPort, controllerPorts });
  }
  return out;
}

export function countSessions(ctx: AnalysisContext): SessionTable {
  const { clusters, clusterPorts, cables } = buildClusters(ctx);
  const table = new Table();
  // Host ports with a single cable into a cluster, the common case: one tally per (cluster, network).
  const tallies = new Map<string, Map<string | undefined, ArrayTally[]>>();
  // Every other host port: the far ends of its data cables, a controller port or a cluster.
  const several = new Map<string, { hostPort: PortRef; links: (PortRef | string)[] }>();
  forEachEnd(cables, (here, role, there, thereRole) => {
    if (role !== 'host') return;
    const link = thereRole === 'switch' ? clusters.find(there.device.id) : there;
    if (typeof link === 'string' && ctx.index.cablesByPort.get(here.port.id)!.length === 1) {
      const ports = clusterPorts.get(link);
      if (!ports) return;
      let byNetwork = tallies.get(link);
      if (!byNetwork) tallies.set(link, (byNetwork = new Map()));
      const hostNet = ctx.hasNetworks ? here.port.networkId : undefined;
      let list = byNetwork.get(hostNet);
      if (!list) byNetwork.set(hostNet, (list = tallyFor(ctx, ports, hostNet)));
      for (const tally of list) table.add(here.device.id, tally.array, tally.count, tally.controllers);
      return;
    }
    const entry = several.get(here.port.id);
    if (entry) entry.links.push(link);
    else several.set(here.port.id, { hostPort: here, links: [link] });
  });
  for (const { hostPort, links } of several.values()) {
    const seen = new Set<string>();
    for (const link of links) {
      const candidates = typeof link === 'string' ? [...(clusterPorts.get(link)?.values() ?? [])] : [link];
      for (const cp of candidates) {
        if (seen.has(cp.port.id)) continue;
        seen.add(cp.port.id);
        if (!networksPair(ctx, hostPort.port.networkId, cp.port.networkId)) continue;
        table.add(hostPort.device.id, cp.device.id, 1, [cp.controller!.id]);
      }
    }
  }
  return table.sessions;
}
