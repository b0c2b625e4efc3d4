import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { toIssues, type Issue } from '@/shared/api/common';

type Schemas<B, P, Q> = { body?: z.ZodType<B>; params?: z.ZodType<P>; query?: z.ZodType<Q> };
export type ValidInput<B, P, Q> = { body: B; params: P; query: Q };

/** A validating middleware that also hands the handler its parsed input, typed: `check.input(req).params.id`. */
export type Validator<B, P, Q> = RequestHandler & { input(req: Request): ValidInput<B, P, Q> };

const parsedInput = new WeakMap<Request, unknown>();

/**
 * Validate body, params and query with the shared zod schemas before a handler runs. Any problem is a 400
 * listing every field path at once — body paths bare as in docs/api.md (`email`, `devices.3.ports.0.id`; `''`
 * for a missing body), params and query prefixed (`params.id`). The parsed values (trimmed, coerced,
 * lowercased) are what the handler gets from `input(req)`; parts without a schema are `undefined`.
 */
export function validate<B = undefined, P = undefined, Q = undefined>(schemas: Schemas<B, P, Q>): Validator<B, P, Q> {
  const middleware: RequestHandler = (req, res, next) => {
    const issues: Issue[] = [];
    const check = <T>(part: 'body' | 'params' | 'query', schema: z.ZodType<T> | undefined, value: unknown) => {
      if (!schema) return undefined;
      const parsed = schema.safeParse(value);
      if (parsed.success) return parsed.data;
      const prefix = part === 'body' ? '' : `${part}.`;
      issues.push(...toIssues(parsed.error).map((i) => ({ ...i, path: i.path ? prefix + i.path : part === 'body' ? '' : part })));
      return undefined;
    };
    const input = {
      body: check('body', schemas.body, req.body),
      params: check('params', schemas.params, req.params),
      query: check('query', schemas.query, req.query),
    };
    if (issues.length > 0) {
      res.status(400).json({ error: describe(issues), issues });
      return;
    }
    parsedInput.set(req, input);
    next();
  };
  return Object.assign(middleware, {
    input(req: Request): ValidInput<B, P, Q> {
      const input = parsedInput.get(req);
      if (!input) throw new Error('validate(...).input(req) used on a route that does not run that validator');
      return input as ValidInput<B, P, Q>;
    },
  });
}

function describe(issues: Issue[]): string {
  if (issues.length > 1) return `The request has ${issues.length} problems; see issues.`;
  const [only] = issues;
  return only.path ? `${only.path}: ${only.message}` : only.message;
}
