import { createHash } from 'node:crypto';
import { canonicalJson } from '@/shared/topology/canonical';

export { canonicalJson };

/** sha256 (hex) of the canonical JSON (shared/topology/canonical.ts): the version's content hash. */
export function contentHash(value: unknown): string {
  return createHash('sha256').update(canonicalJson(value)).digest('hex');
}
