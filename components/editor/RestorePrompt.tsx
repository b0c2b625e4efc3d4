import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import type { WorkingCopy } from '@/lib/editor/working-copy';
import { formatDateTime } from '@/lib/format';
import { Overlay } from '@/components/editor/Overlay';

type Props = { copy: WorkingCopy; latest: number | null; wide: boolean; onRestore: () => void; onDiscard: () => void };

/** Unsaved work of this design was kept in this browser: carry on with it, or start from the saved version. */
export function RestorePrompt({ copy, latest, wide, onRestore, onDiscard }: Props) {
  const from = copy.baseVersion === null ? 'a design without versions' : `version ${copy.baseVersion}`;
  const newer = latest !== null && copy.baseVersion !== latest;
  return (
    <Overlay title="Unsaved work found" onClose={onRestore} wide={wide} testID="restore-prompt">
      <Text>{`This browser kept work on this design from ${formatDateTime(copy.savedAt)}, started from ${from}, that was never saved as a version.`}</Text>
      {newer ? <Text variant="small" color="warningText">{`Version ${latest} has been saved since. If you restore, saving will show you what differs first.`}</Text> : null}
      <View style={styles.actions}>
        <Button label="Restore my work" onPress={onRestore} testID="restore-accept" />
        <Button label={latest === null ? 'Discard it and start empty' : `Discard it and open version ${latest}`} variant="secondary" onPress={onDiscard} testID="restore-discard" />
      </View>
    </Overlay>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' } });
