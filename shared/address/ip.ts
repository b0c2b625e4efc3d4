import ipaddr from 'ipaddr.js';

/**
 * Address parsing for the topology: one strict reading of IPv4 (dotted quad only) and IPv6
 * (no zone index), and a bigint view of every address so that subnet math is plain integer math
 * for both families.
 */
export type Family = 'ipv4' | 'ipv6';

export type Ip = { family: Family; value: bigint };

const BITS: Record<Family, number> = { ipv4: 32, ipv6: 128 };

export function familyBits(family: Family): number {
  return BITS[family];
}

/**
 * ipaddr.js also accepts "1.2.3", hex and octal IPv4 forms; a storage port address is always a
 * dotted quad, so IPv4 goes through the four-part-decimal check. A zone index (`fe80::1%eth0`)
 * names an interface of one machine and has no place in a shared design.
 */
export function parseIp(text: string): Ip | null {
  if (typeof text !== 'string' || text.length > 64 || text.includes('%')) return null;
  if (ipaddr.IPv4.isValidFourPartDecimal(text)) {
    return { family: 'ipv4', value: bytesToBigint(ipaddr.IPv4.parse(text).toByteArray()) };
  }
  if (!text.includes(':') || !ipaddr.IPv6.isValid(text)) return null;
  return { family: 'ipv6', value: bytesToBigint(ipaddr.IPv6.parse(text).toByteArray()) };
}

export function isValidIp(text: string): boolean {
  return parseIp(text) !== null;
}

/** The canonical text of an address: dotted quad, or RFC 5952 compressed lowercase IPv6. */
export function formatIp(ip: Ip): string {
  const bytes = bigintToBytes(ip.value, BITS[ip.family] / 8);
  const parsed = ipaddr.fromByteArray(bytes);
  return ip.family === 'ipv4' ? parsed.toString() : (parsed as ipaddr.IPv6).toRFC5952String();
}

/** The same address in canonical text, or null when it is not an address. */
export function normalizeIp(text: string): string | null {
  const ip = parseIp(text);
  return ip ? formatIp(ip) : null;
}

function bytesToBigint(bytes: number[]): bigint {
  let value = BigInt(0);
  for (const byte of bytes) value = (value << BigInt(8)) | BigInt(byte);
  return value;
}

function bigintToBytes(value: bigint, length: number): number[] {
  const bytes = new Array<number>(length);
  let rest = value;
  for (let i = length - 1; i >= 0; i -= 1) {
    bytes[i] = Number(rest & BigInt(255));
    rest >>= BigInt(8);
  }
  return bytes;
}
