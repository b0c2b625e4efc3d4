import type { Report } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';
import { exportSvg } from '@/lib/editor/export-svg';
import { computeMarks } from '@/lib/editor/marks';
import { buildSnapshot } from '@/lib/editor/snapshot';

/**
 * The topology picture of the handover pack: the canvas's own SVG export (lib/editor/export-svg.ts,
 * plain string building with no DOM), with the single points of failure and host badges of the
 * version's report, so the paper shows what the designer saw.
 */
export function topologySvg(doc: Topology, report: Report): string {
  return exportSvg(buildSnapshot(doc), { marks: computeMarks(doc, report) });
}
