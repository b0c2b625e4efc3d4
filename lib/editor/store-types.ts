import type { TemporalState } from 'zundo';
import type { StoreApi } from 'zustand/vanilla';
import type { Connector, Media, Topology } from '@/shared/topology/schema';
import type { CablePortsArgs, CommandArgs, CommandName } from '@/lib/editor/commands';
import type { CommandError } from '@/lib/editor/errors';
import type { Viewport } from '@/lib/editor/viewport';

/** The editor store's state and actions (store.ts builds it). */
export type Tool = 'select' | 'cable' | 'pan';
export type DesignId = number | string;
export type CableChoice = { media: Media; lengthM?: number };
/** Remembered per connector: an RJ45 default is no use for SFP ports. */
export type CableDefaults = Record<Connector, CableChoice>;
export type RunResult = { ok: true; doc: Topology } | { ok: false; error: CommandError };

export type EditorData = {
  designId: DesignId | null;
  /** The version the working copy started from; null for a design without versions yet. */
  baseVersion: number | null;
  doc: Topology;
  /** The document as last loaded or saved; the working copy is dirty when `doc` differs. */
  savedDoc: Topology;
  readOnly: boolean;
  /** Selected ids of any kind (devices, controllers, cards, ports, cables, networks). */
  selection: string[];
  tool: Tool;
  /** The first port of a cable being drawn with the cable tool. */
  pendingCableStart: string | null;
  viewport: Viewport;
  cableDefaults: CableDefaults;
  /** The document when the current drag began; null outside a drag. */
  gestureStart: Topology | null;
  lastError: CommandError | null;
  /** Counts `load` calls, so watchers can tell an opened document from an edited one. */
  session: number;
  /** The next cable number never goes below this: numbers seen this session and in the saved version stay used. */
  cableNumberFloor: number;
};

export type LoadOptions = {
  designId: DesignId | null;
  baseVersion: number | null;
  readOnly?: boolean;
  viewport?: Viewport;
  /**
   * The server's document when `doc` is a restored working copy: the store then starts dirty
   * against it. By default `doc` itself is the saved state.
   */
  savedDoc?: Topology;
};

export type EditorActions = {
  load(doc: Topology, options: LoadOptions): void;
  run<K extends CommandName>(name: K, args: CommandArgs[K]): RunResult;
  undo(): void;
  redo(): void;
  beginGesture(): void;
  endGesture(): void;
  cancelGesture(): void;
  select(ids: string[]): void;
  toggleSelection(id: string): void;
  clearSelection(): void;
  setTool(tool: Tool): void;
  startCable(portId: string): void;
  cancelCable(): void;
  /** Cables the pending start port to `portId` with the remembered defaults (or `choice`) and remembers the choice. */
  finishCable(portId: string, choice?: Partial<CableChoice> & Pick<CablePortsArgs, 'label' | 'replace'>): RunResult;
  setViewport(viewport: Viewport): void;
  setCableDefaults(connector: Connector, choice: CableChoice): void;
  /** After a successful save: the new base version, and the document that was sent (default: the current one). */
  markSaved(baseVersion: number, savedDoc?: Topology): void;
};

export type EditorState = EditorData & EditorActions;
export type History = { doc: Topology };
export type EditorStore = StoreApi<EditorState> & { temporal: StoreApi<TemporalState<History>> };

