import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Text, space } from '@/components/ui';
import type { Port, Topology } from '@/shared/topology/schema';
import { planAddresses, runCommand } from '@/lib/editor/commands';
import { ipField } from '@/lib/editor/fields';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { addressFindings } from '@/lib/editor/marks';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { CommitField } from '@/components/inspector/CommitField';
import { runEdit } from '@/components/inspector/run';

type Mode = 'none' | 'static' | 'dhcp';
const MODE_CHIPS: { value: Mode; label: string }[] = [
  { value: 'none', label: 'None yet' },
  { value: 'static', label: 'Static' },
  { value: 'dhcp', label: 'DHCP' },
];

/** A host or controller port's network and address; conflicts come from the live analysis. */
export function PortAddressFields({ port, doc, readOnly, compact = false }: { port: Port; doc: Topology; readOnly: boolean; compact?: boolean }) {
  const marks = useStore(liveAnalysisStore, (s) => s.marks);
  const problems = addressFindings(marks, port.id);
  const [typing, setTyping] = useState(false);
  const mode: Mode = port.address?.mode ?? (typing ? 'static' : 'none');
  const networkChips = [{ value: '', label: 'No network' }, ...doc.networks.map((n) => ({ value: n.id, label: n.name || n.id }))];
  const network = doc.networks.find((n) => n.id === port.networkId);
  return (
    <View style={styles.wrap}>
      <ChipPicker
        label="Network"
        chips={networkChips}
        value={port.networkId ?? ''}
        disabled={readOnly}
        testID={`port-network-${port.id}`}
        hint={doc.networks.length === 0 && !compact ? 'Add networks under Networks & addresses.' : undefined}
        onChange={(id) => runEdit('setPort', { id: port.id, networkId: id === '' ? null : id })}
      />
      <ChipPicker
        label="Address"
        chips={MODE_CHIPS}
        value={mode}
        disabled={readOnly}
        testID={`port-address-mode-${port.id}`}
        onChange={(next) => {
          setTyping(false);
          if (next !== 'static') return runEdit('setPort', { id: port.id, address: next === 'none' ? null : { mode: 'dhcp' } });
          const ip = nextFree(doc, port.id);
          if (ip) return runEdit('setPort', { id: port.id, address: { mode: 'static', ip } });
          setTyping(true);
          return null;
        }}
      />
      {port.address?.mode === 'static' || typing ? (
        <CommitField
          label="Static address"
          hint={network ? `In ${network.name || network.id} (${network.cidr}).` : undefined}
          value={port.address?.mode === 'static' ? port.address.ip : ''}
          schema={ipField}
          readOnly={readOnly}
          testID={`port-ip-${port.id}`}
          note={problems.find((f) => f.rule !== 'port-unaddressed')?.message ?? null}
          onCommit={(ip) => runEdit('setPort', { id: port.id, address: ip === null ? null : { mode: 'static', ip } })}
        />
      ) : problems.length > 0 ? (
        <Text variant="small" color="warningText">
          {problems[0].message}
        </Text>
      ) : null}
    </View>
  );
}

/** The address auto-assign would give this port now (lowest free in its network), or null without a network. */
function nextFree(doc: Topology, portId: string): string | null {
  const bare = runCommand(doc, 'setPort', { id: portId, address: null });
  return planAddresses(bare, { portIds: [portId] }).get(portId) ?? null;
}

const styles = StyleSheet.create({ wrap: { gap: space.md } });
