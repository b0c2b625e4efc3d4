import { z } from 'zod';
import type { FieldErrors } from '@/lib/forms';
import { validate } from '@/lib/forms';
import { createDesignBody, type CreateDesignBody } from '@/shared/api/designs';
import { PATTERNS } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';

export type StartKind = 'blank' | 'pattern' | 'import';
export type PatternId = (typeof PATTERNS)[number]['id'];

export const PATTERN_HINTS = Object.fromEntries(PATTERNS.map((p) => [p.id, p.about])) as Record<PatternId, string>;

/**
 * The form's own limits on a pattern: enough for any server room a pattern is a sensible start
 * for; larger designs grow on the canvas. Whole numbers only, checked before anything is built.
 */
const count = (what: string, max: number) =>
  z
    .string()
    .trim()
    .regex(/^[0-9]+$/, `Enter the number of ${what} as a whole number`)
    .transform(Number)
    .pipe(z.number().min(1, `At least 1 ${what.replace(/s$/, '')}`).max(max, `At most ${max} ${what}`));

export const patternFields = z.object({
  hosts: count('hosts', 48),
  cardsPerHost: count('cards per host', 4),
  portsPerCard: count('ports per card', 4),
});

export type PatternValues = { pattern: PatternId; hosts: string; cardsPerHost: string; portsPerCard: string };

export const DEFAULT_PATTERN_VALUES: PatternValues = { pattern: 'dual-fabric', hosts: '4', cardsPerHost: '2', portsPerCard: '2' };

/** The pattern's document named after the design, or the form's errors when the numbers do not pass. */
export function buildPattern(values: PatternValues, name: string): { doc: Topology; errors: null } | { doc: null; errors: FieldErrors } {
  const checked = validate(patternFields, values);
  if (!checked.data) return { doc: null, errors: checked.errors };
  const pattern = PATTERNS.find((p) => p.id === values.pattern) ?? PATTERNS[1];
  const doc = pattern.build({ name: name.trim() || pattern.name, ...checked.data });
  return { doc, errors: null };
}

export type NewDesignValues = {
  name: string;
  site: string;
  message: string;
  start: StartKind;
  pattern: PatternValues;
  /** The document of a file that passed validation, when starting from a file. */
  imported: Topology | null;
};

/**
 * The create request for the form's values, checked with the server's own schema. Starting from
 * a file without a valid file picked is an error on `file`; a blank design has no version yet.
 */
export function buildCreateBody(values: NewDesignValues): { body: CreateDesignBody; errors: null } | { body: null; errors: FieldErrors } {
  const errors: FieldErrors = {};
  let document: Topology | undefined;
  if (values.start === 'pattern') {
    const built = buildPattern(values.pattern, values.name);
    if (built.errors) Object.assign(errors, built.errors);
    else document = built.doc;
  } else if (values.start === 'import') {
    if (values.imported) document = values.imported;
    else errors.file = 'Choose a topology file that passes the checks, or start another way';
  }
  const message = values.message.trim();
  const checked = validate(createDesignBody, {
    name: values.name,
    site: values.site.trim() || undefined,
    document,
    message: document && message ? message : undefined,
  });
  Object.assign(errors, checked.errors ?? {});
  if (!checked.data || Object.keys(errors).length > 0) return { body: null, errors };
  return { body: checked.data, errors: null };
}
