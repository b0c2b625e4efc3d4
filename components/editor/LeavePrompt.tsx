import { StyleSheet, View } from 'react-native';
import { Button, Text, space } from '@/components/ui';
import { Overlay } from '@/components/editor/Overlay';

type Props = { wide: boolean; onStay: () => void; onLeave: () => void; onSave: () => void };

/** Asked before an in-app link takes the designer away from unsaved changes. */
export function LeavePrompt({ wide, onStay, onLeave, onSave }: Props) {
  return (
    <Overlay title="Leave with unsaved changes?" onClose={onStay} wide={wide} testID="leave-prompt">
      <Text>Your changes are not saved as a version yet. They stay in this browser as a working copy, and you can restore them when you come back — but nobody else sees them.</Text>
      <View style={styles.actions}>
        <Button label="Save version first" onPress={onSave} testID="leave-save" />
        <Button label="Leave anyway" variant="secondary" onPress={onLeave} testID="leave-confirm" />
        <Button label="Stay" variant="ghost" onPress={onStay} testID="leave-stay" />
      </View>
    </Overlay>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' } });
