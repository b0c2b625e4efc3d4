import { blocksOverlap, parseCidr, type Cidr } from '@/shared/address/cidr';
import type { AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { IPV6_GLOBAL_UNICAST, SPECIAL_BLOCKS, type SpecialBlock } from '@/shared/rules/special-blocks';
import type { Network } from '@/shared/topology/schema';
import { displayName } from '@/shared/topology/index';

/**
 * What a network's block is, by the special-purpose registries (shared/rules/special-blocks.ts):
 * loopback, "this network", multicast and reserved space cannot address a port at all (error);
 * shared, protocol and benchmarking space is set aside for other uses (warning); a public block
 * works but storage is normally kept on private addresses (warning); a documentation block is fine
 * for examples like the demo and is only noted (info). One finding per network at most.
 */
const TABLE = SPECIAL_BLOCKS.map((entry) => ({ ...entry, block: parseCidr(entry.cidr)! }));
const GLOBAL_V6 = parseCidr(IPV6_GLOBAL_UNICAST.cidr)!;

function inside(inner: Cidr, outer: Cidr): boolean {
  return inner.family === outer.family && inner.network >= outer.network && inner.last <= outer.last;
}

type Verdict = { use: 'unusable' | 'special' | 'documentation' | 'public'; entry: Pick<SpecialBlock, 'cidr' | 'what' | 'source'> | null };

export function classifyBlock(block: Cidr): Verdict | null {
  const unusable = TABLE.find((e) => e.use === 'unusable' && blocksOverlap(e.block, block));
  if (unusable) return { use: 'unusable', entry: unusable };
  const within = TABLE.find((e) => e.use !== 'unusable' && inside(block, e.block));
  if (within?.use === 'private') return null;
  if (within) return { use: within.use as 'special' | 'documentation', entry: within };
  if (block.family === 'ipv6' && !inside(block, GLOBAL_V6)) {
    return { use: 'unusable', entry: { cidr: 'outside 2000::/3', what: 'IPv6 space the IETF keeps reserved', source: IPV6_GLOBAL_UNICAST.source } };
  }
  return { use: 'public', entry: null };
}

function finding(network: Network, verdict: Verdict): Finding {
  const name = displayName(network);
  const entry = verdict.entry;
  const where = `The network ${name} (${network.cidr})`;
  switch (verdict.use) {
    case 'unusable':
      return {
        rule: 'network-unusable',
        severity: 'error',
        subjects: [network.id],
        message: `${where} lies in the ${entry!.what} (${entry!.cidr}, ${entry!.source}); no storage port can use such addresses.`,
      };
    case 'special':
      return {
        rule: 'network-special-use',
        severity: 'warning',
        subjects: [network.id],
        message: `${where} lies in the ${entry!.what} (${entry!.cidr}, ${entry!.source}), set aside for another use; give storage a private subnet (RFC 1918).`,
      };
    case 'documentation':
      return {
        rule: 'network-documentation',
        severity: 'info',
        subjects: [network.id],
        message: `${where} is in a ${entry!.what} (${entry!.source}), meant for examples such as this one. Before building, replace it with your site's own addresses.`,
      };
    default:
      return {
        rule: 'network-public',
        severity: 'warning',
        subjects: [network.id],
        message: `${where} is public address space. Storage networks normally use private addresses (RFC 1918 or unique local IPv6); keep it only if your organisation holds this block.`,
      };
  }
}

export function specialBlockFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const network of ctx.doc.networks) {
    const block = parseCidr(network.cidr);
    const verdict = block ? classifyBlock(block) : null;
    if (verdict) out.push(finding(network, verdict));
  }
  return out;
}
