import { Pressable, StyleSheet, View } from 'react-native';
import { Text, colors, radius, space, TAP_TARGET } from '@/components/ui';

export type Chip<T extends string | number> = { value: T; label: string };

type ChipPickerProps<T extends string | number> = {
  label: string;
  chips: readonly Chip<T>[];
  value: T | null;
  onChange: (value: T) => void;
  disabled?: boolean;
  testID?: string;
  hint?: string;
  /** The label is still spoken, but not shown (a table's column heading says it already). */
  hideLabel?: boolean;
};

/**
 * A compact single choice (a radio group) for the inspector's narrow column: chips that wrap,
 * each at least 44 px tall; the chosen one is filled and underlined, not only tinted.
 */
export function ChipPicker<T extends string | number>({ label, chips, value, onChange, disabled, testID, hint, hideLabel }: ChipPickerProps<T>) {
  return (
    <View style={styles.wrap}>
      {hideLabel ? null : <Text variant="label">{label}</Text>}
      {hint ? (
        <Text variant="small" color="inkMuted">
          {hint}
        </Text>
      ) : null}
      <View role="radiogroup" aria-label={label} style={styles.row} testID={testID}>
        {chips.map((chip) => {
          const selected = chip.value === value;
          return (
            <Pressable
              key={String(chip.value)}
              role="radio"
              aria-checked={selected}
              accessibilityState={{ checked: selected, disabled }}
              aria-label={chip.label}
              disabled={disabled}
              onPress={() => !selected && onChange(chip.value)}
              testID={testID ? `${testID}-${chip.value}` : undefined}
              style={({ pressed }) => [styles.chip, selected && styles.selected, pressed && !selected && styles.pressed, disabled && !selected && styles.disabled]}
            >
              <Text variant="smallStrong" color={selected ? 'onPrimary' : 'primary'} style={selected ? styles.underline : undefined}>
                {chip.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, alignSelf: 'stretch' },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, marginTop: space.xs },
  chip: {
    minHeight: TAP_TARGET,
    minWidth: TAP_TARGET,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  selected: { backgroundColor: colors.primary, borderColor: colors.primary },
  pressed: { backgroundColor: colors.surfaceSunken },
  disabled: { opacity: 0.5 },
  underline: { textDecorationLine: 'underline' },
});
