import { analyze } from '@/shared/analysis/analyze';
import { summarize, type ReportSummary } from '@/shared/analysis/summary';
import type { Topology } from '@/shared/topology/schema';
import { plural } from '@/lib/designs/summary';

export type DocumentFacts = { contents: string; summary: ReportSummary };

/**
 * What a document holds and what the analysis says about it, computed in the browser before
 * anything is saved: the same `analyze` the server runs, so the preview is the summary to expect.
 */
export function documentFacts(doc: Topology): DocumentFacts {
  const count = (kind: 'array' | 'switch' | 'host') => doc.devices.filter((d) => d.kind === kind).length;
  const contents = [
    plural(count('array'), 'array'),
    plural(count('switch'), 'switch', 'switches'),
    plural(count('host'), 'host'),
    plural(doc.cables.length, 'cable'),
    plural(doc.networks.length, 'network'),
  ].join(', ');
  return { contents, summary: summarize(analyze(doc), doc) };
}
