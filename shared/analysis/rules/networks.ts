import { parseCidr, type Cidr } from '@/shared/address/cidr';
import { dataCables, nameOf, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { LIMITS } from '@/shared/rules/limits';
import type { Network } from '@/shared/topology/schema';
import { displayName } from '@/shared/topology/index';

/**
 * Network-level rules: overlapping subnets (between two data or two management networks an overlap
 * is network-overlap; between a management and a data network it is management-data-same-subnet),
 * VLAN ids and MTUs out of range, and MTU mismatch where a data path joins networks of different
 * MTU. A network without an MTU runs the Ethernet default of 1500 (RFC 894).
 */
function overlapFindings(ctx: AnalysisContext): Finding[] {
  const parsed = ctx.doc.networks
    .map((network) => ({ network, block: parseCidr(network.cidr) }))
    .filter((x): x is { network: Network; block: Cidr } => x.block !== null)
    .sort((x, y) => (x.block.family < y.block.family ? -1 : x.block.family > y.block.family ? 1 : x.block.network < y.block.network ? -1 : x.block.network > y.block.network ? 1 : 0));
  const out: Finding[] = [];
  // Sweep in address order: only blocks that start before this one ends can overlap it.
  for (let i = 0; i < parsed.length; i += 1) {
    for (let j = i + 1; j < parsed.length; j += 1) {
      const a = parsed[i];
      const b = parsed[j];
      if (a.block.family !== b.block.family || b.block.network > a.block.last) break;
      const mixed = a.network.purpose !== b.network.purpose;
      out.push({
        rule: mixed ? 'management-data-same-subnet' : 'network-overlap',
        severity: 'error',
        subjects: [a.network.id, b.network.id],
        message: mixed
          ? `The ${a.network.purpose} network ${displayName(a.network)} (${a.network.cidr}) and the ${b.network.purpose} network ${displayName(b.network)} (${b.network.cidr}) share addresses.`
          : `Networks ${displayName(a.network)} (${a.network.cidr}) and ${displayName(b.network)} (${b.network.cidr}) overlap.`,
      });
    }
  }
  return out;
}

function rangeFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const network of ctx.doc.networks) {
    const name = displayName(network);
    if (network.vlan !== undefined && (network.vlan < LIMITS.vlanMin.value || network.vlan > LIMITS.vlanMax.value)) {
      out.push({
        rule: 'vlan-out-of-range',
        severity: 'error',
        subjects: [network.id],
        message: `VLAN ${network.vlan} of ${name} is outside ${LIMITS.vlanMin.value}–${LIMITS.vlanMax.value}.`,
      });
    }
    if (network.mtu !== undefined && (network.mtu < LIMITS.mtuMin.value || network.mtu > LIMITS.mtuMax.value)) {
      out.push({
        rule: 'mtu-out-of-range',
        severity: 'error',
        subjects: [network.id],
        message: `MTU ${network.mtu} of ${name} is outside ${LIMITS.mtuMin.value}–${LIMITS.mtuMax.value}.`,
      });
    }
  }
  return out;
}

/** Groups of ports a data path joins: union–find over data cables and through each forwarding switch. */
function joinedNetworks(ctx: AnalysisContext): Map<string, Set<string>> {
  const parent = new Map<string, string>();
  const find = (x: string): string => {
    while ((parent.get(x) ?? x) !== x) {
      const up = parent.get(x)!;
      parent.set(x, parent.get(up) ?? up);
      x = up;
    }
    return x;
  };
  const union = (a: string, b: string) => {
    const ra = find(a);
    const rb = find(b);
    if (ra !== rb) parent.set(ra, rb);
  };
  const members: [string, string][] = [];
  for (const ends of dataCables(ctx)) {
    // A switch is one group; a host or controller port is a group of its own.
    const key = (ref: typeof ends.a, role: string) => (role === 'switch' ? `switch:${ref.device.id}` : `port:${ref.port.id}`);
    union(key(ends.a, ends.roleA), key(ends.b, ends.roleB));
    if (ends.roleA !== 'switch' && ends.a.port.networkId) members.push([key(ends.a, ends.roleA), ends.a.port.networkId]);
    if (ends.roleB !== 'switch' && ends.b.port.networkId) members.push([key(ends.b, ends.roleB), ends.b.port.networkId]);
  }
  const groups = new Map<string, Set<string>>();
  for (const [key, networkId] of members) {
    const root = find(key);
    const set = groups.get(root);
    if (set) set.add(networkId);
    else groups.set(root, new Set([networkId]));
  }
  return groups;
}

function mtuFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  const seen = new Set<string>();
  for (const networkIds of joinedNetworks(ctx).values()) {
    const data = [...networkIds].map((id) => ctx.index.networks.get(id)!).filter((n) => n.purpose === 'data');
    const mtus = new Set(data.map((n) => n.mtu ?? LIMITS.mtuDefault.value));
    if (mtus.size < 2) continue;
    const ids = data.map((n) => n.id).sort();
    if (seen.has(ids.join('\u0000'))) continue;
    seen.add(ids.join('\u0000'));
    const list = data.map((n) => `${nameOf(ctx, n.id)} (MTU ${n.mtu ?? `${LIMITS.mtuDefault.value} by default`})`).join(', ');
    out.push({
      rule: 'mtu-mismatch',
      severity: 'error',
      subjects: ids,
      message: `Data paths join networks with different MTUs: ${list}; frames larger than the smallest are dropped.`,
    });
  }
  return out;
}

export function networkFindings(ctx: AnalysisContext): Finding[] {
  return [...overlapFindings(ctx), ...rangeFindings(ctx), ...mtuFindings(ctx)];
}
