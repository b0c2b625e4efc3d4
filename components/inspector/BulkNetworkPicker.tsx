import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text, space } from '@/components/ui';
import type { Topology } from '@/shared/topology/schema';
import { portsInScope, type PortScope } from '@/lib/editor/commands';
import { plural } from '@/lib/designs/summary';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { runEdit } from '@/components/inspector/run';

type Props = { doc: Topology; scopes: { label: string; scope: PortScope }[]; testID: string };

/**
 * Puts every data port of a scope (a switch's neighbours, its fabric, a selection) on a network and
 * addresses them in one undoable step: targets low, hosts high. Management ports are left alone.
 */
export function BulkNetworkPicker({ doc, scopes, testID }: Props) {
  const [which, setWhich] = useState(0);
  const [done, setDone] = useState<string | null>(null);
  if (doc.networks.length === 0 || scopes.length === 0) return null;
  const scope = scopes[Math.min(which, scopes.length - 1)].scope;
  let count = 0;
  try {
    count = portsInScope(doc, scope).length;
  } catch {
    count = 0;
  }
  if (count === 0 && scopes.length === 1) return null;
  return (
    <View style={styles.wrap} testID={testID}>
      <Text variant="label">Put data ports on a network</Text>
      {scopes.length > 1 ? (
        <ChipPicker<number>
          label="Which ports"
          hideLabel
          chips={scopes.map((s, i) => ({ value: i, label: s.label }))}
          value={which}
          onChange={setWhich}
          testID={`${testID}-scope`}
        />
      ) : null}
      <Text variant="small" color="inkMuted">{`${plural(count, 'data port')}; each gets an address too (targets low, hosts high). One undo puts it all back.`}</Text>
      {count > 0 ? (
        <ChipPicker<string>
          label="Network"
          hideLabel
          chips={doc.networks.map((n) => ({ value: n.id, label: n.name || n.id }))}
          value={null}
          testID={`${testID}-network`}
          onChange={(networkId) => {
            const refusal = runEdit('bulkAssignNetwork', { scope, networkId });
            setDone(refusal ?? `${plural(count, 'data port')} put on ${doc.networks.find((n) => n.id === networkId)?.name ?? networkId}.`);
          }}
        />
      ) : null}
      {done ? (
        <Text variant="small" testID={`${testID}-done`}>
          {done}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.xs } });
