import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import { MEDIA, type Cable, type Media, type Topology } from '@/shared/topology/schema';
import { suggestMedia } from '@/lib/editor/commands';
import { describeId, portLabel } from '@/lib/editor/describe';
import { MEDIA_LABELS } from '@/lib/editor/drawing';
import { labelField, lengthField } from '@/lib/editor/fields';
import { editorStore } from '@/lib/editor/store';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { CommitField } from '@/components/inspector/CommitField';
import { FindingsAbout } from '@/components/inspector/FindingsAbout';
import { runEdit } from '@/components/inspector/run';

export const MEDIA_CHIPS = MEDIA.map((m) => ({ value: m, label: MEDIA_LABELS[m] }));

/** The media this cable's two ports suggest for its length (the same rule the chooser uses). */
export function suggestedFor(doc: Topology, cable: Pick<Cable, 'a' | 'b' | 'lengthM'>): Media | null {
  const a = describeId(doc, cable.a);
  const b = describeId(doc, cable.b);
  return a?.kind === 'port' && b?.kind === 'port' ? suggestMedia(a.port, b.port, cable.lengthM) : null;
}

type Props = { cable: Cable; doc: Topology; readOnly: boolean };

/** One cable: its printed label, media and length, its two ends, and what the analysis says of it. */
export function CableInspector({ cable, doc, readOnly }: Props) {
  const suggestion = suggestedFor(doc, cable);
  return (
    <View style={styles.wrap} testID="inspector-cable">
      <View style={styles.ends}>
        <Text variant="label">Ends</Text>
        {[cable.a, cable.b].map((end) => (
          <Button key={end} label={portLabel(doc, end)} variant="ghost" size="compact" onPress={() => editorStore.getState().select([end])} />
        ))}
      </View>
      <CommitField label="Label" hint="Printed on the cable and in the cable schedule." value={cable.label ?? ''} schema={labelField} readOnly={readOnly} testID="inspector-cable-label" onCommit={(label) => runEdit('setCable', { id: cable.id, label })} />
      <ChipPicker<Media>
        label="Media"
        hint={suggestion && suggestion !== cable.media ? `Suggested for these ports and this length: ${MEDIA_LABELS[suggestion]}.` : undefined}
        chips={MEDIA_CHIPS}
        value={cable.media}
        disabled={readOnly}
        testID="inspector-cable-media"
        onChange={(media) => runEdit('setCable', { id: cable.id, media })}
      />
      <CommitField label="Length (m)" value={cable.lengthM === undefined ? '' : String(cable.lengthM)} schema={lengthField} readOnly={readOnly} keyboardType="decimal-pad" testID="inspector-cable-length" onCommit={(lengthM) => runEdit('setCable', { id: cable.id, lengthM })} />
      <FindingsAbout ids={[cable.id]} />
      {!readOnly ? (
        <Button
          label="Remove this cable"
          variant="danger"
          size="compact"
          testID="inspector-delete"
          onPress={() => {
            runEdit('uncable', { ids: [cable.id] });
            editorStore.getState().clearSelection();
          }}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg }, ends: { gap: space.xs } });
