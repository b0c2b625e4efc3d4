import { nameOf, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { displayName, portLabel, type PortRef } from '@/shared/topology/index';

/**
 * Target portals: the controller data ports initiators log in to.
 * - A portal on DHCP can move; initiators keep the address discovery gave them (common practice:
 *   target portals have static addresses).
 * - On direct attach every host-to-controller cable is a link of its own. When two or more such
 *   links of one controller share a subnet, the controller cannot tell which port answers for which
 *   address and replies may leave by the wrong cable (common practice: one subnet per link).
 */
function directLinksByController(ctx: AnalysisContext): Map<string, PortRef[]> {
  const byController = new Map<string, PortRef[]>();
  for (const cable of ctx.doc.cables) {
    const ends = [ctx.index.ports.get(cable.a), ctx.index.ports.get(cable.b)];
    const controllerEnd = ends.find((r) => r?.controller && r.port.role === 'data');
    const hostEnd = ends.find((r) => r?.adapter && r.port.role === 'data');
    if (!controllerEnd || !hostEnd) continue;
    const list = byController.get(controllerEnd.controller!.id);
    if (list) list.push(controllerEnd);
    else byController.set(controllerEnd.controller!.id, [controllerEnd]);
  }
  return byController;
}

function sharedSubnetFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const [controllerId, refs] of directLinksByController(ctx)) {
    const byNetwork = new Map<string, PortRef[]>();
    for (const ref of refs) {
      const networkId = ref.port.networkId;
      if (networkId === undefined || !ctx.index.networks.has(networkId)) continue;
      const list = byNetwork.get(networkId);
      if (list) {
        if (!list.includes(ref)) list.push(ref);
      } else byNetwork.set(networkId, [ref]);
    }
    for (const [networkId, ports] of byNetwork) {
      if (ports.length < 2) continue;
      const { controller, array } = ctx.index.controllers.get(controllerId)!;
      out.push({
        rule: 'direct-attach-shared-subnet',
        severity: 'warning',
        subjects: [controllerId, networkId, ...ports.map((p) => p.port.id)],
        message: `Controller ${displayName(controller)} of ${displayName(array)} has ${ports.length} direct-attach links on one subnet, ${nameOf(ctx, networkId)} (${ports.map(portLabel).join(', ')}); give each link its own subnet so replies leave by the cable they came in on.`,
      });
    }
  }
  return out;
}

function dhcpPortalFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const ref of ctx.index.ports.values()) {
    if (!ref.controller || ref.port.role !== 'data' || ref.port.address?.mode !== 'dhcp') continue;
    out.push({
      rule: 'target-address-dhcp',
      severity: 'warning',
      subjects: [ref.port.id],
      message: `The target port ${portLabel(ref)} takes its address from DHCP; a target portal should not move, because initiators keep the address they discovered. Give it a static address.`,
    });
  }
  return out;
}

export function portalFindings(ctx: AnalysisContext): Finding[] {
  return [...dhcpPortalFindings(ctx), ...sharedSubnetFindings(ctx)];
}
