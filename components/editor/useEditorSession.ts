import { useCallback, useEffect, useRef, useState } from 'react';
import { useMe } from '@/lib/api/auth';
import { useDesign } from '@/lib/api/designs';
import { useVersion } from '@/lib/api/versions';
import { can } from '@/shared/roles';
import type { Topology } from '@/shared/topology/schema';
import { withTidyLayout } from '@/lib/editor/tidy';
import { emptyTopology, editorStore } from '@/lib/editor/store';
import { clearWorkingCopy, defaultStorage, readWorkingCopy, type WorkingCopy } from '@/lib/editor/working-copy';
import { sameDocument } from '@/shared/topology/canonical';

/**
 * Opening a design in the editor: the design, its newest version's document, and the working copy
 * this browser kept. When a working copy exists the designer chooses first — restore it (the store
 * starts dirty against the server's document) or discard it — with the saved version drawn behind. Decided once per design and mount:
 * a later refresh of the design query never replaces the work in progress.
 *
 * A saved layout whose boxes overlap on this canvas (older patterns placed devices 200 px apart)
 * is re-arranged as it opens. The fix is part of what was opened — not an undo step, not a change
 * of its own — and goes with the next version that is saved.
 */
export type SessionState =
  | { status: 'loading' }
  | { status: 'error'; message: string; retry: () => void }
  | { status: 'restore'; copy: WorkingCopy; serverDoc: Topology; latest: number | null }
  | { status: 'ready'; layoutFixed: boolean; restored: boolean };

export function useEditorSession(designId: number) {
  const me = useMe();
  const design = useDesign(designId);
  const latest = design.data?.versions[0]?.number ?? null;
  const version = useVersion(designId, latest ?? 0, { enabled: latest !== null });
  const readOnly = me.data ? !can(me.data.role, 'editDesigns') : true;
  const [state, setState] = useState<SessionState>({ status: 'loading' });
  const decided = useRef<number | null>(null);

  const open = useCallback(
    (doc: Topology, base: number | null, savedDoc?: Topology, restored = false) => {
      const tidy = withTidyLayout(doc);
      // A restored copy is compared with the server's document; a fresh open with itself (tidied).
      const saved = savedDoc ?? tidy.doc;
      editorStore.getState().load(tidy.doc, { designId, baseVersion: base, readOnly, savedDoc: saved });
      setState({ status: 'ready', layoutFixed: tidy.fixed && !restored, restored });
    },
    [designId, readOnly],
  );

  const serverDoc: Topology | null = latest === null ? (design.data ? emptyTopology(design.data.design.name) : null) : (version.data?.document ?? null);

  useEffect(() => {
    if (decided.current === designId || !serverDoc || !me.data) return;
    decided.current = designId;
    const current = editorStore.getState();
    // Back on a design this tab already has open at the same version: keep the work as it is.
    if (current.designId === designId && current.session > 0 && current.baseVersion === latest && current.readOnly === readOnly) {
      setState({ status: 'ready', layoutFixed: false, restored: false });
      return;
    }
    const storage = defaultStorage();
    let copy = storage && !readOnly ? readWorkingCopy(storage, designId) : null;
    if (copy && storage && copy.baseVersion === latest && sameDocument(copy.doc, serverDoc)) {
      // Nothing in it that the server does not already hold: no question to ask.
      clearWorkingCopy(storage, designId);
      copy = null;
    }
    if (copy) {
      // Behind the question the canvas shows the saved version, not an empty "Untitled" drawing.
      editorStore.getState().load(withTidyLayout(serverDoc).doc, { designId, baseVersion: latest, readOnly });
      setState({ status: 'restore', copy, serverDoc, latest });
    } else open(serverDoc, latest);
  }, [designId, serverDoc, me.data, latest, readOnly, open]);

  const restore = useCallback(() => {
    if (state.status !== 'restore') return;
    open(state.copy.doc, state.copy.baseVersion, state.serverDoc, true);
  }, [state, open]);

  const discard = useCallback(() => {
    if (state.status !== 'restore') return;
    const storage = defaultStorage();
    if (storage) clearWorkingCopy(storage, designId);
    open(state.serverDoc, state.latest);
  }, [state, open, designId]);

  const failure = design.error ?? version.error;
  const shown: SessionState =
    state.status === 'loading' && failure
      ? { status: 'error', message: failure.message, retry: () => void (design.error ? design.refetch() : version.refetch()) }
      : state;
  return { state: shown, restore, discard, readOnly, design: design.data ?? null, latest, me: me.data ?? null };
}
