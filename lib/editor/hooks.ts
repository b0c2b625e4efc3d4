import { useRef } from 'react';
import { useStore } from 'zustand';
import type { Topology } from '@/shared/topology/schema';
import { buildSnapshot, type Snapshot } from '@/lib/editor/snapshot';
import { editorStore, selectDirty, type EditorActions, type EditorState, type EditorStore } from '@/lib/editor/store';

/**
 * Selector hooks over the editor store: each reads one field, so a component re-renders only when
 * that field changes. Pass another store (from createEditorStore) as the last argument in tests.
 */
export function useEditor<T>(selector: (state: EditorState) => T, store: EditorStore = editorStore): T {
  return useStore(store, selector);
}

export const useEditorDoc = (store?: EditorStore): Topology => useEditor((s) => s.doc, store);
export const useSelection = (store?: EditorStore): string[] => useEditor((s) => s.selection, store);
export const useIsSelected = (id: string, store?: EditorStore): boolean => useEditor((s) => s.selection.includes(id), store);
export const useTool = (store?: EditorStore) => useEditor((s) => s.tool, store);
export const useViewport = (store?: EditorStore) => useEditor((s) => s.viewport, store);
export const usePendingCableStart = (store?: EditorStore) => useEditor((s) => s.pendingCableStart, store);
export const useCableDefaults = (store?: EditorStore) => useEditor((s) => s.cableDefaults, store);
export const useDirty = (store?: EditorStore): boolean => useEditor(selectDirty, store);
export const useReadOnly = (store?: EditorStore): boolean => useEditor((s) => s.readOnly, store);
export const useDesignId = (store?: EditorStore) => useEditor((s) => s.designId, store);
export const useBaseVersion = (store?: EditorStore) => useEditor((s) => s.baseVersion, store);
export const useLastError = (store?: EditorStore) => useEditor((s) => s.lastError, store);
export const useDragging = (store?: EditorStore): boolean => useEditor((s) => s.gestureStart !== null, store);

export const useCanUndo = (store: EditorStore = editorStore): boolean => useStore(store.temporal, (t) => t.pastStates.length > 0);
export const useCanRedo = (store: EditorStore = editorStore): boolean => useStore(store.temporal, (t) => t.futureStates.length > 0);

/** The actions; they never change, so reading them causes no re-render. */
export function editorActions(store: EditorStore = editorStore): EditorActions {
  return store.getState();
}

/**
 * A selector that turns the document into a render snapshot, reusing the previous snapshot's
 * unchanged boxes (see buildSnapshot). Same document in, same snapshot object out.
 */
export function makeSnapshotSelector(): (state: EditorState) => Snapshot {
  let last: Snapshot | undefined;
  return (state) => {
    if (last && last.doc === state.doc) return last;
    last = buildSnapshot(state.doc, last);
    return last;
  };
}

/** The canvas's render snapshot, rebuilt incrementally as the document changes. */
export function useCanvasSnapshot(store?: EditorStore): Snapshot {
  const selector = useRef<(state: EditorState) => Snapshot>(null);
  if (!selector.current) selector.current = makeSnapshotSelector();
  return useEditor(selector.current, store);
}
