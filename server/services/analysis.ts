import path from 'node:path';
import type { Issue } from '@/shared/api/common';
import type { ReportSummary } from '@/shared/analysis/summary';
import { labelHistoryData, type LabelHistory } from '@/shared/labels';
import { PoolLimitError, sharedPool, type Pool } from '@/server/analysis/pool';
import * as tasks from '@/server/analysis/tasks';
import type { PreparedText, SaveFields, TaskOutcome } from '@/server/analysis/tasks';
import type { Config } from '@/server/config';
import { fail, invalid, ok, type Failure, type Result } from './result';

export type { PreparedText, SaveFields };
export type StoredReport = { summary: ReportSummary; reportJson: string };

/**
 * Validation and analysis of documents, off the request thread. `prepare` is the save path: the
 * document is checked and analysed once, in an analysis process, and comes back as the JSON, hash,
 * summary and report to store. `report` analyses a stored document again (versions saved before
 * reports were stored with them). A document that breaks a limit answers 422 with a sentence.
 */
export type Analysis = {
  /** `labels`: the design's label history (shared/labels/stable.ts), so cables keep their labels. */
  prepare(document: unknown, labels?: LabelHistory): Promise<Result<PreparedText>>;
  /** The same for a document that is already JSON text (a stored version being restored). */
  prepareJson(documentJson: string, labels?: LabelHistory): Promise<Result<PreparedText>>;
  report(documentJson: string): Promise<Result<StoredReport>>;
  /** afterOneFailure (docs/api.md `--after-one`) of a stored document, as JSON text. */
  afterOne(documentJson: string): Promise<Result<{ afterOneJson: string }>>;
  /**
   * A save's whole body as the JSON text that came over the wire: parsed, its fields checked, its
   * document validated and analysed, in one task. 400s come back as the validate middleware's would.
   */
  prepareSave(bodyText: string, labels?: LabelHistory): Promise<Result<{ fields: SaveFields; prepared: PreparedText }>>;
  /** A stored document as format 2 JSON text (a format 1 version upgraded). */
  storedDocument(documentJson: string): Promise<Result<string>>;
  /** The diff of two stored documents, as JSON text. */
  diff(before: string, after: string): Promise<Result<string>>;
};

const TASKS_MODULE = path.join(__dirname, '..', 'analysis', 'tasks.ts');
/** Saves waiting for a free analysis process, beyond which the server says it is busy. */
const QUEUE_MAX = 50;

/** The process-wide pool of analysis processes for these limits (shared by every app in the process). */
export function analysisPool(limits: Config['analysis']): Pool {
  return sharedPool({ module: TASKS_MODULE, ...limits, queueMax: QUEUE_MAX });
}

/** The analysis of the running server: the process-wide pool with the configured limits. */
export function poolAnalysis(limits: Config['analysis']): Analysis {
  const pool = analysisPool(limits);
  return {
    prepare: (document, labels) => runTask(pool, limits, 'prepare', prepareInput(JSON.stringify(document), labels), 'it was not saved'),
    prepareJson: (documentJson, labels) => runTask(pool, limits, 'prepare', prepareInput(documentJson, labels), 'it was not saved'),
    report: (documentJson) => runTask(pool, limits, 'report', documentJson, 'its report cannot be shown'),
    afterOne: (documentJson) => runTask(pool, limits, 'after-one', documentJson, 'its after-one-failure analysis cannot be shown'),
    prepareSave: async (bodyText, labels) => {
      try {
        return saveOutcome(await pool.run<tasks.SaveOutcome>('prepareSave', saveInput(bodyText, labels)));
      } catch (error) {
        if (error instanceof PoolLimitError) return limitFailure(error, limits, 'it was not saved');
        throw error;
      }
    },
    storedDocument: (documentJson) => runTask(pool, limits, 'storedDocument', documentJson, 'it cannot be shown'),
    diff: (before, after) => runTask(pool, limits, 'diff', { before, after }, 'the comparison cannot be shown'),
  };
}

/**
 * The same work on this thread, for documents the server itself supplies (the demo seed's
 * fixtures), never for what users send.
 */
export function inProcessAnalysis(): Analysis {
  return {
    prepare: async (document, labels) => outcome(tasks.prepare(prepareInput(JSON.stringify(document), labels)), 'it was not saved'),
    prepareJson: async (documentJson, labels) => outcome(tasks.prepare(prepareInput(documentJson, labels)), 'it was not saved'),
    report: async (documentJson) => outcome(tasks.report(documentJson), 'its report cannot be shown'),
    afterOne: async (documentJson) => outcome(tasks.afterOne(documentJson), 'its after-one-failure analysis cannot be shown'),
    prepareSave: async (bodyText, labels) => saveOutcome(tasks.prepareSave(saveInput(bodyText, labels))),
    storedDocument: async (documentJson) => outcome(tasks.storedDocument(documentJson), 'it cannot be shown'),
    diff: async (before, after) => outcome(tasks.diff({ before, after }), 'the comparison cannot be shown'),
  };
}

function saveInput(bodyText: string, labels: LabelHistory | undefined): tasks.SaveInput {
  return labels ? { bodyText, labels: labelHistoryData(labels) } : { bodyText };
}

function saveOutcome(result: tasks.SaveOutcome): Result<{ fields: SaveFields; prepared: PreparedText }> {
  if (!result.ok && 'malformed' in result) return fail('invalid', result.malformed);
  // The body's own fields: bare paths, exactly as the validate middleware answers them.
  if (!result.ok && 'bodyIssues' in result) return invalid(result.bodyIssues);
  return outcome(result, 'it was not saved');
}

function prepareInput(documentJson: string, labels: LabelHistory | undefined): tasks.PrepareInput {
  return labels ? { documentJson, labels: labelHistoryData(labels) } : { documentJson };
}

async function runTask<T>(pool: Pool, limits: Config['analysis'], task: string, input: unknown, consequence: string): Promise<Result<T>> {
  try {
    return outcome(await pool.run<TaskOutcome<T>>(task, input), consequence);
  } catch (error) {
    if (error instanceof PoolLimitError) return limitFailure(error, limits, consequence);
    throw error;
  }
}

function outcome<T>(result: TaskOutcome<T>, consequence: string): Result<T> {
  if (result.ok) return ok(result.value);
  if ('refused' in result) return invalid(result.refused.map(intoBody));
  // A document the schema accepts but the analysis cannot finish (seen: hundreds of networks with
  // the same subnet overflow the stack). Nothing is stored without its analysis; the sender hears why.
  console.error('Analysis failed on a submitted document:', result.failed);
  return unprocessable(`The analysis could not finish on this document, so ${consequence}; it is too large or too repetitive to check. Simplify it and try again.`);
}

function limitFailure(error: PoolLimitError, limits: Config['analysis'], consequence: string): Failure {
  console.error(`Analysis stopped by a limit (${error.kind}): ${error.message}`);
  const fix = 'Simplify the document or split the design into smaller ones, and try again.';
  switch (error.kind) {
    case 'busy':
      return fail('busy', 'The server is busy analysing other designs. Try again in a moment.');
    case 'time':
      return unprocessable(`The analysis of this document took longer than the ${seconds(limits.timeoutMs)} the server allows, so ${consequence}. ${fix}`);
    case 'tampered':
      return unprocessable(
        `The analysis of this document was stopped because some of its ids (such as __proto__ or constructor) disturb the analysis, so ${consequence}. Rename those ids and try again.`,
      );
    case 'memory':
      return unprocessable(`The analysis of this document needed more than the ${limits.maxOldMb} MB of memory the server allows, so ${consequence}. ${fix}`);
    default:
      return unprocessable(`The analysis stopped on this document before it finished, so ${consequence}. ${fix}`);
  }
}

function unprocessable(message: string): Failure {
  return fail('unprocessable', message, { issues: [{ path: 'document', message }] });
}

function seconds(ms: number): string {
  const s = ms / 1000;
  return `${Number.isInteger(s) ? s : s.toFixed(1)} second${s === 1 ? '' : 's'}`;
}

function intoBody(issue: Issue): Issue {
  return { path: issue.path ? `document.${issue.path}` : 'document', message: issue.message };
}
