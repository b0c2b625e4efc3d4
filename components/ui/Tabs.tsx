import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/Text';
import { colors, space, TAP_TARGET } from '@/components/ui/tokens';

export type TabOption<T extends string> = { value: T; label: string; count?: number };

type TabsProps<T extends string> = {
  label: string;
  tabs: readonly TabOption<T>[];
  value: T;
  onChange: (value: T) => void;
  testID?: string;
};

/** Sections of one screen; the chosen one is underlined and bold, and announced as selected. */
export function Tabs<T extends string>({ label, tabs, value, onChange, testID }: TabsProps<T>) {
  return (
    <View role="tablist" aria-label={label} style={styles.row} testID={testID}>
      {tabs.map((tab) => {
        const selected = tab.value === value;
        const text = tab.count === undefined ? tab.label : `${tab.label} (${tab.count})`;
        return (
          <Pressable
            key={tab.value}
            role="tab"
            accessibilityRole="tab"
            aria-selected={selected}
            accessibilityState={{ selected }}
            aria-label={text}
            onPress={() => onChange(tab.value)}
            testID={testID ? `${testID}-${tab.value}` : undefined}
            style={({ pressed }) => [styles.tab, selected && styles.selected, pressed && styles.pressed]}
          >
            <Text variant={selected ? 'label' : 'body'} color={selected ? 'primary' : 'inkMuted'}>
              {text}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', borderBottomWidth: 1, borderBottomColor: colors.line, gap: space.xs },
  tab: {
    minHeight: TAP_TARGET,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderBottomWidth: 3,
    borderBottomColor: 'transparent',
    marginBottom: -1,
  },
  selected: { borderBottomColor: colors.primary },
  pressed: { backgroundColor: colors.surfaceSunken },
});
