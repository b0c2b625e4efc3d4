import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import { SWITCH_ROLES, type Device, type SwitchRole, type Topology } from '@/shared/topology/schema';
import { groupsOf } from '@/lib/editor/commands/doc';
import { iqnAdvice, iqnField, nameField, rackField, ruField } from '@/lib/editor/fields';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { useStore } from 'zustand';
import { editorStore } from '@/lib/editor/store';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { CommitField } from '@/components/inspector/CommitField';
import { FindingsAbout } from '@/components/inspector/FindingsAbout';
import { HostPaths } from '@/components/inspector/HostPaths';
import { PartList } from '@/components/inspector/PartList';
import { runEdit } from '@/components/inspector/run';

const ROLE_CHIPS = SWITCH_ROLES.map((role) => ({ value: role, label: role === 'data' ? 'Data' : role === 'management' ? 'Management' : 'Shared' }));

/** The prefix other hosts' initiator names use ("iqn.2026-01.example.tidewater"), to suggest one for this host. */
function iqnSuggestion(doc: Topology, device: Device): string | null {
  for (const other of doc.devices) {
    if (other.kind !== 'host' || other.id === device.id || !other.iqn) continue;
    const colon = other.iqn.indexOf(':');
    if (other.iqn.startsWith('iqn.') && colon > 0) return `${other.iqn.slice(0, colon)}:${device.name.toLowerCase().replace(/[^a-z0-9.:-]+/g, '-')}`;
  }
  return null;
}

/** A target name for an array from the hosts' prefix: "iqn.2026-01.example.tidewater:storage.vault-1". */
function targetSuggestion(doc: Topology, device: Device): string | null {
  for (const other of doc.devices) {
    if (other.kind !== 'host' || !other.iqn) continue;
    const colon = other.iqn.indexOf(':');
    if (other.iqn.startsWith('iqn.') && colon > 0) return `${other.iqn.slice(0, colon)}:storage.${device.name.toLowerCase().replace(/[^a-z0-9.:-]+/g, '-')}`;
  }
  return null;
}

/** The printed name of the rack the device is placed in, or empty. */
function rackName(doc: Topology, device: Device): string {
  const rackId = device.placement?.rackId;
  return rackId === undefined ? '' : (doc.racks?.find((r) => r.id === rackId)?.name ?? '');
}

type Props = { device: Device; doc: Topology; readOnly: boolean };

/** A device: its name, role (switch), initiator name (host) or target name (array), rack place, parts and findings. */
export function DeviceInspector({ device, doc, readOnly }: Props) {
  const iqnNote = device.kind === 'host' ? iqnSuggestion(doc, device) : device.kind === 'array' ? targetSuggestion(doc, device) : null;
  const iqnFinding = useStore(liveAnalysisStore, (s) => s.marks.findingsBySubject.get(device.id)?.find((f) => f.rule === 'iqn-invalid')?.message ?? null);
  const nameFinding = useStore(liveAnalysisStore, (s) => s.marks.findingsBySubject.get(device.id)?.find((f) => f.rule === 'device-name-duplicate')?.message ?? null);
  const groups = groupsOf(device);
  return (
    <View style={styles.wrap} testID="inspector-device">
      <CommitField label="Name" value={device.name} schema={nameField} note={nameFinding} readOnly={readOnly} testID="inspector-name" onCommit={(name) => runEdit('renameDevice', { id: device.id, name })} />
      {device.kind === 'switch' ? (
        <ChipPicker<SwitchRole>
          label="Carries"
          hint="A data switch carries storage fabrics, a management switch the out-of-band network; a shared switch carries both (the analysis warns)."
          chips={ROLE_CHIPS}
          value={device.role}
          disabled={readOnly}
          testID="inspector-switch-role"
          onChange={(role) => runEdit('setDevice', { id: device.id, role })}
        />
      ) : null}
      {device.kind === 'host' ? (
        <View style={styles.group}>
          <CommitField
            label="Initiator name (IQN)"
            hint="iqn.YYYY-MM.reversed-domain:unique-part, or eui. / naa. names (RFC 7143 §4.2.7). Leave empty if not known yet."
            value={device.iqn ?? ''}
            schema={iqnField}
            advise={iqnAdvice}
            note={device.iqn ? (iqnFinding ?? iqnAdvice(device.iqn)) : null}
            readOnly={readOnly}
            placeholder="iqn.2026-01.example.tidewater:host-name"
            testID="inspector-iqn"
            onCommit={(iqn) => runEdit('setDevice', { id: device.id, iqn })}
          />
          {!readOnly && !device.iqn && iqnNote ? <Button label={`Use ${iqnNote}`} variant="ghost" size="compact" onPress={() => runEdit('setDevice', { id: device.id, iqn: iqnNote })} testID="inspector-iqn-suggest" /> : null}
        </View>
      ) : null}
      {device.kind === 'array' ? (
        <View style={styles.group}>
          <CommitField
            label="Target name (IQN)"
            hint="The array's iSCSI target name, by the same rules as initiator names (RFC 7143 §4.2.7). A controller may carry its own instead."
            value={device.iqn ?? ''}
            schema={iqnField}
            advise={iqnAdvice}
            note={device.iqn ? (iqnFinding ?? iqnAdvice(device.iqn)) : null}
            readOnly={readOnly}
            placeholder="iqn.2026-01.example.tidewater:storage.array-name"
            testID="inspector-target-iqn"
            onCommit={(iqn) => runEdit('setDevice', { id: device.id, iqn })}
          />
          {!readOnly && !device.iqn && iqnNote ? <Button label={`Use ${iqnNote}`} variant="ghost" size="compact" onPress={() => runEdit('setDevice', { id: device.id, iqn: iqnNote })} testID="inspector-target-iqn-suggest" /> : null}
        </View>
      ) : null}
      <View style={styles.row}>
        <View style={styles.cell}>
          <CommitField label="Rack" value={rackName(doc, device)} schema={rackField} readOnly={readOnly} testID="inspector-rack" onCommit={(rack) => runEdit('setDevice', { id: device.id, rack })} />
        </View>
        <View style={styles.cell}>
          <CommitField label="Rack unit" value={device.placement ? String(device.placement.ru) : ''} schema={ruField} readOnly={readOnly} keyboardType="number-pad" testID="inspector-ru" onCommit={(ru) => runEdit('setDevice', { id: device.id, ru })} />
        </View>
      </View>
      {device.kind === 'host' ? <HostPaths hostId={device.id} doc={doc} /> : null}
      <PartList device={device} groups={groups} readOnly={readOnly} />
      <FindingsAbout ids={[device.id, ...groups.map((g) => g.id)]} testID="inspector-findings" />
      {!readOnly ? (
        <Button
          label={`Delete ${device.name || 'device'}`}
          variant="danger"
          size="compact"
          testID="inspector-delete"
          onPress={() => {
            runEdit('deleteDevices', { ids: [device.id] });
            editorStore.getState().clearSelection();
          }}
        />
      ) : null}
      <Text variant="caption" color="inkMuted">{`Id ${device.id}`}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  group: { gap: space.xs },
  row: { flexDirection: 'row', gap: space.md },
  cell: { flex: 1 },
});
