import { StyleSheet, View } from 'react-native';
import { Text, space } from '@/components/ui';
import type { ChapMode, Topology } from '@/shared/topology/schema';
import { LIMITS } from '@/shared/rules/limits';
import { nameField } from '@/lib/editor/fields';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { CommitField } from '@/components/inspector/CommitField';
import { FindingsAbout } from '@/components/inspector/FindingsAbout';
import { runEdit } from '@/components/inspector/run';

const CHAP_CHIPS: { value: ChapMode; label: string }[] = [
  { value: 'none', label: 'Off' },
  { value: 'one-way', label: 'One-way' },
  { value: 'mutual', label: 'Mutual' },
];

/** Nothing selected: the design itself — its name, CHAP mode and counts. */
export function DesignInspector({ doc, readOnly }: { doc: Topology; readOnly: boolean }) {
  const chap = doc.security?.chap ?? 'none';
  const min = LIMITS.chapSecretMinBytes.value;
  const generate = LIMITS.chapSecretGenerateBytes.value;
  return (
    <View style={styles.wrap} testID="inspector-design">
      <Text variant="small" color="inkMuted">
        {readOnly ? 'You can look at this design but not change it.' : 'Tap a device, card, port or cable on the canvas to edit it; tap a port, then another, to cable them.'}
      </Text>
      <CommitField label="Design name" value={doc.name} schema={nameField} readOnly={readOnly} testID="inspector-design-name" onCommit={(name) => runEdit('renameDesign', { name })} />
      <ChipPicker<ChapMode> label="CHAP authentication" chips={CHAP_CHIPS} value={chap} disabled={readOnly} testID="inspector-chap" onChange={(mode) => runEdit('setChap', { chap: mode })} />
      <Text variant="small" color="inkMuted" testID="inspector-chap-note">
        {`The design records the CHAP mode only, never a secret. Set the secrets on each initiator and target: at least ${min} bytes (RFC 7143 §9.2.1 — a shorter secret must be protected by IPsec), ideally ${generate} random bytes; one secret per initiator, and for mutual CHAP a second, different secret for the target.`}
      </Text>
      <Text variant="small">{`${doc.devices.length} devices, ${doc.cables.length} cables, ${doc.networks.length} networks.`}</Text>
      <FindingsAbout ids={[]} designWide title="Design-wide findings" />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg } });
