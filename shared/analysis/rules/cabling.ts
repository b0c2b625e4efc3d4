import { atSentenceStart, describeUnit, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { connectorFor, linkSpeed, MEDIA_NAMES, reachOf, speedsFor } from '@/shared/rules/cables';
import { portLabel, type PortRef } from '@/shared/topology/index';
import type { Cable } from '@/shared/topology/schema';

/**
 * Physical cable rules from the limits table: one cable per port, matching connectors (and media
 * that fit them), matching speeds, media able to carry the link speed, and length within the reach
 * of the media at that speed. A cable without a length is only noted, since it cannot be checked.
 * Two wiring slips that no data path notices are named too: a cable straight from one host to
 * another (or one controller to another), which carries no storage path because neither forwards,
 * and a cable straight from a data port to a management port.
 */
function physicalFindings(ctx: AnalysisContext, cable: Cable, a: PortRef, b: PortRef, out: Finding[]): void {
  const needs = connectorFor(cable.media);
  const speed = linkSpeed(a.port.speedGbps, b.port.speedGbps);
  const reach = reachOf(cable.media, speed);
  const fine = a.port.connector === b.port.connector && a.port.connector === needs && a.port.speedGbps === b.port.speedGbps;
  // Most cables are fine: leave before building any text.
  if (fine && reach && cable.lengthM !== undefined && cable.lengthM <= reach.maxM) return;
  const name = atSentenceStart(describeUnit(ctx, cable.id));
  const media = MEDIA_NAMES[cable.media];
  const subjects = [cable.id, a.port.id, b.port.id];
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
      message: `${name} is ${media}, which needs ${needs.toUpperCase()} ports, but both ends are ${a.port.connector.toUpperCase()}.`,
    });
  }
  if (a.port.speedGbps !== b.port.speedGbps) {
    out.push({
      rule: 'speed-mismatch',
      severity: 'warning',
      subjects,
      message: `${name} joins a ${a.port.speedGbps} Gb/s port to a ${b.port.speedGbps} Gb/s port; the link runs at ${speed} Gb/s at best.`,
    });
  }
  if (!reach) {
    out.push({
      rule: 'media-unsuited',
      severity: 'error',
      subjects: [cable.id],
      message: `${name} is ${media}, which cannot carry ${speed} Gb/s (it carries ${orList(speedsFor(cable.media))} Gb/s).`,
    });
  } else if (cable.lengthM !== undefined && cable.lengthM > reach.maxM) {
    out.push({
      rule: 'cable-too-long',
      severity: 'error',
      subjects: [cable.id],
      message: `${name} is ${cable.lengthM} m of ${media}, longer than the ${reach.maxM} m it reaches at ${speed} Gb/s (${reach.source}).`,
    });
  }
  if (cable.lengthM === undefined) {
    out.push({ rule: 'cable-unmeasured', severity: 'info', subjects: [cable.id], message: `${name} has no length yet.` });
  }
}

function orList(values: number[]): string {
  return values.length < 2 ? values.join('') : `${values.slice(0, -1).join(', ')} or ${values[values.length - 1]}`;
}

const ENDPOINT_WORDS = { host: 'hosts', array: 'controllers' } as const;

function endpointFindings(ctx: AnalysisContext, cable: Cable, a: PortRef, b: PortRef, out: Finding[]): void {
  if (a.device.kind === 'switch' || b.device.kind === 'switch') return;
  const name = atSentenceStart(describeUnit(ctx, cable.id));
  if (a.device.kind === b.device.kind) {
    out.push({
      rule: 'cable-between-endpoints',
      severity: 'warning',
      subjects: [cable.id, a.port.id, b.port.id],
      message: `${name} joins ${portLabel(a)} to ${portLabel(b)}; ${ENDPOINT_WORDS[a.device.kind]} do not forward, so it carries no storage path.`,
    });
  } else if (a.port.role !== b.port.role) {
    const [data, management] = a.port.role === 'data' ? [a, b] : [b, a];
    out.push({
      rule: 'port-role-mismatch',
      severity: 'error',
      subjects: [cable.id, data.port.id, management.port.id],
      message: `${name} joins the data port ${portLabel(data)} straight to the management port ${portLabel(management)}; neither storage nor management traffic can use it.`,
    });
  }
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
      message: `${portLabel(ref)} is cabled ${cables.length === 2 ? 'twice' : `${cables.length} times`} (${cables.map((c) => describeUnit(ctx, c.id)).join(', ')}); a port takes one cable.`,
    });
  }
  for (const cable of ctx.doc.cables) {
    const a = ctx.index.ports.get(cable.a);
    const b = ctx.index.ports.get(cable.b);
    if (!a || !b) continue;
    physicalFindings(ctx, cable, a, b, out);
    endpointFindings(ctx, cable, a, b, out);
  }
  return out;
}
