import { useMemo, useState } from 'react';
import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import type { Report } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';
import { useDebouncedValue } from '@/lib/use-debounced-value';

/** Picking several units in a row recomputes once, after the picking pauses. */
export const WHAT_IF_DELAY_MS = 300;

/**
 * The what-if state of a report screen: the units picked to fail and the report recomputed in the
 * browser with `analyze(doc, { failed })` — the same function the server ran for the saved report.
 */
export function useWhatIf(doc: Topology | undefined) {
  const [failed, setFailed] = useState<string[]>([]);
  const settled = useDebouncedValue(failed, WHAT_IF_DELAY_MS);
  const simulated = useMemo((): { report: Report; summary: ReturnType<typeof summarize> } | null => {
    if (!doc || settled.length === 0) return null;
    const report = analyze(doc, { failed: settled });
    return { report, summary: summarize(report, doc) };
  }, [doc, settled]);
  return { failed, setFailed, settled, simulated, pending: failed !== settled };
}
