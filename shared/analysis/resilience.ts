import { hostAttachments, type Attachment } from '@/shared/analysis/attachments';
import { byId, type AnalysisContext } from '@/shared/analysis/context';
import { ANY_NETWORK, compileGraph, type CompiledGraph } from '@/shared/analysis/compile';
import { DominatorSolver, type DominatorRun } from '@/shared/analysis/dominators';
import { buildDataPathGraph } from '@/shared/analysis/graph';
import { countSessions } from '@/shared/analysis/sessions';
import type { FailureResult, HostArrayResult, UnitKind } from '@/shared/analysis/types';
import type { ArrayDevice } from '@/shared/topology/schema';

/**
 * hosts[] and failures[]. For every array a and every network n its controller ports use, one
 * dominator run over the core data-path graph rooted at a, following only the edges of n (and
 * edges of no network); the hosts' dominators then follow from their attachments (attachments.ts).
 * A failure unit u cuts host h off array a when, on every network where h reaches a, u dominates h:
 * then no pair of ports that could form a session survives u's loss. The cost is one near-linear
 * pass per (array, network) plus the dominator chains read back, instead of one search per unit.
 */
const UNIT_KINDS = new Set(['cable', 'adapter', 'switch', 'controller']);
/** A network no core edge carries: such a run follows only edges of no network. */
const UNUSED_NETWORK = -2;
const SMALL = 16;

/** The networks to run for one array: those its controller ports use, or all of them if a port has none. */
function networksOf(ctx: AnalysisContext, array: ArrayDevice): (string | null)[] {
  if (!ctx.hasNetworks) return [null];
  const ids = new Set<string>();
  let unrestricted = false;
  for (const controller of array.controllers) {
    if (ctx.failed.has(controller.id)) continue;
    for (const port of controller.ports) {
      if (port.role !== 'data') continue;
      if (port.networkId === undefined) unrestricted = true;
      else ids.add(port.networkId);
    }
  }
  if (unrestricted) for (const network of ctx.doc.networks) ids.add(network.id);
  return ids.size > 0 ? [...ids].sort(byId) : [null];
}

function passes(network: string | undefined, key: string | null): boolean {
  return key === null || network === undefined || network === key;
}

function intersect(a: string[], b: string[]): string[] {
  if (b.length > SMALL) {
    const set = new Set(b);
    return a.filter((x) => set.has(x));
  }
  return a.filter((x) => b.includes(x));
}

/** The failure units among a fabric node and its dominators, memoised per run. */
function fabricChain(graph: CompiledGraph, run: DominatorRun, node: number, memo: Map<number, string[]>): string[] {
  const cached = memo.get(node);
  if (cached) return cached;
  const chain: string[] = [];
  for (let d = run.numberOf[node]; d > 0; d = run.idom[d]) {
    const id = run.nodes[d];
    if (UNIT_KINDS.has(graph.kinds[id])) chain.push(graph.ids[id]);
  }
  memo.set(node, chain);
  return chain;
}

/** Attachments grouped by host, with their upstream node resolved once for every run. */
type HostGroups = { hosts: string[]; start: Int32Array; items: Attachment[]; upstream: Int32Array };

function groupByHost(graph: CompiledGraph, attachments: Attachment[]): HostGroups {
  const order = new Map<string, Attachment[]>();
  for (const att of attachments) {
    const list = order.get(att.host);
    if (list) list.push(att);
    else order.set(att.host, [att]);
  }
  const hosts = [...order.keys()];
  const start = new Int32Array(hosts.length + 1);
  const items: Attachment[] = [];
  hosts.forEach((host, h) => {
    start[h] = items.length;
    items.push(...order.get(host)!);
  });
  start[hosts.length] = items.length;
  const upstream = Int32Array.from(items, (att) => graph.indexOf.get(att.upstream) ?? -1);
  return { hosts, start, items, upstream };
}

/** Per host (by group index): the units dominating it, one list per network on which it reaches the array. */
function hostDominators(ctx: AnalysisContext, graph: CompiledGraph, groups: HostGroups, array: ArrayDevice) {
  const solver = new DominatorSolver(graph);
  const root = graph.indexOf.get(array.id)!;
  const perHost: (string[][] | undefined)[] = new Array(groups.hosts.length);
  for (const key of networksOf(ctx, array)) {
    const code = key === null ? ANY_NETWORK : graph.networkCode.get(key) ?? UNUSED_NETWORK;
    const run = solver.run(root, code);
    const memo = new Map<number, string[]>();
    for (let h = 0; h < groups.hosts.length; h += 1) {
      let units: string[] | undefined;
      for (let i = groups.start[h]; i < groups.start[h + 1]; i += 1) {
        const upstream = groups.upstream[i];
        const att = groups.items[i];
        if (upstream < 0 || run.numberOf[upstream] < 0) continue;
        if (!passes(att.hostNetwork, key) || !passes(att.controllerNetwork, key)) continue;
        const chain = [att.adapter, att.cable, ...fabricChain(graph, run, upstream, memo)];
        units = units ? intersect(units, chain) : chain;
      }
      if (!units) continue;
      const list = perHost[h];
      if (list) list.push(units);
      else perHost[h] = [units];
    }
  }
  return perHost;
}

export type Resilience = { hosts: HostArrayResult[]; failures: FailureResult[] };

const byPair = (x: { host: string; array: string }, y: { host: string; array: string }) => byId(x.host, y.host) || byId(x.array, y.array);

export function analyzeResilience(ctx: AnalysisContext): Resilience {
  const graph = compileGraph(buildDataPathGraph(ctx));
  const groups = groupByHost(graph, hostAttachments(ctx));
  const sessions = countSessions(ctx);
  const hosts: HostArrayResult[] = [];
  const cuts = new Map<string, { host: string; array: string }[]>();
  for (const device of ctx.doc.devices) {
    if (device.kind !== 'array') continue;
    const perHost = hostDominators(ctx, graph, groups, device);
    for (let h = 0; h < groups.hosts.length; h += 1) {
      const lists = perHost[h];
      const host = groups.hosts[h];
      const pair = lists && sessions.get(host)?.get(device.id);
      if (!lists || !pair || pair.sessions === 0) continue;
      const spof = lists.length === 1 ? lists[0] : lists.reduce(intersect);
      spof.sort(byId);
      for (const unit of spof) {
        const list = cuts.get(unit);
        if (list) list.push({ host, array: device.id });
        else cuts.set(unit, [{ host, array: device.id }]);
      }
      hosts.push({
        host,
        array: device.id,
        sessions: pair.sessions,
        controllersReached: pair.controllers.slice().sort(byId),
        singlePointsOfFailure: spof,
        redundant: spof.length === 0,
      });
    }
  }
  hosts.sort(byPair);
  const failures: FailureResult[] = [...cuts.keys()].sort(byId).map((unit) => ({
    unit,
    kind: unitKind(ctx, unit),
    cutsOff: cuts.get(unit)!.sort(byPair),
  }));
  return { hosts, failures };
}

function unitKind(ctx: AnalysisContext, id: string): UnitKind {
  if (ctx.index.cables.has(id)) return 'cable';
  if (ctx.index.adapters.has(id)) return 'adapter';
  if (ctx.index.controllers.has(id)) return 'controller';
  return 'switch';
}
