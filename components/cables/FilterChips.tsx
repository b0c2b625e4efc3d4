import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { Text, colors, radius, space, TAP_TARGET } from '@/components/ui';

export type FilterChoice<T extends string> = { value: T; label: string };

type FilterChipsProps<T extends string> = {
  label: string;
  choices: readonly FilterChoice<T>[];
  value: T | null;
  onChange: (value: T | null) => void;
  testID: string;
};

/**
 * One filter of the schedule table: "All" and a chip per value, in a row that scrolls sideways when a
 * large design has many racks. Chips are 44 px tall; the chosen one is filled and underlined.
 */
export function FilterChips<T extends string>({ label, choices, value, onChange, testID }: FilterChipsProps<T>) {
  const all: FilterChoice<T | ''> = { value: '', label: 'All' };
  return (
    <View style={styles.wrap}>
      <Text variant="smallStrong" color="inkMuted" style={styles.label}>
        {label}
      </Text>
      <ScrollView horizontal showsHorizontalScrollIndicator contentContainerStyle={styles.row}>
        <View role="radiogroup" aria-label={label} style={styles.row} testID={testID}>
          {[all, ...choices].map((choice) => {
            const selected = choice.value === '' ? value === null : choice.value === value;
            return (
              <Pressable
                key={choice.value}
                role="radio"
                aria-checked={selected}
                accessibilityState={{ checked: selected }}
                aria-label={`${label}: ${choice.label}`}
                onPress={() => onChange(choice.value === '' ? null : (choice.value as T))}
                testID={`${testID}-${choice.value === '' ? 'all' : choice.value}`}
                style={({ pressed }) => [styles.chip, selected && styles.selected, pressed && !selected && styles.pressed]}
              >
                <Text variant="smallStrong" color={selected ? 'onPrimary' : 'primary'} style={selected ? styles.underline : undefined}>
                  {choice.label}
                </Text>
              </Pressable>
            );
          })}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { width: 72 },
  row: { flexDirection: 'row', gap: space.xs },
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
  underline: { textDecorationLine: 'underline' },
});
