import { dataCables, type AnalysisContext } from '@/shared/analysis/context';

/**
 * The host side of the data-path graph, kept out of graphlib. A host port hangs off the fabric as
 * a sink-only branch: upstream node (a switch, or a controller for direct attach) → cable → card →
 * host. Nothing leaves a host, a card or a host cable, so these nodes never change the dominators
 * of the fabric, and the dataflow equation of dominance, dom(v) = {v} ∪ ⋂ dom(p) over v's
 * predecessors p (Cooper, Harvey & Kennedy 2001, §2), gives the host's dominators directly:
 *
 *   dom(host) = ⋂ over its usable attachments of ({card, cable} ∪ dom(upstream))
 *
 * which is what resilience.ts evaluates per (array, network) from the core graph's dominator tree.
 */
export type Attachment = {
  host: string;
  adapter: string;
  cable: string;
  /** The switch the cable comes from, or the controller for a direct-attach cable. */
  upstream: string;
  hostNetwork?: string;
  /** For direct attach: the network of the controller port at the far end. */
  controllerNetwork?: string;
};

export function hostAttachments(ctx: AnalysisContext): Attachment[] {
  const out: Attachment[] = [];
  for (const ends of dataCables(ctx)) {
    const cable = ends.cable;
    const pairs = [
      [ends.a, ends.roleA, ends.b, ends.roleB],
      [ends.b, ends.roleB, ends.a, ends.roleA],
    ] as const;
    for (const [here, role, there, thereRole] of pairs) {
      if (role !== 'host') continue;
      out.push({
        host: here.device.id,
        adapter: here.adapter!.id,
        cable: cable.id,
        upstream: thereRole === 'switch' ? there.device.id : there.controller!.id,
        hostNetwork: here.port.networkId,
        controllerNetwork: thereRole === 'controller' ? there.port.networkId : undefined,
      });
    }
  }
  return out;
}
