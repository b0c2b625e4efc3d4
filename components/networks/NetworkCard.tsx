import { StyleSheet, View } from 'react-native';
import { Button, Card, Text, space } from '@/components/ui';
import { NETWORK_PURPOSES, type Network, type NetworkPurpose } from '@/shared/topology/schema';
import { cidrField, ipField, mtuField, nameField, vlanField } from '@/lib/editor/fields';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { CommitField } from '@/components/inspector/CommitField';
import { FindingsAbout } from '@/components/inspector/FindingsAbout';
import { runEdit } from '@/components/inspector/run';
import { useStore } from 'zustand';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { useEditorDoc } from '@/lib/editor/hooks';
import type { Finding } from '@/shared/analysis/types';

export const PURPOSE_CHIPS = NETWORK_PURPOSES.map((p) => ({ value: p, label: p === 'data' ? 'Storage data' : 'Management' }));

/**
 * The finding of one rule about this network's own value, to show under the field it is about. A
 * finding that also names a port is about that port's address (it is listed with the network's
 * findings below), except a duplicate, which names the network only when its gateway is the other holder.
 */
function useNote(networkId: string, rules: string[]): string | null {
  const findings = useStore(liveAnalysisStore, (s) => s.marks.findingsBySubject.get(networkId));
  const networks = useEditorDoc().networks;
  const aboutNetworksOnly = (f: Finding) => f.subjects.every((id) => networks.some((n) => n.id === id));
  return findings?.find((f) => rules.includes(f.rule) && (f.rule === 'address-duplicate' || aboutNetworksOnly(f)))?.message ?? null;
}

type Props = { network: Network; ports: number; readOnly: boolean };

/** One network's fields, each committed on its own; range problems come back from the analysis under the field. */
export function NetworkCard({ network, ports, readOnly }: Props) {
  const update = (args: Omit<Parameters<typeof runEdit<'updateNetwork'>>[1], 'id'>) => runEdit('updateNetwork', { id: network.id, ...args });
  const id = `network-${network.id}`;
  const blockNote = useNote(network.id, ['network-overlap', 'management-data-same-subnet']);
  const vlanNote = useNote(network.id, ['vlan-out-of-range']);
  const mtuNote = useNote(network.id, ['mtu-out-of-range', 'mtu-mismatch']);
  const gatewayNote = useNote(network.id, ['address-outside-network', 'address-reserved', 'address-duplicate']);
  return (
    <Card testID={id}>
      <View style={styles.head}>
        <Text variant="heading" style={styles.title}>
          {network.name || network.id}
        </Text>
        <Text variant="small" color="inkMuted">{`${ports} port${ports === 1 ? '' : 's'}`}</Text>
      </View>
      <View style={styles.grid}>
        <View style={styles.cell}>
          <CommitField label="Name" value={network.name} schema={nameField} readOnly={readOnly} testID={`${id}-name`} onCommit={(name) => update({ name })} />
        </View>
        <View style={styles.cell}>
          <CommitField
            label="Block (CIDR)"
            value={network.cidr}
            schema={cidrField}
            readOnly={readOnly}
            testID={`${id}-cidr`}
            note={blockNote}
            onCommit={(cidr) => update({ cidr, readdress: true })}
          />
        </View>
        <View style={styles.cell}>
          <CommitField label="VLAN ID" hint="1–4094 (IEEE 802.1Q)" value={network.vlan === undefined ? '' : String(network.vlan)} schema={vlanField} readOnly={readOnly} keyboardType="number-pad" testID={`${id}-vlan`} note={vlanNote} onCommit={(vlan) => update({ vlan })} />
        </View>
        <View style={styles.cell}>
          <CommitField label="MTU (bytes)" hint="1500 standard, 9000 jumbo" value={network.mtu === undefined ? '' : String(network.mtu)} schema={mtuField} readOnly={readOnly} keyboardType="number-pad" testID={`${id}-mtu`} note={mtuNote} onCommit={(mtu) => update({ mtu })} />
        </View>
        <View style={styles.cell}>
          <CommitField label="Gateway" hint="Optional; storage traffic is normally not routed." value={network.gateway ?? ''} schema={ipField} readOnly={readOnly} testID={`${id}-gateway`} note={gatewayNote} onCommit={(gateway) => update({ gateway })} />
        </View>
      </View>
      <ChipPicker<NetworkPurpose> label="Purpose" chips={PURPOSE_CHIPS} value={network.purpose} disabled={readOnly} testID={`${id}-purpose`} onChange={(purpose) => update({ purpose })} />
      <FindingsAbout ids={[network.id]} title="Findings about this network" />
      {!readOnly ? (
        <View style={styles.actions}>
          <Button label="Assign free addresses" variant="secondary" size="compact" onPress={() => runEdit('autoAssignAddresses', { networkIds: [network.id] })} testID={`${id}-assign`} />
          <Button label="Remove network" variant="danger" size="compact" onPress={() => runEdit('removeNetwork', { id: network.id })} testID={`${id}-remove`} />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'baseline', gap: space.md },
  title: { flex: 1 },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 220 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
