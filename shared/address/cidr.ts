import { familyBits, formatIp, parseIp, type Family, type Ip } from '@/shared/address/ip';

/**
 * Subnet math on parsed CIDR blocks. Sizes are bigints because an IPv6 /64 has 2^64 addresses.
 * Rules followed: an IPv4 subnet loses its network and broadcast address to hosts, except /31
 * (both addresses are hosts, RFC 3021 §2.1) and /32; IPv6 has no broadcast, and its all-zero
 * interface identifier is the subnet-router anycast address (RFC 4291 §2.6.1), not for hosts,
 * except on /127 point-to-point links (RFC 6164) and /128.
 */
export type Cidr = {
  family: Family;
  prefix: number;
  network: bigint;
  last: bigint;
  /** The address as written before the prefix; differs from `network` when host bits are set. */
  written: bigint;
};

export function parseCidr(text: string): Cidr | null {
  if (typeof text !== 'string') return null;
  const slash = text.indexOf('/');
  if (slash < 0 || slash !== text.lastIndexOf('/')) return null;
  const ip = parseIp(text.slice(0, slash));
  const prefixText = text.slice(slash + 1);
  // A prefix length has no leading zeros in the notation tools print (common practice): "/024" is a slip.
  if (!ip || !/^(0|[1-9]\d{0,2})$/.test(prefixText)) return null;
  const prefix = Number(prefixText);
  const bits = familyBits(ip.family);
  if (prefix > bits) return null;
  const size = BigInt(1) << BigInt(bits - prefix);
  const network = (ip.value / size) * size;
  return { family: ip.family, prefix, network, last: network + size - BigInt(1), written: ip.value };
}

export function isValidCidr(text: string): boolean {
  return parseCidr(text) !== null;
}

/**
 * Whether the block is written with host bits set (`198.51.100.7/24`). Readable, and read as the
 * block it lies in (`198.51.100.0/24`), so the schema accepts it and the analysis reports it.
 */
export function hasHostBits(block: Cidr): boolean {
  return block.written !== block.network;
}

/** The block in canonical text: network address and prefix (`198.51.100.0/24`). */
export function formatCidr(block: Cidr): string {
  return `${formatIp({ family: block.family, value: block.network })}/${block.prefix}`;
}

/** The network address of a block, as text (`198.51.100.0`). */
export function networkAddress(cidr: string): string | null {
  const block = parseCidr(cidr);
  return block ? formatIp({ family: block.family, value: block.network }) : null;
}

/** The IPv4 broadcast address; null for IPv6, which has none. */
export function broadcastAddress(cidr: string): string | null {
  const block = parseCidr(cidr);
  if (!block || block.family !== 'ipv4') return null;
  return formatIp({ family: 'ipv4', value: block.last });
}

/** Every address in the block, including the ones hosts may not use. */
export function blockSize(block: Cidr): bigint {
  return block.last - block.network + BigInt(1);
}

/** The lowest and highest address a host may be given in this block. */
export function usableRange(block: Cidr): { first: bigint; last: bigint } {
  const hostBits = familyBits(block.family) - block.prefix;
  if (hostBits <= 1) return { first: block.network, last: block.last };
  if (block.family === 'ipv4') return { first: block.network + BigInt(1), last: block.last - BigInt(1) };
  return { first: block.network + BigInt(1), last: block.last };
}

/** How many addresses hosts may use: 254 for an IPv4 /24. */
export function usableCount(cidr: string): bigint | null {
  const block = parseCidr(cidr);
  if (!block) return null;
  const range = usableRange(block);
  return range.last - range.first + BigInt(1);
}

export function containsIp(block: Cidr, ip: Ip): boolean {
  return block.family === ip.family && ip.value >= block.network && ip.value <= block.last;
}

/** Whether the address lies inside the block (false across families or for bad input). */
export function contains(cidr: string, address: string): boolean {
  const block = parseCidr(cidr);
  const ip = parseIp(address);
  return !!block && !!ip && containsIp(block, ip);
}

export function blocksOverlap(a: Cidr, b: Cidr): boolean {
  return a.family === b.family && a.network <= b.last && b.network <= a.last;
}

/** Whether two blocks share at least one address. */
export function overlap(a: string, b: string): boolean {
  const left = parseCidr(a);
  const right = parseCidr(b);
  return !!left && !!right && blocksOverlap(left, right);
}

/**
 * Addresses a host must not be given in this block: the IPv4 network and broadcast addresses,
 * or the IPv6 subnet-router anycast address (see the rules at the top of this file).
 */
export function isReservedInBlock(block: Cidr, ip: Ip): boolean {
  if (!containsIp(block, ip)) return false;
  const range = usableRange(block);
  return ip.value < range.first || ip.value > range.last;
}
