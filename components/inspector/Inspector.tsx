import { View, StyleSheet } from 'react-native';
import { Text, space } from '@/components/ui';
import { describeId, KIND_LABEL, subjectLabel } from '@/lib/editor/describe';
import { useEditorDoc, useReadOnly, useSelection } from '@/lib/editor/hooks';
import type { Topology } from '@/shared/topology/schema';
import { CableInspector } from '@/components/inspector/CableInspector';
import { DesignInspector } from '@/components/inspector/DesignInspector';
import { DeviceInspector } from '@/components/inspector/DeviceInspector';
import { GroupInspector } from '@/components/inspector/GroupInspector';
import { MultiInspector } from '@/components/inspector/MultiInspector';
import { PortInspector } from '@/components/inspector/PortInspector';

/** The title the inspector (or the phone's sheet) shows for the selection. */
export function inspectorTitle(doc: Topology, selection: string[]): string {
  if (selection.length === 0) return 'Design';
  if (selection.length > 1) return `${selection.length} selected`;
  const found = describeId(doc, selection[0]);
  if (!found) return 'Nothing selected';
  if (found.kind === 'device') return `${KIND_LABEL[found.device.kind]} ${found.device.name}`;
  if (found.kind === 'group') return `${found.device.kind === 'array' ? 'Controller' : 'Card'} ${subjectLabel(doc, selection[0])}`;
  if (found.kind === 'port') return `Port ${subjectLabel(doc, selection[0])}`;
  if (found.kind === 'cable') return `Cable ${found.cable.label ?? found.cable.id}`;
  return `Network ${found.network.name}`;
}

/** Edits whatever is selected; each editor is keyed by the id so its fields start from that thing. */
export function Inspector({ showTitle = true }: { showTitle?: boolean }) {
  const doc = useEditorDoc();
  const selection = useSelection();
  const readOnly = useReadOnly();
  const found = selection.length === 1 ? describeId(doc, selection[0]) : null;
  let body;
  if (selection.length > 1) body = <MultiInspector ids={selection} doc={doc} readOnly={readOnly} />;
  else if (!found) body = <DesignInspector doc={doc} readOnly={readOnly} />;
  else if (found.kind === 'device') body = <DeviceInspector key={found.device.id} device={found.device} doc={doc} readOnly={readOnly} />;
  else if (found.kind === 'group') body = <GroupInspector key={found.group.id} group={found.group} device={found.device} readOnly={readOnly} />;
  else if (found.kind === 'port') body = <PortInspector key={found.port.id} port={found.port} device={found.device} group={found.group} doc={doc} readOnly={readOnly} />;
  else if (found.kind === 'cable') body = <CableInspector key={found.cable.id} cable={found.cable} doc={doc} readOnly={readOnly} />;
  else body = <Text variant="small">{`Network ${found.network.name}: edit it under Networks & addresses.`}</Text>;
  return (
    <View style={styles.wrap} testID="inspector">
      {showTitle ? (
        <Text variant="heading" role="heading" numberOfLines={2}>
          {inspectorTitle(doc, selection)}
        </Text>
      ) : null}
      {body}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg } });
