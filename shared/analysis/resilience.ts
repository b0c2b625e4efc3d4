import { hostAttachments, type Attachment } from '@/shared/analysis/attachments';
import { byId, unitKindOf, type AnalysisContext } from '@/shared/analysis/context';
import { tupleKey } from '@/shared/keys/tuple';
import { powerCuts, type PowerCut } from '@/shared/analysis/power';
import { ANY_NETWORK, compileGraph, type CompiledGraph } from '@/shared/analysis/compile';
import { DominatorTree } from '@/shared/analysis/dominator-tree';
import { DominatorSolver } from '@/shared/analysis/dominators';
import { buildDataPathGraph } from '@/shared/analysis/graph';
import { countSessions, type SessionTable } from '@/shared/analysis/sessions';
import type { FailureResult, HostArrayPair, HostArrayResult, UnitKind } from '@/shared/analysis/types';
import type { ArrayDevice } from '@/shared/topology/schema';

/**
 * hosts[] and failures[]. For every array a and every network n its controller ports use, one
 * dominator run over the core data-path graph rooted at a, following only the edges of n (and
 * edges of no network); the hosts' dominators then follow from their attachments (attachments.ts).
 *
 * The dominators of a node are the chain of its ancestors in the dominator tree, so the units
 * shared by every attachment of a host are the dominator chain of the attachments' upstream
 * nodes' lowest common ancestor in that tree, plus the card when every attachment uses the same
 * card and the cable when there is only one. A failure unit u cuts host h off array a when, on
 * every network where h reaches a, u dominates h: then no pair of ports that could form a session
 * survives u's loss. The cost is one near-linear pass per (array, network) plus one climb of the
 * tree per attachment, instead of one search per unit.
 */
/** A network no core edge carries: such a run follows only edges of no network. */
const UNUSED_NETWORK = -2;

/** The networks to run for one array: those its controller ports use, or all of them if a port has none. */
function networksOf(ctx: AnalysisContext, array: ArrayDevice, down?: ReadonlySet<string>): (string | null)[] {
  if (!ctx.hasNetworks) return [null];
  const ids = new Set<string>();
  let unrestricted = false;
  for (const controller of array.controllers) {
    if (ctx.failed.has(controller.id) || down?.has(controller.id)) continue;
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

/**
 * Attachments grouped by host, with their upstream node resolved once for every run; and the hosts
 * grouped into classes of the same shape — the same upstream nodes and networks, attachment by
 * attachment, and the same pattern of cards. Hosts of one class have the same single points of
 * failure but for their own cards and cables, so one member (the first) is evaluated and the others
 * take its answer with their own cards and cables put in (44 hosts on one pair of edge switches cost
 * one evaluation). A host with a card down is evaluated on its own.
 */
type HostGroups = {
  hosts: string[];
  start: Int32Array;
  items: Attachment[];
  upstream: Int32Array;
  /** Host → its class; class → its first member; members of each class in host order. */
  classOf: Int32Array;
  members: number[][];
  /** Card id → host group index. */
  hostOfCard: Map<string, number>;
};

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
    for (const att of order.get(host)!) items.push(att);
  });
  start[hosts.length] = items.length;
  const upstream = Int32Array.from(items, (att) => graph.indexOf.get(att.upstream) ?? -1);
  const classOf = new Int32Array(hosts.length);
  const members: number[][] = [];
  const classByShape = new Map<string, number>();
  const hostOfCard = new Map<string, number>();
  for (let h = 0; h < hosts.length; h += 1) {
    const cards: string[] = [];
    const parts: string[] = [];
    for (let i = start[h]; i < start[h + 1]; i += 1) {
      const att = items[i];
      hostOfCard.set(att.adapter, h);
      let card = cards.indexOf(att.adapter);
      if (card < 0) card = cards.push(att.adapter) - 1;
      parts.push(String(upstream[i]), String(card), att.hostNetwork === undefined ? '-' : `=${att.hostNetwork}`, att.controllerNetwork === undefined ? '-' : `=${att.controllerNetwork}`);
    }
    const shape = tupleKey(parts);
    let c = classByShape.get(shape);
    if (c === undefined) {
      c = members.length;
      classByShape.set(shape, c);
      members.push([]);
    }
    classOf[h] = c;
    members[c].push(h);
  }
  return { hosts, start, items, upstream, classOf, members, hostOfCard };
}

/**
 * One host's answer carried over to another of its class: the first host's own cards and cables,
 * attachment by attachment, become the other's. A list without any of them is shared as it is.
 */
function carryOver(groups: HostGroups, from: number, to: number, units: string[]): string[] {
  const { start, items } = groups;
  let own: Map<string, string> | undefined;
  for (let i = start[from], j = start[to]; i < start[from + 1]; i += 1, j += 1) {
    const theirs = items[i];
    const mine = items[j];
    if (units.includes(theirs.adapter)) (own ??= new Map()).set(theirs.adapter, mine.adapter);
    if (units.includes(theirs.cable)) (own ??= new Map()).set(theirs.cable, mine.cable);
  }
  if (!own) return units;
  const map = own;
  return units.map((unit) => map.get(unit) ?? unit);
}

/** The hosts to evaluate: the first member of each class, and every host with a card down. */
function hostsToEvaluate(groups: HostGroups, down: ReadonlySet<string> | undefined): { list: number[]; alone: Uint8Array } {
  const alone = new Uint8Array(groups.hosts.length);
  if (down) {
    for (const id of down) {
      const h = groups.hostOfCard.get(id);
      if (h !== undefined) alone[h] = 1;
    }
  }
  const list: number[] = [];
  for (const members of groups.members) {
    const first = members.find((h) => !alone[h]);
    if (first !== undefined) list.push(first);
  }
  for (let h = 0; h < groups.hosts.length; h += 1) if (alone[h]) list.push(h);
  return { list, alone };
}

/**
 * Per host (by group index): the units whose loss alone cuts it off the array on every network
 * where it reaches it, or undefined when it reaches the array on none. `down` (optional) holds units
 * failed in addition to the graph's own, as node flags and as ids (for the cards).
 */
function hostDominators(
  ctx: AnalysisContext,
  solver: DominatorSolver,
  graph: CompiledGraph,
  groups: HostGroups,
  array: ArrayDevice,
  down?: { nodes: Uint8Array; ids: ReadonlySet<string> },
): (string[] | undefined)[] {
  const root = graph.indexOf.get(array.id)!;
  const result: (string[] | undefined)[] = new Array(groups.hosts.length);
  const { list, alone } = hostsToEvaluate(groups, down?.ids);
  for (const key of networksOf(ctx, array, down?.ids)) {
    const code = key === null ? ANY_NETWORK : graph.networkCode.get(key) ?? UNUSED_NETWORK;
    const tree = new DominatorTree(graph, solver.run(root, code, down?.nodes));
    const numberOf = tree.run.numberOf;
    for (const h of list) {
      const sofar = result[h];
      if (sofar && sofar.length === 0) continue; // nothing left to intersect away
      let meet = -1;
      let card: string | null | undefined;
      let cable: string | undefined;
      let count = 0;
      for (let i = groups.start[h]; i < groups.start[h + 1]; i += 1) {
        const att = groups.items[i];
        const upstream = groups.upstream[i];
        if (upstream < 0 || numberOf[upstream] < 0) continue;
        if (!passes(att.hostNetwork, key) || !passes(att.controllerNetwork, key)) continue;
        if (down && down.ids.has(att.adapter)) continue;
        meet = count === 0 ? numberOf[upstream] : tree.lowestCommonAncestor(meet, numberOf[upstream]);
        card = count === 0 || card === att.adapter ? att.adapter : null;
        cable = att.cable;
        count += 1;
      }
      if (count === 0) continue;
      const own: string[] = [];
      if (card) own.push(card);
      if (count === 1) own.push(cable!);
      if (sofar) {
        // Short chains are scanned; long ones (a line of switches) are looked up in the chain's set.
        const here = tree.units(meet);
        const chain = sofar.length * here.length > 64 ? tree.unitSet(meet) : null;
        result[h] = sofar.filter((x) => own.includes(x) || (chain ? chain.has(x) : here.includes(x)));
      } else {
        const here = tree.units(meet);
        result[h] = own.length > 0 ? [...own, ...here] : here;
      }
    }
  }
  for (const members of groups.members) {
    const first = members.find((h) => !alone[h]);
    if (first === undefined) continue;
    const answer = result[first];
    if (!answer) continue;
    for (const h of members) if (h !== first && !alone[h]) result[h] = carryOver(groups, first, h, answer);
  }
  return result;
}

/** Per host (by group index): whether it still reaches the array on some network with `down` failed too. */
function hostReaches(ctx: AnalysisContext, solver: DominatorSolver, graph: CompiledGraph, groups: HostGroups, array: ArrayDevice, down: { nodes: Uint8Array; ids: ReadonlySet<string> }): Uint8Array {
  const root = graph.indexOf.get(array.id)!;
  const result = new Uint8Array(groups.hosts.length);
  const { list, alone } = hostsToEvaluate(groups, down.ids);
  for (const key of networksOf(ctx, array, down.ids)) {
    const code = key === null ? ANY_NETWORK : graph.networkCode.get(key) ?? UNUSED_NETWORK;
    const numberOf = solver.reach(root, code, down.nodes);
    for (const h of list) {
      if (result[h]) continue;
      for (let i = groups.start[h]; i < groups.start[h + 1]; i += 1) {
        const att = groups.items[i];
        const upstream = groups.upstream[i];
        if (upstream < 0 || numberOf[upstream] < 0) continue;
        if (!passes(att.hostNetwork, key) || !passes(att.controllerNetwork, key)) continue;
        if (down.ids.has(att.adapter)) continue;
        result[h] = 1;
        break;
      }
    }
  }
  for (const members of groups.members) {
    const first = members.find((h) => !alone[h]);
    if (first === undefined || !result[first]) continue;
    for (const h of members) if (!alone[h]) result[h] = 1;
  }
  return result;
}

export type Resilience = { hosts: HostArrayResult[]; failures: FailureResult[] };

/**
 * The parts of the analysis that do not change when more units fail: the core graph, the host
 * attachments, the session table and the arrays, built once from the context. `dataSpofs` answers
 * the data-path single points of failure with further units down, by leaving their nodes out of the
 * dominator runs, so "what if this fails as well" costs the runs and not a new graph.
 */
export class ResilienceEngine {
  readonly graph: CompiledGraph;
  readonly groups: HostGroups;
  readonly sessions: SessionTable;
  readonly arrays: ArrayDevice[];
  readonly hostIndex = new Map<string, number>();
  readonly arrayIndex = new Map<string, number>();
  private readonly solver: DominatorSolver;

  constructor(readonly ctx: AnalysisContext) {
    this.graph = compileGraph(buildDataPathGraph(ctx));
    this.groups = groupByHost(this.graph, hostAttachments(ctx));
    this.sessions = countSessions(ctx);
    this.arrays = ctx.doc.devices.filter((d): d is ArrayDevice => d.kind === 'array').sort((x, y) => byId(x.id, y.id));
    this.solver = new DominatorSolver(this.graph);
    this.groups.hosts.forEach((host, h) => this.hostIndex.set(host, h));
    this.arrays.forEach((array, a) => this.arrayIndex.set(array.id, a));
  }

  /** Per array (id order), per host group: its data-path single points of failure, undefined when cut off. */
  dataSpofs(down?: ReadonlySet<string>): (string[] | undefined)[][] {
    const mask = down && this.mask(down);
    return this.arrays.map((array) => hostDominators(this.ctx, this.solver, this.graph, this.groups, array, mask));
  }

  /** Per array, per host group: 1 when the host still reaches the array with `down` failed too. */
  reaches(down: ReadonlySet<string>): Uint8Array[] {
    const mask = this.mask(down);
    return this.arrays.map((array) => hostReaches(this.ctx, this.solver, this.graph, this.groups, array, mask));
  }

  private mask(down: ReadonlySet<string>): { nodes: Uint8Array; ids: ReadonlySet<string> } {
    const nodes = new Uint8Array(this.graph.ids.length);
    for (const id of down) {
      const n = this.graph.indexOf.get(id);
      if (n !== undefined) nodes[n] = 1;
    }
    return { nodes, ids: down };
  }
}

function unitKind(ctx: AnalysisContext, id: string): UnitKind {
  return unitKindOf(ctx, id) ?? 'switch';
}

/** Indices of the ids in plain code-unit order. */
export function sortedOrder(ids: string[]): number[] {
  return ids.map((_, i) => i).sort((x, y) => byId(ids[x], ids[y]));
}

function pairResult(host: string, array: string, spof: string[], sessions: SessionTable): HostArrayResult | null {
  const pair = sessions.get(host)?.get(array);
  if (!pair || pair.sessions === 0) return null;
  const singlePointsOfFailure = spof.slice().sort(byId);
  return {
    host,
    array,
    sessions: pair.sessions,
    // The session table is this analysis's own and read once per pair: its list can be sorted in place.
    controllersReached: pair.controllers.sort(byId),
    singlePointsOfFailure,
    redundant: singlePointsOfFailure.length === 0,
  };
}

/**
 * The power units that alone cut each live pair off, with `failed` down (power.ts): a PSU or feed
 * that takes down the host or the array, or the switches whose loss together cuts the pair. One
 * switch is read off the data-path answer; several are searched again with all of them down.
 * `spofs[a][h]` is the data-path answer with `failed` down, `live[a·H + h]` 1 when the pair is up;
 * `cuts` the power cuts with `failed` down, when the caller has them already.
 * Answers, per pair index a·H + h, the power units found, in the order of the cuts.
 */
export function powerSpofs(
  engine: ResilienceEngine,
  failed: ReadonlySet<string>,
  spofs: (string[] | undefined)[][],
  live: Uint8Array,
  cuts: PowerCut[] = powerCuts(engine.ctx.power, failed),
): Map<number, string[]> {
  const out = new Map<number, string[]>();
  if (cuts.length === 0) return out;
  const { hosts } = engine.groups;
  const H = hosts.length;
  const A = engine.arrays.length;
  // The pairs each lone switch of a cut is a data-path single point of failure of.
  const lone = new Map<string, number[]>();
  for (const cut of cuts) {
    let only: string | null = null;
    let switches = 0;
    for (const d of cut.devices) if (d.kind === 'switch') (switches += 1), (only = d.id);
    if (switches === 1) lone.set(only!, []);
  }
  if (lone.size > 0) {
    for (let a = 0; a < A; a += 1) {
      const row = spofs[a];
      for (let h = 0; h < H; h += 1) {
        const list = row[h];
        if (!list || list.length === 0 || !live[a * H + h]) continue;
        for (const unit of list) lone.get(unit)?.push(a * H + h);
      }
    }
  }
  const stamp = new Int32Array(A * H).fill(-1);
  cuts.forEach((cut, c) => {
    const add = (pair: number) => {
      if (stamp[pair] === c || !live[pair]) return;
      stamp[pair] = c;
      const list = out.get(pair);
      if (list) list.push(cut.unit);
      else out.set(pair, [cut.unit]);
    };
    const switches: string[] = [];
    for (const device of cut.devices) {
      if (device.kind === 'host') {
        const h = engine.hostIndex.get(device.id);
        if (h !== undefined) for (let a = 0; a < A; a += 1) add(a * H + h);
      } else if (device.kind === 'array') {
        const a = engine.arrayIndex.get(device.id)!;
        for (let h = 0; h < H; h += 1) add(a * H + h);
      } else {
        switches.push(device.id);
      }
    }
    if (switches.length === 1) {
      for (const pair of lone.get(switches[0]) ?? []) add(pair);
    } else if (switches.length > 1) {
      const down = new Set(failed);
      for (const id of switches) down.add(id);
      const after = engine.reaches(down);
      for (let a = 0; a < A; a += 1) for (let h = 0; h < H; h += 1) if (!after[a][h]) add(a * H + h);
    }
  });
  return out;
}

export function analyzeResilience(ctx: AnalysisContext, engine: ResilienceEngine = new ResilienceEngine(ctx)): Resilience {
  const { groups, sessions, arrays } = engine;
  const perArray = engine.dataSpofs();
  const H = groups.hosts.length;
  const live = new Uint8Array(arrays.length * H);
  for (let a = 0; a < arrays.length; a += 1) {
    for (let h = 0; h < H; h += 1) live[a * H + h] = perArray[a][h] !== undefined && (sessions.get(groups.hosts[h])?.get(arrays[a].id)?.sessions ?? 0) > 0 ? 1 : 0;
  }
  const power = powerSpofs(engine, ctx.failed, perArray, live);
  // Hosts, then arrays, in id order: hosts[] and every cutsOff list come out sorted as they are built.
  const hosts: HostArrayResult[] = [];
  const cuts = new Map<string, HostArrayPair[]>();
  for (const h of sortedOrder(groups.hosts)) {
    for (let a = 0; a < arrays.length; a += 1) {
      const data = perArray[a][h];
      const extra = data && power.get(a * H + h);
      const spof = extra ? [...data, ...extra] : data;
      const result = spof && pairResult(groups.hosts[h], arrays[a].id, spof, sessions);
      if (!result) continue;
      hosts.push(result);
      for (const unit of result.singlePointsOfFailure) {
        const list = cuts.get(unit);
        const cut = { host: result.host, array: result.array };
        if (list) list.push(cut);
        else cuts.set(unit, [cut]);
      }
    }
  }
  const failures: FailureResult[] = [...cuts.keys()].sort(byId).map((unit) => ({ unit, kind: unitKind(ctx, unit), cutsOff: cuts.get(unit)! }));
  return { hosts, failures };
}
