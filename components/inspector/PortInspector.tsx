import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import { CONNECTORS, PORT_ROLES, PORT_SPEEDS, type Adapter, type Controller, type Device, type Port, type Topology } from '@/shared/topology/schema';
import { cablesOnPort, portLabel } from '@/lib/editor/describe';
import { nameField } from '@/lib/editor/fields';
import { editorStore } from '@/lib/editor/store';
import { usePendingCableStart } from '@/lib/editor/hooks';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { CommitField } from '@/components/inspector/CommitField';
import { FindingsAbout } from '@/components/inspector/FindingsAbout';
import { PortAddressFields } from '@/components/inspector/PortAddressFields';
import { runEdit } from '@/components/inspector/run';

export const SPEED_CHIPS = PORT_SPEEDS.map((s) => ({ value: s, label: `${s}G` }));
const CONNECTOR_CHIPS = CONNECTORS.map((c) => ({ value: c, label: c === 'rj45' ? 'RJ45' : 'SFP' }));
const ROLE_CHIPS = PORT_ROLES.map((r) => ({ value: r, label: r === 'data' ? 'Data' : 'Management' }));

type Props = { port: Port; device: Device; group?: Controller | Adapter; doc: Topology; readOnly: boolean };

/** One port: name, role, speed and connector; network and address (not on switches); its cables. */
export function PortInspector({ port, device, group, doc, readOnly }: Props) {
  const pending = usePendingCableStart();
  const cables = cablesOnPort(doc, port.id);
  const set = (args: Omit<Parameters<typeof runEdit<'setPort'>>[1], 'id'>) => runEdit('setPort', { id: port.id, ...args });
  return (
    <View style={styles.wrap} testID="inspector-port">
      <Text variant="small" color="inkMuted">{`A port of ${[device.name, group?.name].filter(Boolean).join(' ')}.`}</Text>
      {!readOnly ? (
        <Text variant="small" color={pending === port.id ? 'copper' : 'inkMuted'} testID="inspector-cable-hint">
          {pending === port.id ? 'Cable start: tap the port at the other end on the canvas (tap this one again or press Escape to stop), or choose it from a list.' : 'Tap this port on the canvas to start a cable from it, or choose the other end from a list.'}
        </Text>
      ) : null}
      {!readOnly ? (
        <Button
          label="Connect to…"
          variant="secondary"
          size="compact"
          testID="inspector-connect"
          onPress={() => {
            editorStore.getState().startCable(port.id);
            canvasUiStore.setState({ connectFrom: port.id });
          }}
        />
      ) : null}
      <CommitField label="Name" value={port.name} schema={nameField} readOnly={readOnly} testID="inspector-name" onCommit={(name) => runEdit('renamePart', { id: port.id, name })} />
      <ChipPicker label="Role" chips={ROLE_CHIPS} value={port.role} disabled={readOnly} testID="inspector-port-role" onChange={(role) => set({ role })} />
      <ChipPicker label="Speed" chips={SPEED_CHIPS} value={port.speedGbps} disabled={readOnly} testID="inspector-port-speed" onChange={(speedGbps) => set({ speedGbps })} />
      <ChipPicker label="Connector" chips={CONNECTOR_CHIPS} value={port.connector} disabled={readOnly} testID="inspector-port-connector" onChange={(connector) => set({ connector })} />
      {device.kind === 'switch' ? (
        <Text variant="small" color="inkMuted">A switch port carries every network and has no address of its own.</Text>
      ) : (
        <PortAddressFields port={port} doc={doc} readOnly={readOnly} />
      )}
      <View style={styles.cables}>
        <Text variant="label">{`Cables (${cables.length})`}</Text>
        {cables.length === 0 ? <Text variant="small" color="inkMuted">No cable on this port.</Text> : null}
        {cables.map((cable) => (
          <View key={cable.id} style={styles.cableRow}>
            <Button label={`${cable.label ?? cable.id} to ${portLabel(doc, cable.a === port.id ? cable.b : cable.a)}`} variant="ghost" size="compact" onPress={() => editorStore.getState().select([cable.id])} />
            {!readOnly ? <Button label="Remove" variant="secondary" size="compact" onPress={() => runEdit('uncable', { ids: [cable.id] })} testID={`inspector-uncable-${cable.id}`} /> : null}
          </View>
        ))}
      </View>
      <FindingsAbout ids={[port.id, ...cables.map((c) => c.id)]} />
      <View style={styles.cableRow}>
        {group ? <Button label={`Back to ${group.name}`} variant="ghost" size="compact" onPress={() => editorStore.getState().select([group.id])} /> : null}
        <Button label={`Back to ${device.name}`} variant="ghost" size="compact" onPress={() => editorStore.getState().select([device.id])} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  cables: { gap: space.sm },
  cableRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
