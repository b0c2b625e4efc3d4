import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { useStore } from 'zustand';
import { Text, colors, space } from '@/components/ui';
import { useBaseVersion, useCanRedo, useCanUndo, useDirty, useEditorDoc, useReadOnly, useSelection } from '@/lib/editor/hooks';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { plural } from '@/lib/designs/summary';
import { severityCounts } from '@/lib/report/view';
import type { Finding } from '@/shared/analysis/types';
import { editorStore } from '@/lib/editor/store';
import { IconButton } from '@/components/editor/IconButton';
import { arrange, deleteSelection, downloadDiagram } from '@/components/editor/editor-actions';

export type EditorView = 'canvas' | 'networks';

type ToolbarProps = {
  wide: boolean;
  view: EditorView;
  onView: (view: EditorView) => void;
  onBack: () => void;
  onSave: () => void;
  onHelp: () => void;
  onAdd: () => void;
  onFindings: () => void;
  /** Wide screens: whether the palette column is shown. */
  paletteOpen: boolean;
  /** The design's newest approved version, so the status never lets a draft pass for it. */
  approvedVersion?: number | null;
};

/** The same words as the findings list: problems are errors; warnings only when there are some. */
function findingCounts(findings: readonly Finding[]): string {
  const { error, warning } = severityCounts(findings);
  return `${plural(error, 'problem')}${warning > 0 ? `, ${plural(warning, 'warning')}` : ''}`;
}

/** "version 3, approved", "version 4 · approved v3", "version 2". */
function versionWords(base: number | null, approved: number | null): string {
  if (base === null) return 'no version yet';
  if (approved === base) return `version ${base}, approved`;
  return approved === null ? `version ${base}` : `version ${base} · approved v${approved}`;
}

function Status({ approved }: { approved: number | null }) {
  const dirty = useDirty();
  const readOnly = useReadOnly();
  const base = useBaseVersion();
  const counts = useStore(liveAnalysisStore, (s) => (s.report ? findingCounts(s.report.findings) : null));
  // While unsaved the line is about the work in progress; the approval is told once it is saved or read.
  const version = versionWords(base, dirty && !readOnly ? null : approved);
  const state = readOnly ? `Read-only · ${version}` : dirty ? (base === null ? 'Unsaved · no version yet' : `Unsaved · on ${version}`) : base === null ? 'No version saved yet' : `Saved · ${version}`;
  return (
    <Text variant="caption" color={dirty && !readOnly ? 'copper' : 'inkMuted'} numberOfLines={1} testID="editor-status">
      {`${dirty && !readOnly ? '● ' : ''}${state}${counts === null ? '' : ` · ${counts}`}`}
    </Text>
  );
}

/** The editor's bar: back, the design and its state, undo/redo, arrange, views, export, help and save. */
export function EditorToolbar({ wide, view, onView, onBack, onSave, onHelp, onAdd, onFindings, paletteOpen, approvedVersion = null }: ToolbarProps) {
  const name = useEditorDoc().name;
  const readOnly = useReadOnly();
  const dirty = useDirty();
  const canUndo = useCanUndo();
  const canRedo = useCanRedo();
  const selected = useSelection().length > 0;
  const store = editorStore.getState();
  const insets = useSafeAreaInsets();
  const tools = (
    <>
      {!readOnly && view === 'canvas' ? <IconButton icon="add" label={wide ? (paletteOpen ? 'Hide the palette' : 'Add devices') : 'Add a device'} onPress={onAdd} active={paletteOpen} testID="toolbar-add" /> : null}
      {!readOnly ? <IconButton icon="undo" label="Undo" shortcut="Ctrl+Z" onPress={() => store.undo()} disabled={!canUndo} testID="toolbar-undo" /> : null}
      {!readOnly ? <IconButton icon="redo" label="Redo" shortcut="Ctrl+Shift+Z" onPress={() => store.redo()} disabled={!canRedo} testID="toolbar-redo" /> : null}
      {!readOnly && wide && view === 'canvas' ? <IconButton icon="trash" label="Delete selected" shortcut="Delete" onPress={deleteSelection} disabled={!selected} testID="toolbar-delete" /> : null}
      {!readOnly && view === 'canvas' ? <IconButton icon="arrange" label="Auto-arrange" shortcut="Shift+A" onPress={arrange} showLabel={wide} testID="toolbar-arrange" /> : null}
      <IconButton icon={view === 'canvas' ? 'networks' : 'canvas'} label={view === 'canvas' ? 'Networks & addresses' : 'Back to the canvas'} onPress={() => onView(view === 'canvas' ? 'networks' : 'canvas')} showLabel={wide} testID="toolbar-view" />
      {!wide && view === 'canvas' ? <IconButton icon="findings" label="Findings" onPress={onFindings} testID="toolbar-findings" /> : null}
      <IconButton icon="export" label="Export the diagram as SVG" onPress={() => void downloadDiagram()} testID="toolbar-export" />
      <IconButton icon="help" label="Canvas help" shortcut="?" onPress={onHelp} testID="toolbar-help" />
    </>
  );
  const save = !readOnly ? <IconButton icon="save" label="Save version" shortcut="Ctrl+S" tone="primary" showLabel={wide} onPress={onSave} disabled={!dirty} testID="toolbar-save" /> : null;
  return (
    <View style={[styles.bar, !wide && { paddingTop: insets.top + space.xs }]} testID="editor-toolbar">
      <View style={styles.top}>
        <IconButton icon="back" label="Back to the design" onPress={onBack} testID="toolbar-back" />
        <View style={styles.title}>
          <Text variant="bodyStrong" numberOfLines={1} testID="editor-design-name">
            {name}
          </Text>
          <Status approved={approvedVersion} />
        </View>
        {wide ? <View style={styles.tools}>{tools}</View> : null}
        {save}
      </View>
      {!wide ? (
        <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.tools}>
          {tools}
        </ScrollView>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.line, paddingHorizontal: space.sm, paddingVertical: space.xs, gap: 2 },
  top: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  title: { flex: 1, minWidth: 0 },
  tools: { flexDirection: 'row', alignItems: 'center', gap: 2 },
});
