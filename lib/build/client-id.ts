/**
 * A random (version 4) UUID for one mark, made on the phone (RFC 9562 §5.4). `crypto.randomUUID`
 * exists only in secure contexts (https, localhost); a phone on the site's network over plain http
 * still has `crypto.getRandomValues`, from which the same kind of UUID is built.
 */
export function newClientId(): string {
  const crypto = globalThis.crypto as (Crypto & { randomUUID?: () => string }) | undefined;
  if (crypto?.randomUUID) return crypto.randomUUID();
  if (!crypto?.getRandomValues) throw new Error('This browser has no random number source for mark ids.');
  return uuidFromBytes(crypto.getRandomValues(new Uint8Array(16)));
}

/** A version 4 UUID from 16 random bytes: the version and variant bits set, the rest kept. */
export function uuidFromBytes(random: Uint8Array): string {
  const bytes = Uint8Array.from(random.subarray(0, 16));
  bytes[6] = (bytes[6] & 0x0f) | 0x40; // version 4
  bytes[8] = (bytes[8] & 0x3f) | 0x80; // variant 10xx (RFC 9562 §4.1)
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
