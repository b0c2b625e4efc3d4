import { describeUnit, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { connectorFor, linkSpeed, reachOf, speedsFor } from '@/shared/rules/cables';
import { portLabel } from '@/shared/topology/index';
import type { Cable } from '@/shared/topology/schema';

/**
 * Physical cable rules from the limits table: one cable per port, matching connectors (and media
 * that fit them), matching speeds, media able to carry the link speed, and length within the reach
 * of the media at that speed. A cable without a length is only noted, since it cannot be checked.
 */
function cableFindings(ctx: AnalysisContext, cable: Cable): Finding[] {
  const a = ctx.index.ports.get(cable.a);
  const b = ctx.index.ports.get(cable.b);
  if (!a || !b) return [];
  const needs = connectorFor(cable.media);
  const speed = linkSpeed(a.port.speedGbps, b.port.speedGbps);
  const reach = reachOf(cable.media, speed);
  const fine = a.port.connector === b.port.connector && a.port.connector === needs && a.port.speedGbps === b.port.speedGbps;
  // Most cables are fine: leave before building any text.
  if (fine && reach && cable.lengthM !== undefined && cable.lengthM <= reach.maxM) return [];
  const name = describeUnit(ctx, cable.id);
  const subjects = [cable.id, a.port.id, b.port.id];
  const out: Finding[] = [];
  if (a.port.connector !== b.port.connector) {
    out.push({
      rule: 'connector-mismatch',
      severity: 'error',
      subjects,
      message: `${name} joins an ${a.port.connector.toUpperCase()} port (${portLabel(a)}) to an ${b.port.connector.toUpperCase()} port (${portLabel(b)}).`,
    });
  } else if (a.port.connector !== needs) {
    out.push({
      rule: 'connector-mismatch',
      severity: 'error',
      subjects,
      message: `${name} is ${cable.media}, which needs ${needs.toUpperCase()} ports, but both ends are ${a.port.connector.toUpperCase()}.`,
    });
  }
  if (a.port.speedGbps !== b.port.speedGbps) {
    out.push({
      rule: 'speed-mismatch',
      severity: 'warning',
      subjects,
      message: `${name} joins a ${a.port.speedGbps} Gb/s port to a ${b.port.speedGbps} Gb/s port; the link runs at ${linkSpeed(a.port.speedGbps, b.port.speedGbps)} Gb/s at best.`,
    });
  }
  if (!reach) {
    const carries = speedsFor(cable.media);
    out.push({
      rule: 'media-unsuited',
      severity: 'error',
      subjects: [cable.id],
      message: `${name} is ${cable.media}, which cannot carry ${speed} Gb/s (it carries ${carries.join(', ')} Gb/s).`,
    });
  } else if (cable.lengthM !== undefined && cable.lengthM > reach.maxM) {
    out.push({
      rule: 'cable-too-long',
      severity: 'error',
      subjects: [cable.id],
      message: `${name} is ${cable.lengthM} m of ${cable.media}; at ${speed} Gb/s it reaches ${reach.maxM} m (${reach.source}).`,
    });
  }
  if (cable.lengthM === undefined) {
    out.push({ rule: 'cable-unmeasured', severity: 'info', subjects: [cable.id], message: `${name} has no length yet.` });
  }
  return out;
}

export function cablingFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const [portId, cables] of ctx.index.cablesByPort) {
    const ref = ctx.index.ports.get(portId);
    if (!ref || cables.length < 2) continue;
    out.push({
      rule: 'port-double-cabled',
      severity: 'error',
      subjects: [portId, ...cables.map((c) => c.id)],
      message: `${portLabel(ref)} is cabled ${cables.length} times (${cables.map((c) => describeUnit(ctx, c.id)).join(', ')}); a port takes one cable.`,
    });
  }
  for (const cable of ctx.doc.cables) out.push(...cableFindings(ctx, cable));
  return out;
}
