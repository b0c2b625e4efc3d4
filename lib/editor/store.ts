import { temporal } from 'zundo';
import { createStore } from 'zustand/vanilla';
import type { Connector, Topology } from '@/shared/topology/schema';
import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import { runCommand, type CablePortsArgs } from '@/lib/editor/commands';
import { portById } from '@/lib/editor/commands/doc';
import { CommandError } from '@/lib/editor/errors';
import { collectIds, nextCableNumber } from '@/lib/editor/ids';
import type { CableDefaults, EditorActions, EditorData, EditorState, EditorStore, History, RunResult } from '@/lib/editor/store-types';
import { DEFAULT_VIEWPORT } from '@/lib/editor/viewport';

/**
 * The editor's state: the working document and everything about editing it (selection, tool,
 * viewport, the cable being drawn, remembered cable defaults, undo history). Server data stays in
 * React Query; this store only holds what the designer is doing right now.
 *
 * History (zundo) records the document only, and only what commands produce: `load` (opening a
 * version, a refresh from the server) clears it; selection, tool and viewport changes never enter
 * it; a drag is one entry however many moves it makes (beginGesture … endGesture).
 */
export * from '@/lib/editor/store-types';

export const HISTORY_LIMIT = 200;

export function emptyTopology(name = 'Untitled design'): Topology {
  return { format: TOPOLOGY_FORMAT, name, devices: [], cables: [], networks: [] };
}

// Category 6A carries 10GBASE-T over 100 m (IEEE 802.3an); direct-attach copper is the usual
// short in-rack SFP link (common practice).
export const DEFAULT_CABLE_CHOICES: CableDefaults = { rj45: { media: 'cat6a', lengthM: 3 }, sfp: { media: 'dac', lengthM: 3 } };

function initialData(): EditorData {
  const doc = emptyTopology();
  return {
    designId: null,
    baseVersion: null,
    doc,
    savedDoc: doc,
    readOnly: false,
    selection: [],
    tool: 'select',
    pendingCableStart: null,
    viewport: DEFAULT_VIEWPORT,
    cableDefaults: DEFAULT_CABLE_CHOICES,
    gestureStart: null,
    lastError: null,
    session: 0,
    cableNumberFloor: 1,
  };
}

/** Selection and pending cable without ids the document no longer has (after delete, undo, redo). */
function pruned(state: EditorData, doc: Topology): Partial<EditorData> {
  const prev = state.doc;
  const structural = prev.devices !== doc.devices || prev.cables !== doc.cables || prev.networks !== doc.networks;
  if (!structural || (state.selection.length === 0 && state.pendingCableStart === null)) return {};
  const ids = collectIds(doc);
  const selection = state.selection.filter((id) => ids.has(id));
  const pendingCableStart = state.pendingCableStart && ids.has(state.pendingCableStart) ? state.pendingCableStart : null;
  return { selection: selection.length === state.selection.length ? state.selection : selection, pendingCableStart };
}

export function createEditorStore(): EditorStore {
  let store: EditorStore;
  const history = () => store.temporal.getState();

  const creator = temporal<EditorState, [], [], History>(
    (set, get) => {
      const refuse = (error: CommandError): RunResult => {
        set({ lastError: error });
        return { ok: false, error };
      };
      const run = (name: string, args: unknown): RunResult => {
        const state = get();
        if (state.readOnly) return refuse(new CommandError('read-only', 'This version is read-only for you.'));
        let doc: Topology;
        const withFloor = name === 'cablePorts' && (args as CablePortsArgs).numberFloor === undefined ? { ...(args as CablePortsArgs), numberFloor: state.cableNumberFloor } : args;
        try {
          doc = runCommand(state.doc, name, withFloor);
        } catch (error) {
          if (error instanceof CommandError) return refuse(error);
          throw error;
        }
        if (doc !== state.doc) {
          const floor = doc.cables === state.doc.cables ? state.cableNumberFloor : Math.max(state.cableNumberFloor, nextCableNumber(doc));
          set({ doc, lastError: null, cableNumberFloor: floor, ...pruned(state, doc) });
        }
        else if (state.lastError) set({ lastError: null });
        return { ok: true, doc };
      };
      const afterTimeTravel = (before: EditorData) => {
        const extra = pruned(before, get().doc);
        if (Object.keys(extra).length > 0) set(extra);
      };
      return {
        ...initialData(),
        load(doc, options) {
          history().pause();
          set({ ...initialData(), session: get().session + 1, doc, savedDoc: options.savedDoc ?? doc, cableNumberFloor: Math.max(nextCableNumber(doc), nextCableNumber(options.savedDoc ?? doc)), designId: options.designId, baseVersion: options.baseVersion, readOnly: options.readOnly ?? false, viewport: options.viewport ?? DEFAULT_VIEWPORT, cableDefaults: get().cableDefaults, tool: get().tool === 'pan' ? 'pan' : 'select' });
          history().clear();
          history().resume();
        },
        run: run as EditorActions['run'],
        undo() {
          if (get().gestureStart) return;
          const before = get();
          history().undo();
          afterTimeTravel(before);
        },
        redo() {
          if (get().gestureStart) return;
          const before = get();
          history().redo();
          afterTimeTravel(before);
        },
        beginGesture() {
          if (get().readOnly || get().gestureStart) return;
          set({ gestureStart: get().doc });
          history().pause();
        },
        endGesture() {
          const start = get().gestureStart;
          if (!start) return;
          history().resume();
          set({ gestureStart: null });
          if (get().doc === start) return;
          // One entry for the whole drag: the document as it was when the drag began.
          const { pastStates } = history();
          const past = [...pastStates, { doc: start }].slice(-HISTORY_LIMIT);
          store.temporal.setState({ pastStates: past, futureStates: [] });
        },
        cancelGesture() {
          const start = get().gestureStart;
          if (!start) return;
          set({ doc: start, gestureStart: null });
          history().resume();
        },
        select: (ids) => set({ selection: [...new Set(ids)] }),
        toggleSelection(id) {
          const selection = get().selection;
          set({ selection: selection.includes(id) ? selection.filter((s) => s !== id) : [...selection, id] });
        },
        clearSelection: () => set({ selection: [] }),
        setTool: (tool) => set({ tool, pendingCableStart: tool === 'cable' ? get().pendingCableStart : null }),
        startCable: (portId) => set({ pendingCableStart: portId }),
        cancelCable: () => set({ pendingCableStart: null }),
        finishCable(portId, choice = {}) {
          const start = get().pendingCableStart;
          if (!start) return refuse(new CommandError('refused', 'Tap the port where the cable starts first.', 'a'));
          let connector: Connector;
          try {
            connector = portById(get().doc, start, 'a').port.connector;
          } catch (error) {
            set({ pendingCableStart: null });
            return refuse(error as CommandError);
          }
          const remembered = get().cableDefaults[connector];
          const media = choice.media ?? remembered.media;
          const lengthM = 'lengthM' in choice ? choice.lengthM : remembered.lengthM;
          const result = run('cablePorts', { a: start, b: portId, media, lengthM, label: choice.label, replace: choice.replace });
          if (result.ok) set({ pendingCableStart: null, cableDefaults: { ...get().cableDefaults, [connector]: { media, lengthM } } });
          return result;
        },
        setViewport: (viewport) => set({ viewport }),
        setCableDefaults: (connector, choice) => set({ cableDefaults: { ...get().cableDefaults, [connector]: choice } }),
        markSaved: (baseVersion, savedDoc) => set({ baseVersion, savedDoc: savedDoc ?? get().doc }),
      };
    },
    {
      partialize: (state) => ({ doc: state.doc }),
      // Only a new document is a step; selection, tool and viewport changes are not.
      equality: (past, current) => past.doc === current.doc,
      limit: HISTORY_LIMIT,
    },
  );
  store = createStore<EditorState>()(creator) as EditorStore;
  return store;
}

/** The editor store the canvas uses; tests make their own with createEditorStore(). */
export const editorStore = createEditorStore();

export const selectDirty = (state: EditorData): boolean => state.doc !== state.savedDoc;
