import { dataCable, networksPair, type AnalysisContext } from '@/shared/analysis/context';
import type { PortRef } from '@/shared/topology/index';

/**
 * Session counts: sessions(h, a) is the number of (host data port, controller data port) pairs of
 * host h and array a that a data path joins and whose networks pair (resilience-analysis.md).
 *
 * Data paths only ever run through data and shared switches, so two ports are joined exactly when
 * they are cabled to each other (direct attach) or cabled into the same cluster of switches joined
 * by inter-switch cables. Clusters come from a union–find over the switches (Tarjan 1975, path
 * halving); each cluster keeps the controller ports cabled into it, and each host port then looks
 * only at its own clusters. Counting is per port pair, so a port cabled twice still counts once.
 */
export type PairSessions = { sessions: number; controllers: Set<string> };

/** Host id → array id → sessions and the controllers they reach. */
export type SessionTable = Map<string, Map<string, PairSessions>>;

class UnionFind {
  private parent = new Map<string, string>();
  find(x: string): string {
    let root = this.parent.get(x) ?? x;
    while (root !== (this.parent.get(root) ?? root)) {
      const next = this.parent.get(root) ?? root;
      this.parent.set(root, this.parent.get(next) ?? next);
      root = next;
    }
    return root;
  }
  union(a: string, b: string): void {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra !== rb) this.parent.set(ra < rb ? rb : ra, ra < rb ? ra : rb);
  }
}

type Attachments = { clusters: UnionFind; controllerPorts: Map<string, PortRef[]>; hostLinks: Map<string, (PortRef | string)[]> };

/** One pass over the cables: switch clusters, controller ports per cluster, and each host port's far ends. */
function attach(ctx: AnalysisContext): Attachments {
  const clusters = new UnionFind();
  const usable = ctx.doc.cables.map((cable) => dataCable(ctx, cable));
  usable.forEach((ends) => {
    if (ends && ends.roleA === 'switch' && ends.roleB === 'switch') clusters.union(ends.a.device.id, ends.b.device.id);
  });
  const controllerPorts = new Map<string, PortRef[]>();
  // For a host port: a controller port cabled to it directly, or the id of a switch it is cabled to.
  const hostLinks = new Map<string, (PortRef | string)[]>();
  const push = <T>(map: Map<string, T[]>, key: string, value: T) => {
    const list = map.get(key);
    if (list) list.push(value);
    else map.set(key, [value]);
  };
  usable.forEach((ends) => {
    if (!ends) return;
    const pairs = [
      [ends.a, ends.roleA, ends.b, ends.roleB],
      [ends.b, ends.roleB, ends.a, ends.roleA],
    ] as const;
    for (const [here, role, there, thereRole] of pairs) {
      if (role === 'controller' && thereRole === 'switch') push(controllerPorts, clusters.find(there.device.id), here);
      if (role === 'host') push(hostLinks, here.port.id, thereRole === 'switch' ? clusters.find(there.device.id) : there);
    }
  });
  return { clusters, controllerPorts, hostLinks };
}

export function countSessions(ctx: AnalysisContext): SessionTable {
  const { controllerPorts, hostLinks } = attach(ctx);
  const table: SessionTable = new Map();
  for (const [portId, links] of hostLinks) {
    const hostPort = ctx.index.ports.get(portId)!;
    const seen = new Set<string>();
    for (const link of links) {
      const candidates = typeof link === 'string' ? controllerPorts.get(link) ?? [] : [link];
      for (const cp of candidates) {
        if (seen.has(cp.port.id)) continue;
        seen.add(cp.port.id);
        if (!networksPair(ctx, hostPort.port.networkId, cp.port.networkId)) continue;
        let arrays = table.get(hostPort.device.id);
        if (!arrays) table.set(hostPort.device.id, (arrays = new Map()));
        let pair = arrays.get(cp.device.id);
        if (!pair) arrays.set(cp.device.id, (pair = { sessions: 0, controllers: new Set() }));
        pair.sessions += 1;
        pair.controllers.add(cp.controller!.id);
      }
    }
  }
  return table;
}
