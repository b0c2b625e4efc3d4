import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import type { Topology } from '@/shared/topology/schema';
import { subjectLabel } from '@/lib/editor/describe';
import { editorStore } from '@/lib/editor/store';
import { runEdit } from '@/components/inspector/run';
import { BulkNetworkPicker } from '@/components/inspector/BulkNetworkPicker';

/** Several things selected: what they are, and deleting them in one step. */
export function MultiInspector({ ids, doc, readOnly }: { ids: string[]; doc: Topology; readOnly: boolean }) {
  const shown = ids.slice(0, 12);
  return (
    <View style={styles.wrap} testID="inspector-multi">
      <Text variant="bodyStrong">{`${ids.length} selected`}</Text>
      <Text variant="small" color="inkMuted">Shift- or Ctrl-click adds to the selection; drag any selected device to move them together.</Text>
      <View style={styles.list}>
        {shown.map((id) => (
          <Button key={id} label={subjectLabel(doc, id)} variant="ghost" size="compact" onPress={() => editorStore.getState().select([id])} />
        ))}
        {ids.length > shown.length ? <Text variant="small" color="inkMuted">{`…and ${ids.length - shown.length} more`}</Text> : null}
      </View>
      {!readOnly ? <BulkNetworkPicker doc={doc} testID="inspector-bulk-network" scopes={[{ label: 'The selection', scope: { kind: 'selection', ids } }]} /> : null}
      {!readOnly ? (
        <Button
          label={`Delete all ${ids.length}`}
          variant="danger"
          size="compact"
          testID="inspector-delete"
          onPress={() => {
            runEdit('deleteItems', { ids });
            editorStore.getState().clearSelection();
          }}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg }, list: { gap: space.xs } });
