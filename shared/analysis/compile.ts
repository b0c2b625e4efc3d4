import type { DataPathGraph, NodeKind } from '@/shared/analysis/graph';

/**
 * The data-path graph copied once into flat typed arrays (compressed sparse rows): node i's
 * successors are `targets[offsets[i] .. offsets[i+1])`, and `edgeNetwork[e]` is the network code
 * of edge e (-1 for an edge that belongs to every network). The dominator runs, one per
 * (array, network), walk these arrays instead of graphlib's string-keyed maps, which keeps the
 * whole analysis linear in practice and its memory small.
 */
export type CompiledGraph = {
  ids: string[];
  kinds: NodeKind[];
  /** 1 where the node is a failure unit (controller, cable, switch, card), else 0. */
  isUnit: Uint8Array;
  indexOf: Map<string, number>;
  offsets: Int32Array;
  targets: Int32Array;
  edgeNetwork: Int32Array;
  networkCode: Map<string, number>;
};

export const ANY_NETWORK = -1;

export function compileGraph(graph: DataPathGraph): CompiledGraph {
  const ids = graph.nodes();
  const indexOf = new Map<string, number>();
  ids.forEach((id, i) => indexOf.set(id, i));
  const kinds = ids.map((id) => graph.node(id)!.kind);
  const isUnit = Uint8Array.from(kinds, (kind) => (kind === 'array' || kind === 'host' ? 0 : 1));
  const networkCode = new Map<string, number>();
  const offsets = new Int32Array(ids.length + 1);
  const targets = new Int32Array(graph.edgeCount());
  const edgeNetwork = new Int32Array(graph.edgeCount());
  let e = 0;
  for (let i = 0; i < ids.length; i += 1) {
    offsets[i] = e;
    for (const edge of graph.outEdges(ids[i]) ?? []) {
      const network = graph.edge(edge.v, edge.w)?.network;
      let code = ANY_NETWORK;
      if (network !== undefined) {
        code = networkCode.get(network) ?? networkCode.size;
        networkCode.set(network, code);
      }
      targets[e] = indexOf.get(edge.w)!;
      edgeNetwork[e] = code;
      e += 1;
    }
  }
  offsets[ids.length] = e;
  return { ids, kinds, isUnit, indexOf, offsets, targets, edgeNetwork, networkCode };
}
