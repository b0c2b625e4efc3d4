import { emptyRecord } from '@/shared/keys/record';

/**
 * Canonical JSON: object keys sorted (code-unit order) at every depth, arrays kept in order, no
 * whitespace, undefined members dropped. Two documents that differ only in key order get the same
 * text: the server hashes it for a version's content hash, the editor compares working copies by it.
 * The sorted copies have no prototype, so a layout key `__proto__` (a device id) is kept as a key
 * instead of replacing the copy's prototype and vanishing from the text and the hash.
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value));
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value === null || typeof value !== 'object') return value;
  const source = value as Record<string, unknown>;
  const sorted = emptyRecord<unknown>();
  for (const key of Object.keys(source).sort()) {
    if (source[key] !== undefined) sorted[key] = sortKeys(source[key]);
  }
  return sorted;
}

/** True when two documents are the same design, whatever the order of their keys. */
export function sameDocument(a: unknown, b: unknown): boolean {
  return canonicalJson(a) === canonicalJson(b);
}
