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

const DOTTED_QUAD = /^(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)$/;

/**
 * ipaddr.js also accepts "1.2.3", hex and octal IPv4 forms; a storage port address is always a
 * dotted quad without leading zeros (which some tools read as octal), so IPv4 is matched exactly
 * here and IPv6 goes to ipaddr.js. A zone index (`fe80::1%eth0`) names an interface of one
 * machine and has no place in a shared design. The analysis parses every address of a design, so
 * this avoids ipaddr.js's exception-driven detection of the family.
 */
export function parseIp(text: string): Ip | null {
  if (typeof text !== 'string' || text.length > 64 || text.includes('%')) return null;
  const quad = DOTTED_QUAD.exec(text);
  if (quad) {
    const value = ((Number(quad[1]) * 256 + Number(quad[2])) * 256 + Number(quad[3])) * 256 + Number(quad[4]);
    return { family: 'ipv4', value: BigInt(value) };
  }
  if (!text.includes(':')) return null;
  let parts: number[];
  try {
    // parse() throws on exactly what isValid() rejects; one call instead of two.
    parts = ipaddr.IPv6.parse(text).parts;
  } catch {
    return null;
  }
  let value = BigInt(0);
  for (const part of parts) value = (value << BigInt(16)) | BigInt(part);
  return { family: 'ipv6', value };
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

/** A key equal for equal addresses, cheaper than formatting them. */
export function ipKey(ip: Ip): string {
  return `${ip.family}:${ip.value.toString(16)}`;
}

/** The same address in canonical text, or null when it is not an address. */
export function normalizeIp(text: string): string | null {
  const ip = parseIp(text);
  return ip ? formatIp(ip) : null;
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
