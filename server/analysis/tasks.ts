import type { Issue } from '@/shared/api/common';
import { analyze, analyzeWithAfterOne } from '@/shared/analysis/analyze';
import { summarize, type ReportSummary } from '@/shared/analysis/summary';
import { assignStableLabels, labelHistoryFromData, NO_LABEL_HISTORY, type LabelHistoryData } from '@/shared/labels';
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
  const doc = assignStableLabels(checked.doc, input.labels ? labelHistoryFromData(input.labels) : NO_LABEL_HISTORY);
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

/** Every task by name; the child process looks tasks up here (a Map: names come over a channel). */
export const TASKS = new Map<string, (input: never) => unknown>([
  ['prepare', prepare],
  ['report', report],
  ['after-one', afterOne],
]);
