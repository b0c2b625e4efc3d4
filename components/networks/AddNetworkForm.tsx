import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Card, Text, TextField, space } from '@/components/ui';
import type { NetworkPurpose } from '@/shared/topology/schema';
import { cidrField, ipField, mtuField, nameField, parseField, vlanField } from '@/lib/editor/fields';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { runEdit } from '@/components/inspector/run';
import { PURPOSE_CHIPS } from '@/components/networks/NetworkCard';

type Values = { name: string; cidr: string; vlan: string; mtu: string; gateway: string };
const EMPTY: Values = { name: '', cidr: '', vlan: '', mtu: '', gateway: '' };

/** A new network: every field checked on submit, errors under their fields. */
export function AddNetworkForm() {
  const [values, setValues] = useState<Values>(EMPTY);
  const [purpose, setPurpose] = useState<NetworkPurpose>('data');
  const [errors, setErrors] = useState<Partial<Record<keyof Values, string>>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const set = (key: keyof Values) => (text: string) => {
    setValues({ ...values, [key]: text });
    setErrors({ ...errors, [key]: undefined });
  };

  const submit = () => {
    const name = parseField(nameField, values.name);
    const cidr = parseField(cidrField, values.cidr);
    const vlan = parseField(vlanField, values.vlan);
    const mtu = parseField(mtuField, values.mtu);
    const gateway = parseField(ipField, values.gateway);
    const next: typeof errors = {};
    if (!name.ok) next.name = name.message;
    if (!cidr.ok) next.cidr = cidr.message;
    if (!vlan.ok) next.vlan = vlan.message;
    if (!mtu.ok) next.mtu = mtu.message;
    if (!gateway.ok) next.gateway = gateway.message;
    setErrors(next);
    if (!name.ok || !cidr.ok || !vlan.ok || !mtu.ok || !gateway.ok) return;
    const refusal = runEdit('addNetwork', {
      name: name.value,
      purpose,
      cidr: cidr.value,
      vlan: vlan.value ?? undefined,
      mtu: mtu.value ?? undefined,
      gateway: gateway.value ?? undefined,
    });
    setFailure(refusal);
    if (!refusal) setValues(EMPTY);
  };

  return (
    <Card testID="add-network">
      <Text variant="heading">Add a network</Text>
      <Text variant="small" color="inkMuted">One subnet per storage fabric, and a separate one for management (common practice). Use your own blocks; the examples are documentation ranges (RFC 5737).</Text>
      <View style={styles.grid}>
        <View style={styles.cell}>
          <TextField label="Name" value={values.name} onChangeText={set('name')} error={errors.name} placeholder="fabric C" testID="add-network-name" />
        </View>
        <View style={styles.cell}>
          <TextField label="Block (CIDR)" value={values.cidr} onChangeText={set('cidr')} error={errors.cidr} placeholder="198.51.100.0/24" autoCapitalize="none" testID="add-network-cidr" />
        </View>
        <View style={styles.cell}>
          <TextField label="VLAN ID" value={values.vlan} onChangeText={set('vlan')} error={errors.vlan} keyboardType="number-pad" placeholder="110" testID="add-network-vlan" />
        </View>
        <View style={styles.cell}>
          <TextField label="MTU (bytes)" value={values.mtu} onChangeText={set('mtu')} error={errors.mtu} keyboardType="number-pad" placeholder="9000" testID="add-network-mtu" />
        </View>
        <View style={styles.cell}>
          <TextField label="Gateway (optional)" value={values.gateway} onChangeText={set('gateway')} error={errors.gateway} autoCapitalize="none" testID="add-network-gateway" />
        </View>
      </View>
      <ChipPicker<NetworkPurpose> label="Purpose" chips={PURPOSE_CHIPS} value={purpose} onChange={setPurpose} testID="add-network-purpose" />
      {failure ? <Banner tone="error">{failure}</Banner> : null}
      <Button label="Add network" onPress={submit} testID="add-network-submit" />
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 200 },
});
