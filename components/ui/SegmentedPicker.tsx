import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/Text';
import { Icon } from '@/components/ui/icons';
import { colors, radius, space, TAP_TARGET } from '@/components/ui/tokens';

export type PickerOption<T extends string> = { value: T; label: string };

type SegmentedPickerProps<T extends string> = {
  label: string;
  options: readonly PickerOption<T>[];
  value: T | null;
  onChange: (value: T) => void;
  error?: string | null;
  disabled?: boolean;
  testID?: string;
};

/** A choice among a few options, all visible at once (a radio group for assistive technology). */
export function SegmentedPicker<T extends string>({ label, options, value, onChange, error, disabled, testID }: SegmentedPickerProps<T>) {
  return (
    <View style={styles.wrap}>
      <Text variant="label">{label}</Text>
      <View role="radiogroup" aria-label={label} style={styles.row} testID={testID}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              role="radio"
              accessibilityRole="radio"
              aria-checked={selected}
              accessibilityState={{ checked: selected, disabled }}
              aria-label={option.label}
              disabled={disabled}
              testID={testID ? `${testID}-${option.value}` : undefined}
              onPress={() => onChange(option.value)}
              style={({ pressed }) => [styles.option, selected && styles.selected, pressed && !selected && styles.pressed]}
            >
              {selected ? <Icon name="success" size={16} color="onPrimary" /> : null}
              <Text variant="smallStrong" color={selected ? 'onPrimary' : 'primary'} style={styles.label}>
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <View style={styles.error}>
          <Icon name="error" size={18} color="dangerText" />
          <Text variant="small" color="dangerText" role="alert">
            {error}
          </Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm, alignSelf: 'stretch' },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  option: {
    minHeight: TAP_TARGET,
    paddingHorizontal: space.md,
    // A long label wraps onto two lines without touching the border.
    paddingVertical: space.xs,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.xs,
    // Two per row on a phone, all four in one row on wider screens: no orphan on a line of its own.
    flexGrow: 1,
    flexBasis: 120,
    maxWidth: 200,
  },
  label: { textAlign: 'center', flexShrink: 1 },
  selected: { backgroundColor: colors.primary, borderColor: colors.primary },
  pressed: { backgroundColor: colors.surfaceSunken },
  error: { flexDirection: 'row', gap: space.xs, alignItems: 'flex-start' },
});
