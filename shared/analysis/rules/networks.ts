import { blocksOverlap, formatCidr, hasHostBits, parseCidr, type Cidr } from '@/shared/address/cidr';
import { atSentenceStart, byId, dataCables, nameOf, type AnalysisContext, type DataCableEnds, type EndRole } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { tupleKey } from '@/shared/keys/tuple';
import { LIMITS, LINK_LOCAL_RANGES } from '@/shared/rules/limits';
import type { Network } from '@/shared/topology/schema';
import { displayName } from '@/shared/topology/index';

/**
 * Network-level rules: overlapping subnets (network-overlap, whatever the two networks' purposes;
 * a management network sharing addresses with a data network is also management-data-same-subnet),
 * a management and a data network on one VLAN id, VLAN ids and MTUs out of range (an IPv6 network
 * also below 1280), a subnet written with host bits set or inside a link-local range, and MTU
 * mismatch where a data path joins networks of different MTU. A network without an MTU runs the
 * Ethernet default of 1500 (RFC 894).
 */
type Parsed = { network: Network; block: Cidr };

function compareBlocks(x: Parsed, y: Parsed): number {
  if (x.block.family !== y.block.family) return x.block.family < y.block.family ? -1 : 1;
  if (x.block.network !== y.block.network) return x.block.network < y.block.network ? -1 : 1;
  // The wider block first, so a block is always visited after every block that contains it.
  return x.block.prefix - y.block.prefix || byId(x.network.id, y.network.id);
}

/** One open block of the sweep, with the nearest open block of each purpose at or below it. */
type Open = Parsed & { nearest: Record<Network['purpose'], Parsed | null> };

function overlapFinding(a: Parsed, b: Parsed): Finding {
  const mixed = a.network.purpose !== b.network.purpose;
  const what = (x: Parsed) => `${mixed ? `the ${x.network.purpose} network ` : ''}${displayName(x.network)} (${x.network.cidr})`;
  return {
    rule: 'network-overlap',
    severity: 'error',
    subjects: [a.network.id, b.network.id],
    message: `${atSentenceStart(`${mixed ? '' : 'networks '}${what(a)}`)} and ${what(b)} overlap; an address in both cannot tell which network it is on.`,
  };
}

function mixedFinding(a: Parsed, b: Parsed): Finding {
  const [m, d] = a.network.purpose === 'management' ? [a, b] : [b, a];
  return {
    rule: 'management-data-same-subnet',
    severity: 'error',
    subjects: [a.network.id, b.network.id],
    message: `The management network ${displayName(m.network)} (${m.network.cidr}) and the data network ${displayName(d.network)} (${d.network.cidr}) share addresses; management and data must not share a subnet.`,
  };
}

/**
 * CIDR blocks either nest or are disjoint (RFC 4632 §3.1), so overlaps form a containment forest,
 * swept once in order with the chain of open (containing) blocks on a stack. Each network inside
 * an earlier one is reported once, with the narrowest earlier block that contains it (an equal
 * block counts), of any purpose; and once more, with the narrowest containing block of the other
 * purpose, when there is one. So n networks give at most 2(n − 1) findings, where listing every
 * pair would grow with the square of the count on a document of many copies of one subnet.
 */
function overlapFindings(ctx: AnalysisContext): Finding[] {
  const parsed = ctx.doc.networks
    .map((network) => ({ network, block: parseCidr(network.cidr) }))
    .filter((x): x is Parsed => x.block !== null)
    .sort(compareBlocks);
  const out: Finding[] = [];
  const open: Open[] = [];
  for (const b of parsed) {
    while (open.length > 0) {
      const top = open[open.length - 1];
      if (top.block.family === b.block.family && b.block.network <= top.block.last) break;
      open.pop();
    }
    const parent = open[open.length - 1];
    const other = b.network.purpose === 'data' ? 'management' : 'data';
    if (parent) {
      out.push(overlapFinding(parent, b));
      const mixed = parent.nearest[other];
      if (mixed) out.push(mixedFinding(mixed, b));
    }
    const nearest = { data: parent?.nearest.data ?? null, management: parent?.nearest.management ?? null };
    nearest[b.network.purpose] = b;
    open.push({ ...b, nearest });
  }
  return out;
}

/** A management and a data network tagged with one VLAN id share a layer-2 domain (common practice: keep them apart). */
function sharedVlanFindings(ctx: AnalysisContext): Finding[] {
  const byVlan = new Map<number, { data: Network[]; management: Network[] }>();
  for (const network of ctx.doc.networks) {
    if (network.vlan === undefined) continue;
    let entry = byVlan.get(network.vlan);
    if (!entry) byVlan.set(network.vlan, (entry = { data: [], management: [] }));
    entry[network.purpose].push(network);
  }
  const out: Finding[] = [];
  for (const [vlan, { data, management }] of byVlan) {
    if (data.length === 0 || management.length === 0) continue;
    const names = (list: Network[]) => list.map(displayName).join(', ');
    out.push({
      rule: 'management-data-same-vlan',
      severity: 'error',
      subjects: [...management, ...data].map((n) => n.id),
      message: `VLAN ${vlan} carries management (${names(management)}) and data (${names(data)}) networks, so they share one layer-2 domain; give management its own VLAN.`,
    });
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
    } else if (network.mtu !== undefined && network.mtu < LIMITS.mtuMinIpv6.value && parseCidr(network.cidr)?.family === 'ipv6') {
      out.push({
        rule: 'mtu-out-of-range',
        severity: 'error',
        subjects: [network.id],
        message: `MTU ${network.mtu} of ${name} is below ${LIMITS.mtuMinIpv6.value}, the least an IPv6 link may have.`,
      });
    }
  }
  return out;
}

const LINK_LOCAL = LINK_LOCAL_RANGES.map((range) => ({ ...range, block: parseCidr(range.cidr)! }));

/** How a subnet is written: host bits set (read as the block it lies in), or a link-local range. */
function blockFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const network of ctx.doc.networks) {
    const block = parseCidr(network.cidr);
    if (!block) continue;
    const name = displayName(network);
    if (hasHostBits(block)) {
      out.push({
        rule: 'cidr-host-bits',
        severity: 'warning',
        subjects: [network.id],
        message: `The subnet of ${name} is written ${network.cidr}, with host bits set; it is read as ${formatCidr(block)}. Write the network address.`,
      });
    }
    const local = LINK_LOCAL.find((range) => blocksOverlap(range.block, block));
    if (local) {
      out.push({
        rule: 'network-link-local',
        severity: 'warning',
        subjects: [network.id],
        message: `${name} (${network.cidr}) lies in the link-local range ${local.cidr}, which hosts give themselves when no address is set; storage ports need a routable subnet.`,
      });
    }
  }
  return out;
}

/** The networks on the two sides of one group of joined ports. */
type Sides = { host: Set<string>; controller: Set<string> };

/**
 * Which networks data paths join. Ports joined by data cables and through forwarding switches fall
 * in one group (union–find with path halving; a switch is one member, a host or controller port
 * another, keyed by id, since ids are unique across the document). A data path always runs from a
 * host port to a controller port, so each group keeps its host-side and controller-side networks
 * apart: a switch with only controllers (or only hosts) on it joins no networks yet.
 */
function joinedNetworks(ctx: AnalysisContext): Sides[] {
  const parent = new Map<string, string>();
  const find = (x: string): string => {
    let node = x;
    for (let up = parent.get(node); up !== undefined && up !== node; up = parent.get(node)) {
      const grand = parent.get(up) ?? up;
      parent.set(node, grand);
      node = grand;
    }
    return node;
  };
  const cables = dataCables(ctx);
  for (const ends of cables) {
    const a = ends.roleA === 'switch' ? ends.a.device.id : ends.a.port.id;
    const b = ends.roleB === 'switch' ? ends.b.device.id : ends.b.port.id;
    const ra = find(a);
    const rb = find(b);
    if (ra !== rb) parent.set(ra, rb);
  }
  const groups = new Map<string, Sides>();
  const note = (ref: DataCableEnds['a'], role: EndRole) => {
    const networkId = ref.port.networkId;
    if (role === 'switch' || networkId === undefined) return;
    const root = find(ref.port.id);
    let sides = groups.get(root);
    if (!sides) groups.set(root, (sides = { host: new Set(), controller: new Set() }));
    (role === 'host' ? sides.host : sides.controller).add(networkId);
  };
  for (const ends of cables) {
    note(ends.a, ends.roleA);
    note(ends.b, ends.roleB);
  }
  return [...groups.values()];
}

function mtuOf(network: Network): number {
  return network.mtu ?? LIMITS.mtuDefault.value;
}

/**
 * mtu-mismatch: a data path joins a host port and a controller port whose data networks have
 * different MTUs. When both sides of a group have a data network and the group's data networks do
 * not all share one MTU, some host-side and controller-side pair differs, so the finding names
 * every data network of the group.
 */
function mtuFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  const seen = new Set<string>();
  const dataNetworks = (ids: Set<string>) =>
    [...ids].map((id) => ctx.index.networks.get(id)!).filter((n) => n.purpose === 'data');
  for (const sides of joinedNetworks(ctx)) {
    const hostSide = dataNetworks(sides.host);
    const controllerSide = dataNetworks(sides.controller);
    if (hostSide.length === 0 || controllerSide.length === 0) continue;
    const data = [...new Set([...hostSide, ...controllerSide])].sort((x, y) => byId(x.id, y.id));
    if (new Set(data.map(mtuOf)).size < 2) continue;
    const key = tupleKey(data.map((n) => n.id));
    if (seen.has(key)) continue;
    seen.add(key);
    const list = data.map((n) => `${nameOf(ctx, n.id)} (MTU ${n.mtu ?? `${LIMITS.mtuDefault.value} by default`})`).join(', ');
    out.push({
      rule: 'mtu-mismatch',
      severity: 'error',
      subjects: data.map((n) => n.id),
      message: `Data paths join networks with different MTUs: ${list}; frames larger than the smallest are dropped.`,
    });
  }
  return out;
}

export function networkFindings(ctx: AnalysisContext): Finding[] {
  return [...overlapFindings(ctx), ...sharedVlanFindings(ctx), ...rangeFindings(ctx), ...blockFindings(ctx), ...mtuFindings(ctx)];
}
