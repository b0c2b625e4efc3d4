import { blocksOverlap, formatCidr, hasHostBits, parseCidr, type Cidr } from '@/shared/address/cidr';
import { byId, dataCables, nameOf, type AnalysisContext, type DataCableEnds, type EndRole } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { tupleKey } from '@/shared/keys/tuple';
import { LIMITS, LINK_LOCAL_RANGES } from '@/shared/rules/limits';
import type { Network } from '@/shared/topology/schema';
import { displayName } from '@/shared/topology/index';

/**
 * Network-level rules: overlapping subnets (between two data or two management networks an overlap
 * is network-overlap; between a management and a data network it is management-data-same-subnet),
 * VLAN ids and MTUs out of range (an IPv6 network also below 1280), a subnet written with host bits
 * set or inside a link-local range, and MTU mismatch where a data path joins networks of different
 * MTU. A network without an MTU runs the Ethernet default of 1500 (RFC 894).
 */
function compareBlocks(x: { network: Network; block: Cidr }, y: { network: Network; block: Cidr }): number {
  if (x.block.family !== y.block.family) return x.block.family < y.block.family ? -1 : 1;
  if (x.block.network !== y.block.network) return x.block.network < y.block.network ? -1 : 1;
  // The wider block first, so a block is always visited after every block that contains it.
  return x.block.prefix - y.block.prefix || byId(x.network.id, y.network.id);
}

/**
 * CIDR blocks either nest or are disjoint (RFC 4632 §3.1), so overlaps form a containment forest.
 * Each network that overlaps another is reported once, with the narrowest earlier block that contains
 * it (an equal block counts): n networks give at most n − 1 findings, found in one sweep, where listing
 * every pair would grow with the square of the count on a document of many copies of one subnet.
 */
function overlapFindings(ctx: AnalysisContext): Finding[] {
  const parsed = ctx.doc.networks
    .map((network) => ({ network, block: parseCidr(network.cidr) }))
    .filter((x): x is { network: Network; block: Cidr } => x.block !== null)
    .sort(compareBlocks);
  const out: Finding[] = [];
  const open: { network: Network; block: Cidr }[] = [];
  for (const b of parsed) {
    while (open.length > 0) {
      const top = open[open.length - 1];
      if (top.block.family === b.block.family && b.block.network <= top.block.last) break;
      open.pop();
    }
    const a = open[open.length - 1];
    open.push(b);
    if (!a) continue;
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
  return [...overlapFindings(ctx), ...rangeFindings(ctx), ...blockFindings(ctx), ...mtuFindings(ctx)];
}
