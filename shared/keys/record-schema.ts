import { z } from 'zod';
import { emptyRecord, type IdRecord } from '@/shared/keys/record';

/**
 * A zod schema for a JSON object keyed by ids. `z.record` builds its output in a plain `{}` and
 * skips a `__proto__` key without a word (so a device whose id is `__proto__` silently loses its
 * entry), and its output inherits Object.prototype. This one checks every own key of the input,
 * `__proto__` included, with the value schema, and returns a record without a prototype. Issues
 * carry the same codes and paths as z.record's, so messages.ts words them the same way.
 */
export function ownRecordSchema<T extends z.ZodType>(value: T) {
  return z.unknown().transform((input, ctx): IdRecord<z.output<T>> => {
    if (typeof input !== 'object' || input === null || Array.isArray(input)) {
      ctx.addIssue({ code: 'invalid_type', expected: 'record', input });
      return z.NEVER;
    }
    const out = emptyRecord<z.output<T>>();
    const source = input as Record<string, unknown>;
    for (const key of Object.keys(source)) {
      const parsed = value.safeParse(source[key]);
      if (parsed.success) out[key] = parsed.data;
      else for (const issue of parsed.error.issues) ctx.addIssue({ ...issue, path: [key, ...issue.path] } as Parameters<typeof ctx.addIssue>[0]);
    }
    return out;
  });
}
