import type { z } from 'zod';
import type { Issue } from '@/shared/api/common';
import { isApiRequestError } from '@/lib/api/client';

/** Field name → first message for it; the shape every form renders inline under its fields. */
export type FieldErrors = Partial<Record<string, string>>;

/** The first issue per top-level field wins: one clear sentence under each field is enough. */
export function issuesToFieldErrors(issues: Issue[]): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of issues) {
    const field = issue.path.split('.')[0] ?? '';
    if (field && errors[field] === undefined) errors[field] = issue.message;
  }
  return errors;
}

/** Client-side check with the same zod schema the server uses; null when the values pass. */
export function validate<S extends z.ZodType>(
  schema: S,
  values: unknown,
): { data: z.infer<S>; errors: null } | { data: null; errors: FieldErrors } {
  const result = schema.safeParse(values);
  if (result.success) return { data: result.data, errors: null };
  return {
    data: null,
    errors: issuesToFieldErrors(
      result.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message })),
    ),
  };
}

/**
 * What a form shows after a failed request: field messages from the server's issues, and one
 * sentence for the form itself when no field explains the failure.
 */
export function describeFailure(error: unknown): { fields: FieldErrors; form: string | null } {
  if (!isApiRequestError(error)) return { fields: {}, form: error ? 'Something went wrong. Try again.' : null };
  const fields = issuesToFieldErrors(error.issues);
  return { fields, form: Object.keys(fields).length > 0 ? null : error.error };
}
