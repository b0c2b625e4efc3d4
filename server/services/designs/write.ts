import type { Transaction } from 'sequelize';
import type { Issue } from '@/shared/api/common';
import { analyze } from '@/shared/analysis/analyze';
import { summarize, type ReportSummary } from '@/shared/analysis/summary';
import { assignStableLabels, NO_LABEL_HISTORY, type LabelHistory } from '@/shared/labels';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import type { DesignVersionRow, Models } from '@/server/models';
import { invalid, ok, type Result } from '@/server/services/result';
import { contentHash } from './canonical';

/** A document ready to be stored: validated, analysed, serialised and hashed. */
export type PreparedDocument = { doc: Topology; json: string; hash: string; summary: ReportSummary };

/**
 * Validate a document from a request body and take its analysis summary. Issues come back with paths
 * into the body (`document.devices.3.ports.0.id`; `document` for the document as a whole).
 * This runs before the write transaction: the analysis depends on the document alone, and the write
 * lock should be held for the few statements that need it, not for a graph analysis.
 *
 * What is stored is format 2 (a format 1 body is upgraded) with stable cable labels: every cable
 * keeps the label it had in the design's earlier versions (`labels`), a cable without one gets the
 * next free label of the design's scheme, and no label of a removed cable goes to another one.
 */
export function prepareDocument(input: unknown, labels: LabelHistory = NO_LABEL_HISTORY): Result<PreparedDocument> {
  const checked = validateTopology(input);
  if (!checked.ok) return invalid(checked.issues.map(intoBody));
  const doc = assignStableLabels(checked.doc, labels);
  let summary: ReportSummary;
  try {
    summary = summarize(analyze(doc), doc);
  } catch (error) {
    // A document the schema accepts but the analysis cannot finish (seen: hundreds of networks with
    // the same subnet overflow the stack). It is not stored without a summary; the sender hears why.
    console.error('Analysis failed on a submitted document:', (error as Error).message);
    return invalid([{ path: 'document', message: 'The analysis could not finish on this document; it is too large or too repetitive to check. Simplify it and save again.' }]);
  }
  return ok({ doc, json: JSON.stringify(doc), hash: contentHash(doc), summary });
}

function intoBody(issue: Issue): Issue {
  return { path: issue.path ? `document.${issue.path}` : 'document', message: issue.message };
}

/** The highest version number of a design, or null when it has none yet. */
export async function latestNumber(models: Models, designId: number, transaction?: Transaction): Promise<number | null> {
  const row = await models.DesignVersion.findOne({
    attributes: ['number'],
    where: { designId },
    order: [['number', 'DESC']],
    transaction,
  });
  return row ? row.number : null;
}

/** Insert the next version on top of the latest; the caller holds the write transaction. */
export async function appendVersion(
  models: Models,
  transaction: Transaction,
  input: { designId: number; authorId: number; message: string; prepared: PreparedDocument; at: Date },
): Promise<DesignVersionRow> {
  const latest = await latestNumber(models, input.designId, transaction);
  const row = await models.DesignVersion.create(
    {
      designId: input.designId,
      number: (latest ?? 0) + 1,
      document: input.prepared.json,
      message: input.message,
      authorId: input.authorId,
      summary: JSON.stringify(input.prepared.summary),
      contentHash: input.prepared.hash,
      createdAt: input.at,
    },
    { transaction },
  );
  await models.Design.update({ updatedAt: input.at }, { where: { id: input.designId }, transaction });
  return row;
}
