import { toIssues, type Issue } from '@/shared/api/common';
import { saveVersionBody } from '@/shared/api/designs';
import { analyze, analyzeWithAfterOne } from '@/shared/analysis/analyze';
import { diffTopologies } from '@/shared/diff';
import { summarize, type ReportSummary } from '@/shared/analysis/summary';
import { assignStableLabels, labelHistoryFromData, NO_LABEL_HISTORY, type LabelHistoryData } from '@/shared/labels';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { contentHash } from '@/server/services/designs/canonical';

/**
 * The work the analysis processes do (server/analysis/child.cjs runs these; the demo seed and the
 * tests may call them in process). Each takes plain data and answers plain data: documents and
 * reports travel as JSON text, which crosses the process boundary faster than the objects would
 * and is what the database stores anyway.
 */

/** A document checked and analysed once, ready to store: its JSON, hash, summary and full report. */
export type PreparedText = { json: string; hash: string; summary: ReportSummary; reportJson: string; afterOneJson: string | null };

/**
 * How long a save spends on the after-one analysis before leaving it to be computed on request: a
 * save must never fail for it. 5,000 hosts take about 4 s on one core.
 */
export const AFTER_ONE_SAVE_BUDGET_MS = 8000;

/** `refused`: the schema's issues (paths inside the document); `failed`: the analysis threw. */
export type TaskOutcome<T> = { ok: true; value: T } | { ok: false; refused: Issue[] } | { ok: false; failed: string };

/** A document to prepare: the request body's document as JSON text, and the design's label history. */
export type PrepareInput = { documentJson: string; labels?: LabelHistoryData };

/**
 * Validate a document from a request body (as JSON text) and analyse it: the whole save path's CPU
 * work. What is stored is format 2 (a format 1 body is upgraded) with stable cable labels: every
 * cable keeps the label it had in the design's earlier versions, a cable without one gets the next
 * free label of the design's scheme, and no label of a removed cable goes to another one.
 */
export function prepare(input: PrepareInput): TaskOutcome<PreparedText> {
  const checked = validateTopology(JSON.parse(input.documentJson) as unknown);
  if (!checked.ok) return { ok: false, refused: checked.issues };
  return analysed(checked.doc, input.labels);
}

/** A save's body as it came over the wire (JSON text), and the design's label history. */
export type SaveInput = { bodyText: string; labels?: LabelHistoryData };
/** A save's fields other than the document, as the body schema reads them. */
export type SaveFields = { baseVersion: number | null; message: string };
/**
 * `malformed`: the body is not JSON (the sentence body-parser's error would have given);
 * `bodyIssues`: the body's own fields are wrong (paths in the body, as the validate middleware gives them).
 */
export type SaveOutcome =
  | { ok: true; value: { fields: SaveFields; prepared: PreparedText } }
  | { ok: false; malformed: string }
  | { ok: false; bodyIssues: Issue[] }
  | { ok: false; refused: Issue[] }
  | { ok: false; failed: string };

export const NOT_JSON = 'The request body is not valid JSON.';

/**
 * The whole save in one task: the body is parsed here, once, and never on the request thread (a
 * 20,000-host document is megabytes of JSON); its fields are checked with the same schema the
 * route's validator would use, then the document is validated and analysed as `prepare` does.
 * As with express.json's strict mode, a body must be a JSON object or array.
 */
export function prepareSave(input: SaveInput): SaveOutcome {
  let body: unknown;
  if (input.bodyText !== '') {
    const first = /\S/.exec(input.bodyText)?.[0];
    if (first !== '{' && first !== '[') return { ok: false, malformed: NOT_JSON };
    try {
      body = JSON.parse(input.bodyText) as unknown;
    } catch {
      return { ok: false, malformed: NOT_JSON };
    }
  }
  const fields = saveVersionBody.safeParse(body);
  if (!fields.success) return { ok: false, bodyIssues: toIssues(fields.error) };
  const checked = validateTopology(fields.data.document);
  if (!checked.ok) return { ok: false, refused: checked.issues };
  const prepared = analysed(checked.doc, input.labels);
  if (!prepared.ok) return prepared;
  return { ok: true, value: { fields: { baseVersion: fields.data.baseVersion, message: fields.data.message }, prepared: prepared.value } };
}

function analysed(checked: Topology, labels: LabelHistoryData | undefined): TaskOutcome<PreparedText> {
  const doc = assignStableLabels(checked, labels ? labelHistoryFromData(labels) : NO_LABEL_HISTORY);
  try {
    const { report, afterOneFailure } = analyzeWithAfterOne(doc, Date.now() + AFTER_ONE_SAVE_BUDGET_MS);
    const afterOneJson = afterOneFailure ? JSON.stringify(afterOneFailure) : null;
    return { ok: true, value: { json: JSON.stringify(doc), hash: contentHash(doc), summary: summarize(report, doc), reportJson: JSON.stringify(report), afterOneJson } };
  } catch (error) {
    return { ok: false, failed: error instanceof Error ? error.message : String(error) };
  }
}

/** The report of a stored document (JSON text), for versions saved before reports were stored. */
export function report(documentJson: string): TaskOutcome<{ summary: ReportSummary; reportJson: string }> {
  const checked = validateTopology(JSON.parse(documentJson) as unknown);
  if (!checked.ok) return { ok: false, refused: checked.issues };
  try {
    const full = analyze(checked.doc);
    return { ok: true, value: { summary: summarize(full, checked.doc), reportJson: JSON.stringify(full) } };
  } catch (error) {
    return { ok: false, failed: error instanceof Error ? error.message : String(error) };
  }
}

/** afterOneFailure of a stored document (JSON text), for versions stored without it. */
export function afterOne(documentJson: string): TaskOutcome<{ afterOneJson: string }> {
  const checked = validateTopology(JSON.parse(documentJson) as unknown);
  if (!checked.ok) return { ok: false, refused: checked.issues };
  try {
    return { ok: true, value: { afterOneJson: JSON.stringify(analyze(checked.doc, { afterOne: true }).afterOneFailure) } };
  } catch (error) {
    return { ok: false, failed: error instanceof Error ? error.message : String(error) };
  }
}

/**
 * A stored document as format 2 JSON text: a format 1 version is upgraded on every read (it is never
 * rewritten), which means validating it, so it is done here rather than on the request thread.
 */
export function storedDocument(documentJson: string): TaskOutcome<string> {
  const checked = validateTopology(JSON.parse(documentJson) as unknown);
  if (!checked.ok) return { ok: false, refused: checked.issues };
  return { ok: true, value: JSON.stringify(checked.doc) };
}

/** What changed going from the stored document `before` to `after` (both JSON text), as JSON text. */
export function diff(input: { before: string; after: string }): TaskOutcome<string> {
  const before = validateTopology(JSON.parse(input.before) as unknown);
  if (!before.ok) return { ok: false, refused: before.issues };
  const after = validateTopology(JSON.parse(input.after) as unknown);
  if (!after.ok) return { ok: false, refused: after.issues };
  try {
    return { ok: true, value: JSON.stringify(diffTopologies(before.doc, after.doc)) };
  } catch (error) {
    return { ok: false, failed: error instanceof Error ? error.message : String(error) };
  }
}

/** Every task by name; the child process looks tasks up here (a Map: names come over a channel). */
export const TASKS = new Map<string, (input: never) => unknown>([
  ['prepare', prepare],
  ['prepareSave', prepareSave],
  ['report', report],
  ['after-one', afterOne],
  ['storedDocument', storedDocument],
  ['diff', diff],
]);
