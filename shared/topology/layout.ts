import { z } from 'zod';
import { ownValue, recordFrom, recordWith, type IdRecord } from '@/shared/keys/record';
import { ownRecordSchema } from '@/shared/keys/record-schema';
import { positionSchema, type Position, type Topology } from '@/shared/topology/schema';

/**
 * The document's `layout`: canvas positions keyed by device id. Device ids are the designer's own
 * text, and `constructor`, `toString` or `__proto__` are ids like any other, so the layout is read
 * only through `positionOf` (own entries alone) and written only through `withPositions` /
 * `withoutPositions`, which build records without a prototype (shared/keys/record.ts).
 *
 * `readWithLayout` is how the validator parses a document: zod's record drops a `__proto__` key
 * and leaves its value unchecked, so the layout is checked here by a schema that keeps every key,
 * and the rest of the document by the document schema as usual.
 */
export type Layout = IdRecord<Position>;

export const layoutSchema = ownRecordSchema(positionSchema);

export function positionOf(doc: Pick<Topology, 'layout'>, deviceId: string): Position | undefined {
  return ownValue(doc.layout, deviceId);
}

/** A new layout: the document's with these positions set. */
export function withPositions(layout: Topology['layout'], positions: Iterable<readonly [string, Position]>): Layout {
  return recordWith(layout, positions);
}

/** A new layout without the positions of these devices. */
export function withoutPositions(layout: Topology['layout'], deviceIds: ReadonlySet<string>): Layout {
  return recordFrom(Object.entries(layout ?? {}).filter(([id]) => !deviceIds.has(id)));
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Parses a document with `schema`, its layout (when it has one) by layoutSchema: one result with
 * every issue of both, at their paths in the input.
 */
export type ReadResult = { success: true; data: Topology } | { success: false; error: z.ZodError };

export function readWithLayout(schema: z.ZodType<Topology>, input: unknown): ReadResult {
  if (!isObject(input) || !Object.hasOwn(input, 'layout') || input.layout === undefined) return schema.safeParse(input);
  const rest = { ...input, layout: undefined };
  const body = schema.safeParse(rest);
  const layout = layoutSchema.safeParse(input.layout);
  if (body.success && layout.success) return { success: true, data: { ...body.data, layout: layout.data } };
  const issues = [...(body.success ? [] : body.error.issues), ...(layout.success ? [] : layout.error.issues.map((issue) => ({ ...issue, path: ['layout', ...issue.path] })))];
  return { success: false, error: new z.ZodError(issues) };
}
