import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import type { Adapter, Controller, Device } from '@/shared/topology/schema';
import { iqnAdvice, iqnField, nameField } from '@/lib/editor/fields';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { useStore } from 'zustand';
import { editorStore } from '@/lib/editor/store';
import { CommitField } from '@/components/inspector/CommitField';
import { FindingsAbout } from '@/components/inspector/FindingsAbout';
import { runEdit } from '@/components/inspector/run';

type Props = { group: Controller | Adapter; device: Device; readOnly: boolean };

/** A controller of an array or a card of a host: one failure unit holding its ports. */
export function GroupInspector({ group, device, readOnly }: Props) {
  const isController = device.kind === 'array';
  const noun = isController ? 'controller' : 'card';
  const iqnFinding = useStore(liveAnalysisStore, (s) => s.marks.findingsBySubject.get(group.id)?.find((f) => f.rule === 'iqn-invalid')?.message ?? null);
  const own = isController ? (group as Controller).iqn : undefined;
  return (
    <View style={styles.wrap} testID="inspector-group">
      <Text variant="small" color="inkMuted">{`A ${noun} of ${device.name}. It fails as one: all its ports go with it.`}</Text>
      <CommitField label="Name" value={group.name} schema={nameField} readOnly={readOnly} testID="inspector-name" onCommit={(name) => runEdit('renamePart', { id: group.id, name })} />
      {isController ? (
        <CommitField
          label="Own target name (IQN)"
          hint={`Only when this controller is its own target; leave empty to use ${device.name}'s target name.`}
          value={own ?? ''}
          schema={iqnField}
          advise={iqnAdvice}
          note={own ? (iqnFinding ?? iqnAdvice(own)) : null}
          readOnly={readOnly}
          placeholder={device.kind === 'array' && device.iqn ? device.iqn : 'iqn.2026-01.example.tidewater:storage.array-name'}
          testID="inspector-controller-iqn"
          onCommit={(iqn) => runEdit('setControllerIqn', { id: group.id, iqn })}
        />
      ) : null}
      <View style={styles.ports}>
        <Text variant="label">{`Ports (${group.ports.length})`}</Text>
        <View style={styles.portRow}>
          {group.ports.map((port) => (
            <Button key={port.id} label={port.name} variant="secondary" size="compact" onPress={() => editorStore.getState().select([port.id])} testID={`inspector-open-${port.id}`} />
          ))}
        </View>
        {!readOnly ? <Button label="Add a port" variant="secondary" size="compact" onPress={() => runEdit('addPort', { ownerId: group.id })} testID="inspector-add-port" /> : null}
      </View>
      <FindingsAbout ids={[group.id, ...group.ports.map((p) => p.id)]} />
      <View style={styles.portRow}>
        <Button label={`Back to ${device.name}`} variant="ghost" size="compact" onPress={() => editorStore.getState().select([device.id])} />
        {!readOnly ? (
          <Button
            label={`Remove ${group.name}`}
            variant="danger"
            size="compact"
            testID="inspector-remove-group"
            onPress={() => {
              const refusal = isController ? runEdit('removeController', { id: group.id }) : runEdit('removeAdapter', { id: group.id });
              if (!refusal) editorStore.getState().select([device.id]);
            }}
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  ports: { gap: space.sm },
  portRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
