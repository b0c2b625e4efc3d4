import { atSentenceStart, describeUnit, nameOf, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { portLabel, type PortRef } from '@/shared/topology/index';

/**
 * Keeping management and data apart (common practice: data and management on separate switches).
 * Judged per cable, from what sits at each end: a management port on a data switch, a data port on
 * a management switch, or a cable that joins a management switch to a switch carrying data. A
 * shared switch carries both by design, so it is allowed but always warned about.
 */
function switchOf(ref: PortRef | undefined) {
  return ref?.device.kind === 'switch' ? ref.device : undefined;
}

function cableFindings(ctx: AnalysisContext, cableId: string, x: PortRef, y: PortRef): Finding[] {
  const sx = switchOf(x);
  const sy = switchOf(y);
  const cable = describeUnit(ctx, cableId);
  if (sx && sy) {
    const management = sx.role === 'management' ? sx : sy.role === 'management' ? sy : undefined;
    const other = management === sx ? sy : sx;
    if (!management || other.role === 'management') return [];
    return [
      {
        rule: 'management-data-bridge',
        severity: 'error',
        subjects: [management.id, other.id, cableId],
        message: `${atSentenceStart(cable)} joins management switch ${nameOf(ctx, management.id)} to ${other.role} switch ${nameOf(ctx, other.id)}, bridging management into the storage fabric.`,
      },
    ];
  }
  const sw = sx ?? sy;
  const end = sx ? y : x;
  if (!sw || end.device.kind === 'switch') return [];
  if (end.port.role === 'management' && sw.role === 'data') {
    return [
      {
        rule: 'management-port-on-data-switch',
        severity: 'error',
        subjects: [end.port.id, sw.id, cableId],
        message: `The management port ${portLabel(end)} is cabled to data switch ${nameOf(ctx, sw.id)} (${cable}); management belongs on a management switch.`,
      },
    ];
  }
  if (end.port.role === 'data' && sw.role === 'management') {
    return [
      {
        rule: 'data-port-on-management-switch',
        severity: 'error',
        subjects: [end.port.id, sw.id, cableId],
        message: `The data port ${portLabel(end)} is cabled to management switch ${nameOf(ctx, sw.id)} (${cable}); storage traffic needs a data switch.`,
      },
    ];
  }
  return [];
}

export function separationFindings(ctx: AnalysisContext): Finding[] {
  const findings: Finding[] = [];
  const sharedInUse = new Set<string>();
  for (const cable of ctx.doc.cables) {
    const x = ctx.index.ports.get(cable.a);
    const y = ctx.index.ports.get(cable.b);
    if (!x || !y) continue;
    const sx = switchOf(x);
    const sy = switchOf(y);
    if (sx?.role === 'shared') sharedInUse.add(sx.id);
    if (sy?.role === 'shared') sharedInUse.add(sy.id);
    // Host or controller port to a data switch with matching roles: the common case, nothing to say.
    if (!sx !== !sy && (sx ?? sy)!.role !== 'management' && (sx ? y : x).port.role === 'data') continue;
    findings.push(...cableFindings(ctx, cable.id, x, y));
  }
  for (const device of ctx.doc.devices) {
    if (!sharedInUse.has(device.id)) continue;
    findings.push({
      rule: 'shared-switch-in-use',
      severity: 'warning',
      subjects: [device.id],
      message: `Switch ${nameOf(ctx, device.id)} is in use with the shared role, carrying management and data together; keep them on separate switches unless this was agreed.`,
    });
  }
  return findings;
}
