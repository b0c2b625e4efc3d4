import { z } from 'zod';

/** One problem with a request, addressed by its dotted path (`devices.3.ports.0.id`). */
export type Issue = { path: string; message: string };

/** The error body of every non-2xx API answer (docs/api.md). */
export type ApiError = { error: string; issues?: Issue[]; latestVersion?: number | null };

/** Turn zod issues into the API's `{path, message}` list. */
export function toIssues(error: z.ZodError): Issue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}

export const idParam = z.coerce.number().int().positive();
