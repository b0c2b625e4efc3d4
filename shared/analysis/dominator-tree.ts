import type { CompiledGraph } from '@/shared/analysis/compile';
import type { DominatorRun } from '@/shared/analysis/dominators';

/**
 * One dominator run read as a tree. The dominators of a node are exactly its ancestors in the
 * dominator tree (Lengauer & Tarjan 1979), so the nodes that dominate every one of several
 * nodes are the ancestors of their lowest common ancestor, found by climbing from the deeper node
 * by depth. Each node's failure units up to the root are read once and shared by every caller.
 */
export class DominatorTree {
  private readonly depth: Int32Array;
  private readonly chains: (string[] | undefined)[];
  private readonly sets: (Set<string> | undefined)[];

  constructor(
    private readonly graph: CompiledGraph,
    readonly run: DominatorRun,
  ) {
    // An immediate dominator is a DFS-tree ancestor, so it has the smaller preorder number.
    this.depth = new Int32Array(run.count);
    for (let v = 1; v < run.count; v += 1) this.depth[v] = this.depth[run.idom[v]] + 1;
    this.chains = new Array(run.count);
    this.sets = new Array(run.count);
  }

  /** The same units as a set, for intersecting long chains without a quadratic scan. */
  unitSet(v: number): Set<string> {
    let set = this.sets[v];
    if (!set) this.sets[v] = set = new Set(this.units(v));
    return set;
  }

  lowestCommonAncestor(x: number, y: number): number {
    const { idom } = this.run;
    let a = x;
    let b = y;
    while (this.depth[a] > this.depth[b]) a = idom[a];
    while (this.depth[b] > this.depth[a]) b = idom[b];
    while (a !== b) {
      a = idom[a];
      b = idom[b];
    }
    return a;
  }

  /** The failure units among v and its dominators (preorder numbers), shared by every caller. */
  units(v: number): string[] {
    const cached = this.chains[v];
    if (cached) return cached;
    const chain: string[] = [];
    for (let d = v; d > 0; d = this.run.idom[d]) {
      const node = this.run.nodes[d];
      if (this.graph.isUnit[node]) chain.push(this.graph.ids[node]);
    }
    this.chains[v] = chain;
    return chain;
  }
}
