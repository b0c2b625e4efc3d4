import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { router, type Href } from 'expo-router';
import { useStore } from 'zustand';
import { useQueryClient } from '@tanstack/react-query';
import { colors, space, WIDE_BREAKPOINT } from '@/components/ui';
import { designKeys } from '@/lib/api/designs';
import { fetchVersionDocument } from '@/lib/api/editor-save';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { createGestures } from '@/lib/editor/gestures';
import { useDirty, useReadOnly, useSelection } from '@/lib/editor/hooks';
import { editorStore } from '@/lib/editor/store';
import { withTidyLayout } from '@/lib/editor/tidy';
import { clearWorkingCopy, defaultStorage } from '@/lib/editor/working-copy';
import { Canvas } from '@/components/canvas/Canvas';
import { CableChooser } from '@/components/editor/CableChooser';
import { CableNoticeBar } from '@/components/editor/CableNoticeBar';
import { PortListOverlays } from '@/components/editor/PortListOverlays';
import { CanvasControls } from '@/components/editor/CanvasControls';
import { runShortcut } from '@/components/editor/editor-actions';
import { PhoneSheets, SidePanels } from '@/components/editor/EditorPanels';
import { EditorLoading, EditorNotices } from '@/components/editor/EditorStates';
import { EditorToolbar, type EditorView } from '@/components/editor/EditorToolbar';
import { HelpSheet } from '@/components/editor/HelpSheet';
import { LeavePrompt } from '@/components/editor/LeavePrompt';
import { Palette } from '@/components/editor/Palette';
import { RestorePrompt } from '@/components/editor/RestorePrompt';
import { SaveDialog } from '@/components/editor/SaveDialog';
import { useEditorSession } from '@/components/editor/useEditorSession';
import { useEditorShortcuts } from '@/components/editor/useEditorShortcuts';
import { useEditorWiring } from '@/components/editor/useEditorWiring';
import { useLeaveGuard } from '@/components/editor/useLeaveGuard';
import { NetworksScreen } from '@/components/networks/NetworksScreen';

type Dialog = null | 'save' | 'help';

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
  const gestures = useMemo(() => createGestures({ marquee: () => wideRef.current, directCable: () => !wideRef.current }), []);
  const [view, setView] = useState<EditorView>('canvas');
  const [dialog, setDialog] = useState<Dialog>(null);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [phoneSheet, setPhoneSheet] = useState<null | 'add' | 'findings'>(null);
  const [paletteOpen, setPaletteOpen] = useState<boolean | null>(null);
  const [noticeHidden, setNoticeHidden] = useState(false);
  const chooser = useStore(canvasUiStore, (s) => s.chooser);
  const listOpen = useStore(canvasUiStore, (s) => s.connectFrom !== null || s.portList !== null);
  const dirty = useDirty();
  const readOnly = useReadOnly();
  const selection = useSelection();
  const ready = session.state.status === 'ready';
  // The palette starts open on an empty design and closed on a drawn one, where the canvas needs the room.
  useEffect(() => {
    if (ready && paletteOpen === null) setPaletteOpen(editorStore.getState().doc.devices.length === 0);
  }, [ready, paletteOpen]);

  useEditorWiring({ ready, shown: ready || session.state.status === 'restore', readOnly, wide, gestures, selection });

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

  const overlayOpen = dialog !== null || chooser !== null || listOpen || guard.pending !== null || session.state.status === 'restore';
  useEditorShortcuts(ready && wide && view === 'canvas' && !overlayOpen, (action) =>
    runShortcut(action, { gestures, openSave: () => dirty && setDialog('save'), openHelp: () => setDialog('help') }),
  );

  const state = session.state;
  if (state.status === 'loading') return <EditorLoading />;
  if (state.status === 'error') return <EditorLoading error={state} />;

  const canvas = (
    <View style={styles.canvasArea}>
      <Canvas gestures={gestures} />
      <CanvasControls gestures={gestures} />
      <CableNoticeBar />
      {state.status === 'ready' && !noticeHidden ? <EditorNotices layoutFixed={state.layoutFixed} savedAs={dirty ? null : savedAs} readOnly={readOnly} onClose={() => setNoticeHidden(true)} /> : null}
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
        approvedVersion={session.design?.design.approvedVersion?.number ?? null}
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
      {wide ? <PortListOverlays /> : null}
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
});
