import { StyleSheet, View } from 'react-native';
import { Button, Text, colors, radius, space } from '@/components/ui';

type ConfirmInlineProps = {
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
  testID?: string;
};

/** A second, explicit step for actions that cannot be undone, shown in place (works alike on every screen size). */
export function ConfirmInline({ question, confirmLabel, onConfirm, onCancel, busy, testID }: ConfirmInlineProps) {
  return (
    <View style={styles.box} testID={testID} role="alert">
      <Text variant="smallStrong" color="dangerText">
        {question}
      </Text>
      <View style={styles.actions}>
        <Button label={confirmLabel} variant="danger" size="compact" loading={busy} onPress={onConfirm} testID={testID ? `${testID}-yes` : undefined} />
        <Button label="Cancel" variant="ghost" size="compact" onPress={onCancel} testID={testID ? `${testID}-no` : undefined} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.dangerSoft },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
