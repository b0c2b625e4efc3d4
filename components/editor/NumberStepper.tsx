import { StyleSheet, TextInput, View } from 'react-native';
import { Text, colors, radius, space, TAP_TARGET, type as typeScale } from '@/components/ui';
import { IconButton } from '@/components/editor/IconButton';

type NumberStepperProps = { label: string; value: number; min: number; max: number; onChange: (value: number) => void; testID: string };

/** A whole number with − and + buttons and a field to type it; always kept within min–max. */
export function NumberStepper({ label, value, min, max, onChange, testID }: NumberStepperProps) {
  const clamp = (n: number) => Math.min(max, Math.max(min, n));
  return (
    <View style={styles.row}>
      <Text variant="small" style={styles.label}>
        {label}
      </Text>
      <IconButton icon="minus" label={`Fewer: ${label}`} onPress={() => onChange(clamp(value - 1))} disabled={value <= min} testID={`${testID}-minus`} />
      <TextInput
        value={String(value)}
        aria-label={label}
        accessibilityLabel={label}
        keyboardType="number-pad"
        testID={`${testID}-value`}
        style={styles.input}
        onChangeText={(text) => {
          const n = Number.parseInt(text.replace(/\D/g, ''), 10);
          if (Number.isFinite(n)) onChange(clamp(n));
        }}
      />
      <IconButton icon="plus" label={`More: ${label}`} onPress={() => onChange(clamp(value + 1))} disabled={value >= max} testID={`${testID}-plus`} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  label: { flex: 1 },
  input: {
    ...typeScale.body,
    color: colors.ink,
    width: 52,
    minHeight: TAP_TARGET,
    textAlign: 'center',
    borderWidth: 1,
    borderColor: colors.lineStrong,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
});
