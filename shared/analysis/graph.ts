import { dataCables, type AnalysisContext } from '@/shared/analysis/context';
import { IdGraph } from '@/shared/analysis/id-graph';

/**
 * The data-path graph of one document, as a directed graphlib graph whose nodes are the
 * document's own ids (unique across the document), kept out of graphlib's plain-object storage by
 * IdGraph (id-graph.ts), so an id such as `constructor` is a node like any other:
 *
 *   array ─▶ controller ─▶ cable ─▶ switch ⇄ cable ⇄ switch … ─▶ cable ─▶ card ─▶ host
 *                     └──────────── (direct attach) ─────────────▶ cable ─▶ card ─▶ host
 *
 * - Every failure unit (controller, cable, switch, card) is a node of its own, so "this unit cut
 *   that host off" becomes "this node dominates that host" (see dominators.ts).
 * - Only data and shared switches are in the graph; an inter-switch cable gets edges both ways
 *   (switch ⇄ cable ⇄ switch) because a switch forwards in every direction.
 * - Controllers are entered only from their array and hosts only from their cards, and neither has
 *   an edge back into the fabric: hosts and controllers never forward. Management ports and
 *   management switches carry no data path and do not appear.
 * - An edge that leaves a controller port or enters a host port carries that port's `networkId`
 *   (or none); a walk for one network follows only edges of that network or of none.
 * - Failed units (options.failed) are left out, with everything inside them.
 *
 * The analysis builds only the core (`withHosts: false`): arrays, controllers, switches and the
 * cables between them. The host side — cable, card, host, all sink-only — is evaluated from the
 * host attachments instead (attachments.ts), which keeps the graph at the size of the fabric rather
 * than of the host count. `withHosts: true` gives the whole graph, for display and for the tests
 * that check both forms agree.
 */
export type NodeKind = 'array' | 'controller' | 'cable' | 'switch' | 'adapter' | 'host';

export type NodeLabel = { kind: NodeKind };

/** `network` is the networkId of the port the edge passes through, when it is a host or controller port. */
export type EdgeLabel = { network?: string; port?: string };

export type DataPathGraph = IdGraph<NodeLabel, EdgeLabel>;

function ensureNode(graph: DataPathGraph, id: string, kind: NodeKind): void {
  if (!graph.hasNode(id)) graph.setNode(id, { kind });
}

function addArrays(ctx: AnalysisContext, graph: DataPathGraph): void {
  for (const device of ctx.doc.devices) {
    if (device.kind !== 'array') continue;
    ensureNode(graph, device.id, 'array');
    for (const controller of device.controllers) {
      if (ctx.failed.has(controller.id)) continue;
      ensureNode(graph, controller.id, 'controller');
      graph.setEdge(device.id, controller.id, {});
    }
  }
}

export function buildDataPathGraph(ctx: AnalysisContext, options: { withHosts?: boolean } = {}): DataPathGraph {
  const graph: DataPathGraph = new IdGraph();
  addArrays(ctx, graph);
  for (const ends of dataCables(ctx)) {
    const cable = ends.cable;
    const toHost = ends.roleA === 'host' || ends.roleB === 'host';
    if (toHost && !options.withHosts) continue;
    ensureNode(graph, cable.id, 'cable');
    for (const [from, role, otherRole] of [
      [ends.a, ends.roleA, ends.roleB],
      [ends.b, ends.roleB, ends.roleA],
    ] as const) {
      const label: EdgeLabel = { network: from.port.networkId, port: from.port.id };
      if (role === 'controller') {
        graph.setEdge(from.controller!.id, cable.id, label);
      } else if (role === 'host') {
        const adapter = from.adapter!;
        ensureNode(graph, adapter.id, 'adapter');
        ensureNode(graph, from.device.id, 'host');
        graph.setEdge(cable.id, adapter.id, label);
        graph.setEdge(adapter.id, from.device.id, {});
      } else {
        ensureNode(graph, from.device.id, 'switch');
        // Into the switch from a controller or another switch; out of it towards a host or switch.
        if (otherRole !== 'host') graph.setEdge(cable.id, from.device.id, {});
        if (otherRole !== 'controller') graph.setEdge(from.device.id, cable.id, {});
      }
    }
  }
  return graph;
}
