import { useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Banner, Button, Heading, Text, colors, space } from '@/components/ui';
import { planAddresses } from '@/lib/editor/commands';
import { useEditorDoc, useReadOnly } from '@/lib/editor/hooks';
import { iteratePorts } from '@/shared/topology/index';
import { runEdit } from '@/components/inspector/run';
import { AddNetworkForm } from '@/components/networks/AddNetworkForm';
import { AddressTable } from '@/components/networks/AddressTable';
import { NetworkCard } from '@/components/networks/NetworkCard';

/**
 * Networks & addresses: the design's networks with their fields, automatic static addressing
 * (the lowest free host addresses, skipping network, broadcast and gateway addresses), and the
 * address table with the analysis's conflicts.
 */
export function NetworksScreen({ wide }: { wide: boolean }) {
  const doc = useEditorDoc();
  const readOnly = useReadOnly();
  const [notice, setNotice] = useState<string | null>(null);
  const counts = new Map<string, number>();
  let unassignedManagement = 0;
  for (const ref of iteratePorts(doc)) {
    if (ref.port.networkId) counts.set(ref.port.networkId, (counts.get(ref.port.networkId) ?? 0) + 1);
    else if (ref.device.kind !== 'switch' && ref.port.role === 'management') unassignedManagement += 1;
  }
  const managementNets = doc.networks.filter((n) => n.purpose === 'management');
  const waiting = planAddresses(doc).size;

  const assignAll = () => {
    const refusal = runEdit('autoAssignAddresses', {});
    setNotice(refusal ?? `${waiting} port${waiting === 1 ? '' : 's'} got a static address.`);
  };
  const managementToNetwork = () => {
    const target = managementNets[0];
    const portIds = [...iteratePorts(doc)].filter((ref) => ref.device.kind !== 'switch' && ref.port.role === 'management' && !ref.port.networkId).map((ref) => ref.port.id);
    const refusal = runEdit('assignNetwork', { portIds, networkId: target.id });
    setNotice(refusal ?? `${portIds.length} management port${portIds.length === 1 ? '' : 's'} put on ${target.name}.`);
  };

  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.body} testID="networks-screen" keyboardShouldPersistTaps="handled">
      <View style={[styles.column, { maxWidth: wide ? 1200 : undefined }]}>
        <Heading level={1}>Networks & addresses</Heading>
        <Text color="inkMuted">Each storage fabric on its own subnet, management apart. Ports join a network in the table below or in the inspector; switches carry every network and have no addresses.</Text>
        {!readOnly ? (
          <View style={styles.actions}>
            <Button label={`Assign addresses to ${waiting} waiting port${waiting === 1 ? '' : 's'}`} onPress={assignAll} disabled={waiting === 0} testID="networks-assign-all" />
            {managementNets.length === 1 && unassignedManagement > 0 ? (
              <Button label={`Put ${unassignedManagement} management ports on ${managementNets[0].name}`} variant="secondary" onPress={managementToNetwork} testID="networks-management" />
            ) : null}
          </View>
        ) : null}
        {notice ? <Banner tone="success">{notice}</Banner> : null}
        {doc.networks.length === 0 ? <Text>No networks yet. Add one per storage fabric and one for management.</Text> : null}
        {doc.networks.map((network) => (
          <NetworkCard key={network.id} network={network} ports={counts.get(network.id) ?? 0} readOnly={readOnly} />
        ))}
        {!readOnly ? <AddNetworkForm /> : null}
        <AddressTable doc={doc} readOnly={readOnly} wide={wide} />
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  body: { padding: space.lg, paddingBottom: space.xxxl },
  column: { width: '100%', alignSelf: 'center', gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
