import { formatIp, parseIp } from '@/shared/address/ip';
import { parseCidr, usableRange } from '@/shared/address/cidr';

/**
 * Automatic addressing for the canvas. Deterministic: always the lowest free host address,
 * counting up from the first usable one, never the network, broadcast or subnet-router anycast
 * address, the gateway, a reserved address or one already used.
 */
export type AssignOptions = {
  gateway?: string;
  reserved?: readonly string[];
  /**
   * `low` (the default): lowest free first. `high`: the block's high half — hosts by the usual
   * convention, above the targets (common practice) — counting up from the middle of the first
   * 256 usable addresses (of the whole block when smaller), then, when that runs out, down from
   * just below the middle.
   */
  from?: 'low' | 'high';
};

/** Where the high half starts: the middle of the first 256 usable addresses, or of a smaller block. */
export const HIGH_BLOCK_WINDOW = BigInt(256);

function takenSet(cidrFamily: string, texts: readonly (string | undefined)[]): Set<bigint> {
  const taken = new Set<bigint>();
  for (const text of texts) {
    if (!text) continue;
    const ip = parseIp(text);
    if (ip && ip.family === cidrFamily) taken.add(ip.value);
  }
  return taken;
}

/**
 * Up to `count` free addresses of the block, lowest first. Fewer come back when the block runs out;
 * an unreadable CIDR gives none.
 */
export function assignAddresses(
  cidr: string,
  count: number,
  used: readonly string[] = [],
  options: AssignOptions = {},
): string[] {
  const block = parseCidr(cidr);
  if (!block || count <= 0) return [];
  const taken = takenSet(block.family, [...used, options.gateway, ...(options.reserved ?? [])]);
  const range = usableRange(block);
  const result: string[] = [];
  const one = BigInt(1);
  const take = (value: bigint) => {
    if (!taken.has(value)) result.push(formatIp({ family: block.family, value }));
  };
  if (options.from === 'high') {
    const size = range.last - range.first + one;
    const window = size < HIGH_BLOCK_WINDOW ? size : HIGH_BLOCK_WINDOW;
    const middle = range.first + window / BigInt(2);
    for (let value = middle; value <= range.last && result.length < count; value += one) take(value);
    for (let value = middle - one; value >= range.first && result.length < count; value -= one) take(value);
    return result;
  }
  // Each taken address costs at most one extra step, so this ends after count + |taken| steps.
  for (let value = range.first; value <= range.last && result.length < count; value += one) take(value);
  return result;
}

/** The lowest free host address of the block, or null when it is full or unreadable. */
export function nextFreeAddress(
  cidr: string,
  used: readonly string[] = [],
  options: AssignOptions = {},
): string | null {
  return assignAddresses(cidr, 1, used, options)[0] ?? null;
}
