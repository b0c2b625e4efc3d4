import type { Report } from '@/shared/analysis/types';
import { handoverPack, type HandoverMeta } from '@/shared/handover/pack';
import type { Topology } from '@/shared/topology/schema';
import { renderHandoverPdf } from '@/server/services/handover/pdf';
import { topologySvg } from '@/shared/handover/picture';

/** Worker entry (piscina): one handover pack PDF from a version's document, report and cover data. */
export type HandoverTask = { doc: Topology; report: Report; meta: HandoverMeta };

export default async function buildHandover(task: HandoverTask): Promise<Uint8Array> {
  const pack = handoverPack(task.doc, task.report, task.meta);
  return new Uint8Array(await renderHandoverPdf({ pack, svg: topologySvg(task.doc, task.report) }));
}
