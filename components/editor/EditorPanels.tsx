import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Text, colors, space, TAP_TARGET } from '@/components/ui';
import { useEditorDoc, usePendingCableStart, useSelection } from '@/lib/editor/hooks';
import { subjectLabel } from '@/lib/editor/describe';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { Inspector, inspectorTitle } from '@/components/inspector/Inspector';
import { BottomSheet } from '@/components/editor/BottomSheet';
import { CablingStrip } from '@/components/editor/CablingStrip';
import { ConnectList } from '@/components/editor/ConnectList';
import { DevicePortList } from '@/components/editor/DevicePortList';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { FindingsPanel } from '@/components/editor/FindingsPanel';
import { Palette } from '@/components/editor/Palette';

type Tab = 'inspector' | 'findings';

function TabButton({ label, active, onPress, testID }: { label: string; active: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable role="tab" aria-selected={active} onPress={onPress} testID={testID} style={[styles.tab, active && styles.tabActive]}>
      <Text variant="smallStrong" color={active ? 'primary' : 'inkMuted'}>
        {label}
      </Text>
    </Pressable>
  );
}

/** The wide screen's right column: the inspector, or the findings list. */
export function SidePanels() {
  const [tab, setTab] = useState<Tab>('inspector');
  const problems = useStore(liveAnalysisStore, (s) => s.report?.findings.length ?? 0);
  return (
    <View style={styles.side} testID="side-panels">
      <View role="tablist" aria-label="Side panel" style={styles.tabs}>
        <TabButton label="Inspector" active={tab === 'inspector'} onPress={() => setTab('inspector')} testID="side-tab-inspector" />
        <TabButton label={`Findings (${problems})`} active={tab === 'findings'} onPress={() => setTab('findings')} testID="side-tab-findings" />
      </View>
      <ScrollView style={styles.sideScroll} contentContainerStyle={styles.sideBody} keyboardShouldPersistTaps="handled">
        {tab === 'inspector' ? <Inspector /> : <FindingsPanel />}
      </ScrollView>
    </View>
  );
}

type PhoneSheetsProps = { sheet: null | 'add' | 'findings'; onSheet: (sheet: null | 'add' | 'findings') => void; hasSelection: boolean };

/**
 * The phone's sheets: the palette or findings when asked for; "Connect to…" or a device's port list
 * while one is open; while a cable is being started from the selected port, a short strip that
 * leaves the canvas free; else the inspector while something is selected.
 */
export function PhoneSheets({ sheet, onSheet, hasSelection }: PhoneSheetsProps) {
  const [expanded, setExpanded] = useState(false);
  // The port whose settings the designer asked for while cabling from it; another port starts as a strip again.
  const [detailsFor, setDetailsFor] = useState<string | null>(null);
  const doc = useEditorDoc();
  const selection = useSelection();
  const pending = usePendingCableStart();
  const connectFrom = useStore(canvasUiStore, (s) => s.connectFrom);
  const portList = useStore(canvasUiStore, (s) => s.portList);
  const toggle = () => setExpanded(!expanded);
  if (sheet === 'add') {
    return (
      <BottomSheet title="Add to the canvas" expanded onToggle={toggle} onClose={() => onSheet(null)} testID="sheet-add">
        <Palette showTitle={false} onAdded={() => onSheet(null)} />
      </BottomSheet>
    );
  }
  if (sheet === 'findings') {
    return (
      <BottomSheet title="Findings" expanded={expanded} onToggle={toggle} onClose={() => onSheet(null)} testID="sheet-findings">
        <FindingsPanel onFocused={() => onSheet(null)} />
      </BottomSheet>
    );
  }
  // Closing the list lets go of its device too, so no settings sheet takes its place.
  const closePortList = () => {
    canvasUiStore.setState({ portList: null });
    if (!editorStore.getState().pendingCableStart) editorStore.getState().clearSelection();
  };
  if (connectFrom) {
    return (
      <BottomSheet title="Connect to…" expanded onToggle={toggle} onClose={() => canvasUiStore.setState({ connectFrom: null })} testID="sheet-connect">
        <ConnectList from={connectFrom} />
      </BottomSheet>
    );
  }
  if (portList) {
    return (
      <BottomSheet title={`Ports of ${subjectLabel(doc, portList.deviceId)}`} expanded={expanded} onToggle={toggle} onClose={closePortList} testID="sheet-ports">
        <DevicePortList deviceId={portList.deviceId} />
      </BottomSheet>
    );
  }
  if (!hasSelection) return null;
  // Closing also ends a cable begun from the selected port, so a later tap cannot finish a hidden one.
  const close = () => {
    editorStore.getState().cancelCable();
    editorStore.getState().clearSelection();
    setDetailsFor(null);
  };
  if (pending && selection.length === 1 && selection[0] === pending && detailsFor !== pending) {
    return <CablingStrip from={subjectLabel(doc, pending)} onConnect={() => canvasUiStore.setState({ connectFrom: pending })} onDetails={() => setDetailsFor(pending)} onStop={close} />;
  }
  return (
    // Keyed by the selection so a new selection's form starts scrolled to its top.
    <BottomSheet key={selection.join(' ')} title={inspectorTitle(doc, selection)} expanded={expanded} onToggle={toggle} onClose={close} testID="sheet-inspector">
      <Inspector showTitle={false} />
    </BottomSheet>
  );
}

const styles = StyleSheet.create({
  side: { width: 360, backgroundColor: colors.surface, borderLeftWidth: 1, borderLeftColor: colors.line },
  tabs: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.line, paddingHorizontal: space.sm },
  tab: { minHeight: TAP_TARGET, paddingHorizontal: space.md, justifyContent: 'center', borderBottomWidth: 3, borderBottomColor: 'transparent' },
  tabActive: { borderBottomColor: colors.copper },
  sideScroll: { flex: 1 },
  sideBody: { padding: space.lg, gap: space.lg },
});
