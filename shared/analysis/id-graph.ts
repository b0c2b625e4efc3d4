import { Graph } from '@dagrejs/graphlib';

/**
 * A directed graphlib graph whose nodes are named by the document's own ids, without those ids
 * ever reaching graphlib. graphlib keeps nodes and edges in plain objects and tests membership
 * with `in`, so an id such as `constructor`, `toString` or `__proto__` is a node that "already
 * exists" before it is added (the analysis then loops or reads a function as a label), and it keys
 * an edge by the two names joined with U+0001, so ids that hold U+0001 make two edges one.
 *
 * Here each id is given a name of our own when its node is added — `n` and a serial number — kept
 * in a Map both ways; graphlib only ever sees those names, which can neither be an
 * Object.prototype member nor contain U+0001, so every node and every edge is its own whatever
 * the ids hold. The methods mirror graphlib's, in ids.
 */
export type IdEdge = { v: string; w: string };

const PREFIX = 'n';

export class IdGraph<N, E> {
  private readonly graph = new Graph<unknown, N, E>({ directed: true });
  private readonly serial = new Map<string, number>();
  private readonly ids: string[] = [];

  private nameOf(id: string): string | undefined {
    const n = this.serial.get(id);
    return n === undefined ? undefined : PREFIX + n;
  }

  private idOf(name: string): string {
    return this.ids[Number(name.slice(PREFIX.length))];
  }

  private existing(id: string): string {
    const name = this.nameOf(id);
    if (name === undefined) throw new Error(`The graph has no node ${JSON.stringify(id)}.`);
    return name;
  }

  /** Adds the node, or sets its label when it is there already. */
  setNode(id: string, label: N): this {
    let name = this.nameOf(id);
    if (name === undefined) {
      this.serial.set(id, this.ids.length);
      name = PREFIX + this.ids.length;
      this.ids.push(id);
    }
    this.graph.setNode(name, label);
    return this;
  }

  hasNode(id: string): boolean {
    return this.serial.has(id);
  }

  node(id: string): N | undefined {
    const name = this.nameOf(id);
    return name === undefined ? undefined : this.graph.node(name);
  }

  /** Every node's id, in the order the nodes were added. */
  nodes(): string[] {
    return this.ids.slice();
  }

  nodeCount(): number {
    return this.ids.length;
  }

  edgeCount(): number {
    return this.graph.edgeCount();
  }

  /** Adds the edge v → w (both nodes must exist), or sets its label when it is there already. */
  setEdge(v: string, w: string, label: E): this {
    this.graph.setEdge(this.existing(v), this.existing(w), label);
    return this;
  }

  edge(v: string, w: string): E | undefined {
    const a = this.nameOf(v);
    const b = this.nameOf(w);
    return a === undefined || b === undefined ? undefined : this.graph.edge(a, b);
  }

  hasEdge(v: string, w: string): boolean {
    const a = this.nameOf(v);
    const b = this.nameOf(w);
    return a !== undefined && b !== undefined && this.graph.hasEdge(a, b);
  }

  successors(id: string): string[] | undefined {
    const name = this.nameOf(id);
    return name === undefined ? undefined : this.graph.successors(name)?.map((s) => this.idOf(s));
  }

  predecessors(id: string): string[] | undefined {
    const name = this.nameOf(id);
    return name === undefined ? undefined : this.graph.predecessors(name)?.map((p) => this.idOf(p));
  }

  /** The edges leaving the node, in the order they were added. */
  outEdges(id: string): IdEdge[] | undefined {
    const name = this.nameOf(id);
    if (name === undefined) return undefined;
    return this.graph.outEdges(name)?.map((edge) => ({ v: this.idOf(edge.v), w: this.idOf(edge.w) }));
  }
}
