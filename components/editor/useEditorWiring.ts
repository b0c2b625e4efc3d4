import { useEffect, useRef } from 'react';
import { useStore } from 'zustand';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import type { Gestures } from '@/lib/editor/gestures';
import { boxOf, buildSnapshot } from '@/lib/editor/geometry';
import { attachLiveAnalysis, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { revealAbove } from '@/lib/editor/reveal';
import { editorStore } from '@/lib/editor/store';
import { attachWorkingCopy, defaultStorage } from '@/lib/editor/working-copy';

/** The share of the phone's canvas left above the inspector sheet (the sheet is 42 % high). */
const SHEET_GAP = 0.56;

/**
 * What runs beside the editor while a design is open: the working copy kept in local storage, the
 * live analysis, the first fit of an opened design (also of the saved version drawn behind the restore question), and on a phone bringing a tapped device, card
 * or controller into the part of the canvas above the sheet, readable and with ports a finger can tap. Ports are left where they
 * are: the next tap may be the other end of a cable.
 */
export function useEditorWiring({ ready, shown, readOnly, wide, gestures, selection }: { ready: boolean; shown: boolean; readOnly: boolean; wide: boolean; gestures: Gestures; selection: string[] }) {
  useEffect(() => {
    if (!ready) return;
    const storage = defaultStorage();
    const detachCopy = storage && !readOnly ? attachWorkingCopy(editorStore, storage) : () => undefined;
    const detachLive = attachLiveAnalysis(editorStore, liveAnalysisStore, { isBusy: () => canvasUiStore.getState().busy });
    return () => {
      detachCopy();
      detachLive();
    };
  }, [ready, readOnly]);

  const fitted = useRef<number | null>(null);
  const screenWidth = useStore(canvasUiStore, (s) => s.screen.width);
  useEffect(() => {
    const session = editorStore.getState().session;
    if (shown && screenWidth > 0 && fitted.current !== session) {
      fitted.current = session;
      gestures.fit();
    }
  }, [ready, shown, screenWidth, gestures]);

  const only = selection.length === 1 ? selection[0] : null;
  useEffect(() => {
    if (wide || !only) return;
    // A device whose port list is open stays where it is: the list is the precise way in.
    if (canvasUiStore.getState().portList?.deviceId === only) return;
    const state = editorStore.getState();
    const snapshot = buildSnapshot(state.doc);
    if (!snapshot.devices.has(only) && snapshot.parts.get(only)?.kind !== 'group') return;
    const box = boxOf(snapshot, only);
    const screen = canvasUiStore.getState().screen;
    if (!box || screen.width === 0) return;
    // At zoom 1 or more a port's target is 44 px on screen (PORT_PITCH), a finger's size: its ports can be tapped.
    state.setViewport(revealAbove(state.viewport, box, screen, screen.height * SHEET_GAP, 1));
  }, [wide, only]);
}
