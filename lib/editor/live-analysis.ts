import { createStore, type StoreApi } from 'zustand/vanilla';
import { analyze } from '@/shared/analysis/analyze';
import type { Report } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';
import { computeMarks, EMPTY_MARKS, type CanvasMarks } from '@/lib/editor/marks';
import type { EditorStore } from '@/lib/editor/store';

/**
 * The live findings: the analysis re-run on the working document after every change, off the
 * interaction. A change starts a short debounce; when it ends while the designer is still
 * dragging or pinching (`isBusy`), the run waits for the gesture to finish. The run itself is one
 * synchronous call of the shared analysis (tens of milliseconds on a 300-device design, measured
 * by `npm run bench:canvas`), so it is done in its own timer task, never inside a pointer event.
 * A Web Worker would take it off the main thread entirely, but Expo's web bundler has no simple
 * worker entry point, and the measured cost does not need one.
 */
export type LiveAnalysisState = {
  report: Report | null;
  marks: CanvasMarks;
  /** The document the report belongs to; the report is stale when it is not the editor's document. */
  doc: Topology | null;
  /** Milliseconds the last run took. */
  ms: number;
  /** A run is waiting (debounce or a gesture). */
  pending: boolean;
  /** The last run threw (it should not: the store only holds valid documents). */
  error: string | null;
};

export type LiveAnalysisStore = StoreApi<LiveAnalysisState>;

export function createLiveAnalysisStore(): LiveAnalysisStore {
  return createStore<LiveAnalysisState>()(() => ({ report: null, marks: EMPTY_MARKS, doc: null, ms: 0, pending: false, error: null }));
}

/** The live analysis the editor screen uses; tests make their own. */
export const liveAnalysisStore = createLiveAnalysisStore();

export type LiveAnalysisOptions = {
  debounceMs?: number;
  /** How long to wait before asking again while a gesture is in progress. */
  retryMs?: number;
  isBusy?: () => boolean;
  now?: () => number;
};

export const ANALYSIS_MEASURE = 'cablewright:analysis';

function measure(now: () => number, run: () => Report): { report: Report; ms: number } {
  const start = now();
  const report = run();
  const ms = now() - start;
  // A performance entry, so the canvas benchmark can read the cost of each run in the page.
  try {
    performance.measure?.(ANALYSIS_MEASURE, { start, duration: ms });
  } catch {
    // Environments without the User Timing API simply go unmeasured.
  }
  return { report, ms };
}

/** Runs the analysis now (the first run after opening a design does not wait). */
export function analyseNow(target: LiveAnalysisStore, doc: Topology, now: () => number = () => performance.now()): void {
  try {
    const { report, ms } = measure(now, () => analyze(doc));
    const marks = computeMarks(doc, report, target.getState().marks);
    target.setState({ report, marks, doc, ms, pending: false, error: null });
  } catch (error) {
    target.setState({ pending: false, error: error instanceof Error ? error.message : String(error), doc });
  }
}

/**
 * Keeps `target` in step with the editor's document. Returns a function that stops it.
 */
export function attachLiveAnalysis(store: EditorStore, target: LiveAnalysisStore, options: LiveAnalysisOptions = {}): () => void {
  const debounceMs = options.debounceMs ?? 250;
  const retryMs = options.retryMs ?? 120;
  const isBusy = options.isBusy ?? (() => false);
  const now = options.now ?? (() => performance.now());
  let timer: ReturnType<typeof setTimeout> | null = null;

  const fire = () => {
    timer = null;
    if (isBusy()) {
      timer = setTimeout(fire, retryMs);
      return;
    }
    const doc = store.getState().doc;
    if (target.getState().doc === doc && !target.getState().error) {
      target.setState({ pending: false });
      return;
    }
    analyseNow(target, doc, now);
  };
  const schedule = (delay: number) => {
    if (timer) clearTimeout(timer);
    if (!target.getState().pending) target.setState({ pending: true });
    timer = setTimeout(fire, delay);
  };

  const unsubscribe = store.subscribe((state, previous) => {
    if (state.doc === previous.doc) return;
    // A freshly opened document is analysed straight away; edits wait for a pause.
    schedule(state.session !== previous.session ? 0 : debounceMs);
  });
  if (target.getState().doc !== store.getState().doc) schedule(0);
  return () => {
    unsubscribe();
    if (timer) clearTimeout(timer);
    timer = null;
  };
}
