import { createHash } from 'node:crypto';

/**
 * Canonical JSON: object keys sorted (code-unit order) at every depth, arrays kept in order, no
 * whitespace. Two documents that differ only in key order get the same text and so the same hash.
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value));
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value === null || typeof value !== 'object') return value;
  const source = value as Record<string, unknown>;
  const sorted: Record<string, unknown> = {};
  for (const key of Object.keys(source).sort()) {
    if (source[key] !== undefined) sorted[key] = sortKeys(source[key]);
  }
  return sorted;
}

/** sha256 (hex) of the canonical JSON: the version's content hash. */
export function contentHash(value: unknown): string {
  return createHash('sha256').update(canonicalJson(value)).digest('hex');
}
