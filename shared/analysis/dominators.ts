import { ANY_NETWORK, type CompiledGraph } from '@/shared/analysis/compile';

/**
 * Dominators of a flow graph by Lengauer & Tarjan, "A Fast Algorithm for Finding Dominators in a
 * Flowgraph", ACM TOPLAS 1(1):121–141, 1979 — the "simple" variant (path compression without
 * balanced linking, O(m log n)). Node d dominates node v when every path from the root to v passes
 * through d; the failure units that dominate a host are exactly those whose loss alone cuts the
 * host off (removing a dominator disconnects v, and removing a non-dominator leaves a path).
 *
 * One run covers the part of the graph reachable from `root` through edges of network `network`
 * (or of every network when `network` is ANY_NETWORK). Nodes are renumbered by DFS preorder, all
 * state lives in typed arrays, and both the DFS and the path compression are iterative, so a chain
 * of ten thousand switches cannot overflow the stack.
 */
export type DominatorRun = {
  /** Preorder number → node index. `nodes[0]` is the root. */
  nodes: Int32Array;
  /** Preorder number → preorder number of its immediate dominator (-1 for the root). */
  idom: Int32Array;
  /** Node index → preorder number in this run, or -1 when unreachable. Valid until the next run. */
  numberOf: Int32Array;
  count: number;
};

export class DominatorSolver {
  private readonly graph: CompiledGraph;
  private readonly numberOf: Int32Array;
  private readonly visited: number[] = [];

  constructor(graph: CompiledGraph) {
    this.graph = graph;
    this.numberOf = new Int32Array(graph.ids.length).fill(-1);
  }

  private follows(edge: number, network: number): boolean {
    const code = this.graph.edgeNetwork[edge];
    return network === ANY_NETWORK || code === ANY_NETWORK || code === network;
  }

  /** `down`: 1 for nodes to leave out of this run (units failed in addition to the graph's own). */
  run(root: number, network: number, down?: Uint8Array): DominatorRun {
    for (const node of this.visited) this.numberOf[node] = -1;
    this.visited.length = 0;
    const { nodes, parent, predStart, preds } = this.search(root, network, down);
    const idom = lengauerTarjan(nodes.length, parent, predStart, preds);
    return { nodes, idom, numberOf: this.numberOf, count: nodes.length };
  }

  /** Only which nodes the run reaches: node index → preorder number, -1 when unreachable. */
  reach(root: number, network: number, down?: Uint8Array): Int32Array {
    for (const node of this.visited) this.numberOf[node] = -1;
    this.visited.length = 0;
    this.search(root, network, down);
    return this.numberOf;
  }

  /** Iterative DFS: preorder numbers, DFS-tree parents and predecessor lists (by preorder number). */
  private search(root: number, network: number, down: Uint8Array | undefined) {
    const { offsets, targets } = this.graph;
    const order: number[] = [root];
    const parentList: number[] = [-1];
    const edgeFrom: number[] = [];
    const edgeTo: number[] = [];
    this.numberOf[root] = 0;
    this.visited.push(root);
    const stackNode: number[] = [root];
    const stackEdge: number[] = [offsets[root]];
    while (stackNode.length > 0) {
      const top = stackNode.length - 1;
      const v = stackNode[top];
      const e = stackEdge[top];
      if (e >= offsets[v + 1]) {
        stackNode.pop();
        stackEdge.pop();
        continue;
      }
      stackEdge[top] = e + 1;
      if (!this.follows(e, network)) continue;
      const w = targets[e];
      if (down && down[w]) continue;
      edgeFrom.push(this.numberOf[v]);
      if (this.numberOf[w] === -1) {
        this.numberOf[w] = order.length;
        this.visited.push(w);
        order.push(w);
        parentList.push(this.numberOf[v]);
        stackNode.push(w);
        stackEdge.push(offsets[w]);
      }
      edgeTo.push(this.numberOf[w]);
    }
    return { nodes: Int32Array.from(order), parent: Int32Array.from(parentList), ...groupPreds(order.length, edgeFrom, edgeTo) };
  }
}

function groupPreds(n: number, from: number[], to: number[]) {
  const predStart = new Int32Array(n + 1);
  for (const w of to) predStart[w + 1] += 1;
  for (let i = 0; i < n; i += 1) predStart[i + 1] += predStart[i];
  const fill = predStart.slice(0, n);
  const preds = new Int32Array(from.length);
  for (let i = 0; i < from.length; i += 1) preds[fill[to[i]]++] = from[i];
  return { predStart, preds };
}

/** Lengauer–Tarjan on preorder-numbered vertices 0..n-1 (0 = root). */
export function lengauerTarjan(n: number, parent: Int32Array, predStart: Int32Array, preds: Int32Array): Int32Array {
  const semi = new Int32Array(n);
  const label = new Int32Array(n);
  const ancestor = new Int32Array(n).fill(-1);
  const idom = new Int32Array(n).fill(-1);
  const bucketHead = new Int32Array(n).fill(-1);
  const bucketNext = new Int32Array(n).fill(-1);
  for (let v = 0; v < n; v += 1) {
    semi[v] = v;
    label[v] = v;
  }
  const stack: number[] = [];
  const evaluate = (v: number): number => {
    if (ancestor[v] === -1) return v;
    // compress(v), iteratively: climb to the forest root's child, then relabel on the way back.
    let u = v;
    while (ancestor[ancestor[u]] !== -1) {
      stack.push(u);
      u = ancestor[u];
    }
    while (stack.length > 0) {
      const x = stack.pop()!;
      const a = ancestor[x];
      if (semi[label[a]] < semi[label[x]]) label[x] = label[a];
      ancestor[x] = ancestor[a];
    }
    return label[v];
  };
  for (let w = n - 1; w >= 1; w -= 1) {
    for (let i = predStart[w]; i < predStart[w + 1]; i += 1) {
      const u = evaluate(preds[i]);
      if (semi[u] < semi[w]) semi[w] = semi[u];
    }
    bucketNext[w] = bucketHead[semi[w]];
    bucketHead[semi[w]] = w;
    const p = parent[w];
    ancestor[w] = p;
    for (let v = bucketHead[p]; v !== -1; v = bucketNext[v]) {
      const u = evaluate(v);
      idom[v] = semi[u] < semi[v] ? u : p;
    }
    bucketHead[p] = -1;
  }
  for (let w = 1; w < n; w += 1) {
    if (idom[w] !== semi[w]) idom[w] = idom[idom[w]];
  }
  return idom;
}
