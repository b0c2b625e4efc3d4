import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { ActivityIndicator, ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { router, type Href } from 'expo-router';
import { useStore } from 'zustand';
import { Banner, Button, colors, space, Text, WIDE_BREAKPOINT } from '@/components/ui';
import { useQueryClient } from '@tanstack/react-query';
import { designKeys } from '@/lib/api/designs';
import { fetchVersionDocument } from '@/lib/api/editor-save';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { createGestures } from '@/lib/editor/gestures';
import { boxOf, buildSnapshot } from '@/lib/editor/geometry';
import { revealAbove } from '@/lib/editor/reveal';
import { useDirty, useReadOnly, useSelection } from '@/lib/editor/hooks';
import { attachLiveAnalysis, liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { attachWorkingCopy, clearWorkingCopy, defaultStorage } from '@/lib/editor/working-copy';
import { Canvas } from '@/components/canvas/Canvas';
import { CanvasControls } from '@/components/editor/CanvasControls';
import { CableChooser } from '@/components/editor/CableChooser';
import { EditorToolbar, type EditorView } from '@/components/editor/EditorToolbar';
import { runShortcut } from '@/components/editor/editor-actions';
import { HelpSheet } from '@/components/editor/HelpSheet';
import { LeavePrompt } from '@/components/editor/LeavePrompt';
import { RestorePrompt } from '@/components/editor/RestorePrompt';
import { SaveDialog } from '@/components/editor/SaveDialog';
import { SidePanels, PhoneSheets } from '@/components/editor/EditorPanels';
import { useEditorSession } from '@/components/editor/useEditorSession';
import { withTidyLayout } from '@/lib/editor/tidy';
import { useEditorShortcuts } from '@/components/editor/useEditorShortcuts';
import { useLeaveGuard } from '@/components/editor/useLeaveGuard';
import { NetworksScreen } from '@/components/networks/NetworksScreen';
import { Palette } from '@/components/editor/Palette';

type Dialog = null | 'save' | 'help';

/** The share of the phone's canvas left above the inspector sheet (the sheet is 42 % high). */
const SHEET_GAP = 0.56;

/**
 * The canvas editor of one design: toolbar, palette, canvas and inspector on a wide screen; on a
 * phone the canvas fills the space and the inspector, palette and findings come up as sheets.
 * The screen wires the model together: the session (open, restore), the working copy, the live
 * analysis, the leave guard and the keyboard.
 */
export function EditorScreen({ designId }: { designId: number }) {
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_BREAKPOINT;
  const wideRef = useRef(wide);
  wideRef.current = wide;
  const session = useEditorSession(designId);
  const queryClient = useQueryClient();
  const gestures = useMemo(() => createGestures({ marquee: () => wideRef.current }), []);
  const [view, setView] = useState<EditorView>('canvas');
  const [dialog, setDialog] = useState<Dialog>(null);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [phoneSheet, setPhoneSheet] = useState<null | 'add' | 'findings'>(null);
  const [paletteOpen, setPaletteOpen] = useState<boolean | null>(null);
  const [noticeHidden, setNoticeHidden] = useState(false);
  const chooser = useStore(canvasUiStore, (s) => s.chooser);
  const dirty = useDirty();
  const readOnly = useReadOnly();
  const selection = useSelection();
  const ready = session.state.status === 'ready';
  // The palette starts open on an empty design and closed on a drawn one, where the canvas needs the room.
  useEffect(() => {
    if (ready && paletteOpen === null) setPaletteOpen(editorStore.getState().doc.devices.length === 0);
  }, [ready, paletteOpen]);

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

  // The first view of an opened design shows all of it.
  const fitted = useRef<number | null>(null);
  const screen = useStore(canvasUiStore, (s) => s.screen);
  useEffect(() => {
    const session = editorStore.getState().session;
    if (ready && screen.width > 0 && fitted.current !== session) {
      fitted.current = session;
      gestures.fit();
    }
  }, [ready, screen.width, gestures]);

  // Phone: a tapped device, card or controller comes into the part of the canvas above the sheet,
  // readable. Ports are left where they are: the next tap may be the other end of a cable.
  const only = selection.length === 1 ? selection[0] : null;
  useEffect(() => {
    if (wide || !only) return;
    const state = editorStore.getState();
    const snapshot = buildSnapshot(state.doc);
    if (!snapshot.devices.has(only) && snapshot.parts.get(only)?.kind !== 'group') return;
    const box = boxOf(snapshot, only);
    const screenNow = canvasUiStore.getState().screen;
    if (!box || screenNow.width === 0) return;
    state.setViewport(revealAbove(state.viewport, box, screenNow, screenNow.height * SHEET_GAP));
  }, [wide, only]);

  const guard = useLeaveGuard(ready && dirty && !readOnly);
  const leave = useCallback((href: string) => router.push(href as Href), []);
  const requestLeave = (href: string) => (dirty && !readOnly ? guard.ask(href) : leave(href));

  const openVersion = async (n: number) => {
    const doc = await fetchVersionDocument(queryClient, designId, n);
    const storage = defaultStorage();
    if (storage) clearWorkingCopy(storage, designId);
    editorStore.getState().load(withTidyLayout(doc).doc, { designId, baseVersion: n, readOnly });
    await queryClient.invalidateQueries({ queryKey: designKeys.design(designId), exact: true });
    setDialog(null);
  };

  const overlayOpen = dialog !== null || chooser !== null || guard.pending !== null || session.state.status === 'restore';
  useEditorShortcuts(ready && wide && view === 'canvas' && !overlayOpen, (action) =>
    runShortcut(action, { gestures, openSave: () => dirty && setDialog('save'), openHelp: () => setDialog('help') }),
  );

  const state = session.state;
  if (state.status === 'loading' || state.status === 'error') {
    return (
      <View style={styles.center} testID="editor-loading">
        {state.status === 'error' ? (
          <View style={styles.problem}>
            <Banner tone="error" title="The design could not be opened">
              {state.message}
            </Banner>
            <Button label="Try again" onPress={state.retry} />
          </View>
        ) : (
          <>
            <ActivityIndicator size="large" color={colors.primary} />
            <Text color="inkMuted">Opening the design…</Text>
          </>
        )}
      </View>
    );
  }

  const canvas = (
    <View style={styles.canvasArea}>
      <Canvas gestures={gestures} />
      <CanvasControls gestures={gestures} />
      {state.status === 'ready' && !noticeHidden && (state.layoutFixed || (savedAs !== null && !dirty)) ? (
        <View style={styles.notice}>
          {state.layoutFixed ? (
            <Banner tone="info" title="Boxes re-arranged" testID="editor-layout-fixed" action={<Button label="OK" variant="ghost" size="compact" onPress={() => setNoticeHidden(true)} testID="editor-notice-close" />}>
              {readOnly ? 'The saved layout had overlapping boxes on this canvas, so they are shown arranged afresh.' : 'The saved layout had overlapping boxes on this canvas, so they were arranged afresh. The new layout goes with the next version you save.'}
            </Banner>
          ) : null}
          {savedAs !== null && !dirty ? (
            <Banner tone="success" testID="editor-saved" action={<Button label="OK" variant="ghost" size="compact" onPress={() => setNoticeHidden(true)} />}>
              {`Saved as version ${savedAs}.`}
            </Banner>
          ) : null}
        </View>
      ) : null}
    </View>
  );

  return (
    <View style={styles.screen} testID="editor-screen">
      <EditorToolbar
        wide={wide}
        view={view}
        onView={setView}
        onBack={() => requestLeave(`/designs/${designId}`)}
        onSave={() => setDialog('save')}
        onHelp={() => setDialog('help')}
        onAdd={() => (wide ? setPaletteOpen(!paletteOpen) : setPhoneSheet('add'))}
        paletteOpen={wide && !!paletteOpen}
        onFindings={() => setPhoneSheet('findings')}
      />
      {view === 'networks' ? (
        <NetworksScreen wide={wide} />
      ) : wide ? (
        <View style={styles.row}>
          {!readOnly && paletteOpen ? (
            <ScrollView style={styles.palette} contentContainerStyle={styles.paletteBody}>
              <Palette />
            </ScrollView>
          ) : null}
          {canvas}
          <SidePanels />
        </View>
      ) : (
        <View style={styles.flex}>
          {canvas}
          <PhoneSheets sheet={phoneSheet} onSheet={setPhoneSheet} hasSelection={selection.length > 0} />
        </View>
      )}
      <CableChooser wide={wide} />
      {dialog === 'help' ? <HelpSheet wide={wide} onClose={() => setDialog(null)} /> : null}
      {dialog === 'save' ? (
        <SaveDialog
          designId={designId}
          wide={wide}
          onClose={() => setDialog(null)}
          onSaved={(n) => {
            setDialog(null);
            setSavedAs(n);
            setNoticeHidden(false);
            if (guard.pending) leave(guard.pending);
          }}
          onOpenVersion={(n) => void openVersion(n)}
        />
      ) : null}
      {state.status === 'restore' ? <RestorePrompt copy={state.copy} latest={state.latest} wide={wide} onRestore={session.restore} onDiscard={session.discard} /> : null}
      {guard.pending !== null && dialog === null ? (
        <LeavePrompt
          wide={wide}
          onStay={guard.clear}
          onSave={() => setDialog('save')}
          onLeave={() => {
            const href = guard.pending!;
            guard.clear();
            leave(href);
          }}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  screen: { flex: 1, backgroundColor: colors.paper },
  row: { flex: 1, flexDirection: 'row' },
  flex: { flex: 1 },
  canvasArea: { flex: 1, minWidth: 0 },
  palette: { width: 248, flexGrow: 0, backgroundColor: colors.surface, borderRightWidth: 1, borderRightColor: colors.line },
  paletteBody: { padding: space.md, gap: space.md },
  notice: { position: 'absolute', left: space.md, bottom: space.md, gap: space.sm, maxWidth: 480 },
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, backgroundColor: colors.paper, padding: space.lg },
  problem: { width: '100%', maxWidth: 480, gap: space.md },
});
