import { StyleSheet, View } from 'react-native';
import { Button, Text, colors, radius, space } from '@/components/ui';
import type { Adapter, Controller, Device } from '@/shared/topology/schema';
import { editorStore } from '@/lib/editor/store';
import { runEdit } from '@/components/inspector/run';

type Props = { device: Device; groups: (Controller | Adapter)[]; readOnly: boolean };

/** A device's controllers or cards (or a switch's port count), to select one or add another. */
export function PartList({ device, groups, readOnly }: Props) {
  const select = (id: string) => editorStore.getState().select([id]);
  if (device.kind === 'switch') {
    return (
      <View style={styles.wrap}>
        <Text variant="label">{`Ports (${device.ports.length})`}</Text>
        <Text variant="small" color="inkMuted">{readOnly ? 'Tap a port on the canvas to see it.' : 'Tap a port on the canvas to edit it or to start a cable from it.'}</Text>
        {!readOnly ? <Button label="Add a port" variant="secondary" size="compact" onPress={() => runEdit('addPort', { ownerId: device.id })} testID="inspector-add-port" /> : null}
      </View>
    );
  }
  const noun = device.kind === 'array' ? 'Controllers' : 'Cards';
  return (
    <View style={styles.wrap}>
      <Text variant="label">{`${noun} (${groups.length})`}</Text>
      {groups.map((group) => (
        <View key={group.id} style={styles.row}>
          <Text variant="small" style={styles.name}>{`${group.name} — ${group.ports.length} port${group.ports.length === 1 ? '' : 's'}`}</Text>
          <Button label="Open" variant="ghost" size="compact" onPress={() => select(group.id)} testID={`inspector-open-${group.id}`} />
        </View>
      ))}
      {!readOnly ? (
        <Button
          label={device.kind === 'array' ? 'Add a controller' : 'Add a card'}
          variant="secondary"
          size="compact"
          disabled={device.kind === 'array' && groups.length >= 4}
          onPress={() => (device.kind === 'array' ? runEdit('addController', { arrayId: device.id }) : runEdit('addAdapter', { hostId: device.id }))}
          testID="inspector-add-group"
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingLeft: space.sm, borderLeftWidth: 3, borderLeftColor: colors.line, borderRadius: radius.sm },
  name: { flex: 1 },
});
