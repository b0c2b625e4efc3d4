import { byId, type AnalysisContext } from '@/shared/analysis/context';
import { ANY_NETWORK, compileGraph, type CompiledGraph } from '@/shared/analysis/compile';
import { DominatorSolver } from '@/shared/analysis/dominators';
import { buildDataPathGraph } from '@/shared/analysis/graph';
import { countSessions } from '@/shared/analysis/sessions';
import type { FailureResult, HostArrayResult, UnitKind } from '@/shared/analysis/types';

/**
 * hosts[] and failures[]. For every array a and every network n that a's controller ports use,
 * one dominator run over the data-path graph rooted at a, following only the edges of n (and
 * edges of no network). A failure unit u cuts host h off array a when, on every network where h
 * reaches a, u dominates h: then no pair of ports that could form a session survives u's loss.
 * The cost is one near-linear pass per (array, network) plus the length of the dominator chains
 * read back, instead of one full search per unit.
 */
const UNIT_KINDS = new Set(['cable', 'adapter', 'switch', 'controller']);

/** The networks to run for one array: those its controller ports use, or every one if a port has none. */
function networksOf(graph: CompiledGraph, controllers: number[]): number[] {
  const codes = new Set<number>();
  let unrestricted = false;
  for (const c of controllers) {
    for (let e = graph.offsets[c]; e < graph.offsets[c + 1]; e += 1) {
      const code = graph.edgeNetwork[e];
      if (code === ANY_NETWORK) unrestricted = true;
      else codes.add(code);
    }
  }
  if (unrestricted) for (const code of graph.networkCode.values()) codes.add(code);
  return codes.size > 0 ? [...codes].sort((x, y) => x - y) : [ANY_NETWORK];
}

/** host index → the unit chains (dominators that are failure units), one chain per network reached. */
function dominatorChains(graph: CompiledGraph, root: number): Map<number, number[][]> {
  const solver = new DominatorSolver(graph);
  const controllers: number[] = [];
  for (let e = graph.offsets[root]; e < graph.offsets[root + 1]; e += 1) controllers.push(graph.targets[e]);
  const chains = new Map<number, number[][]>();
  for (const network of networksOf(graph, controllers)) {
    const run = solver.run(root, network);
    for (let i = 1; i < run.count; i += 1) {
      const node = run.nodes[i];
      if (graph.kinds[node] !== 'host') continue;
      const chain: number[] = [];
      for (let d = run.idom[i]; d > 0; d = run.idom[d]) {
        if (UNIT_KINDS.has(graph.kinds[run.nodes[d]])) chain.push(run.nodes[d]);
      }
      const list = chains.get(node);
      if (list) list.push(chain);
      else chains.set(node, [chain]);
    }
  }
  return chains;
}

function intersect(chains: number[][]): number[] {
  if (chains.length === 1) return chains[0];
  let common = new Set(chains[0]);
  for (const chain of chains.slice(1)) {
    const next = new Set<number>();
    for (const node of chain) if (common.has(node)) next.add(node);
    common = next;
  }
  return [...common];
}

export type Resilience = { hosts: HostArrayResult[]; failures: FailureResult[] };

export function analyzeResilience(ctx: AnalysisContext): Resilience {
  const graph = compileGraph(buildDataPathGraph(ctx));
  const sessions = countSessions(ctx);
  const hosts: HostArrayResult[] = [];
  const cuts = new Map<string, { host: string; array: string }[]>();
  for (const device of ctx.doc.devices) {
    if (device.kind !== 'array') continue;
    const chains = dominatorChains(graph, graph.indexOf.get(device.id)!);
    for (const [hostIndex, hostChains] of chains) {
      const host = graph.ids[hostIndex];
      const pair = sessions.get(host)?.get(device.id);
      if (!pair || pair.sessions === 0) continue;
      const spof = intersect(hostChains).map((node) => graph.ids[node]).sort(byId);
      for (const unit of spof) {
        const list = cuts.get(unit);
        if (list) list.push({ host, array: device.id });
        else cuts.set(unit, [{ host, array: device.id }]);
      }
      hosts.push({
        host,
        array: device.id,
        sessions: pair.sessions,
        controllersReached: [...pair.controllers].sort(byId),
        singlePointsOfFailure: spof,
        redundant: spof.length === 0,
      });
    }
  }
  hosts.sort((x, y) => byId(x.host, y.host) || byId(x.array, y.array));
  const failures: FailureResult[] = [...cuts.keys()].sort(byId).map((unit) => ({
    unit,
    kind: graph.kinds[graph.indexOf.get(unit)!] as UnitKind,
    cutsOff: cuts.get(unit)!.sort((x, y) => byId(x.host, y.host) || byId(x.array, y.array)),
  }));
  return { hosts, failures };
}
