import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icons';
import { Text } from '@/components/ui/Text';
import { colors, radius, space, TAP_TARGET } from '@/components/ui/tokens';

type CheckboxProps = { label: string; checked: boolean; onChange: (checked: boolean) => void; disabled?: boolean; testID?: string };

/** A labelled tick box; the tick mark, not only the fill, shows that it is on. */
export function Checkbox({ label, checked, onChange, disabled, testID }: CheckboxProps) {
  return (
    <Pressable
      role="checkbox"
      accessibilityRole="checkbox"
      aria-checked={checked}
      accessibilityState={{ checked, disabled }}
      aria-label={label}
      disabled={disabled}
      onPress={() => onChange(!checked)}
      testID={testID}
      style={({ pressed }) => [styles.row, pressed && styles.pressed, disabled && styles.disabled]}
    >
      <View style={[styles.box, checked && styles.boxOn]}>{checked ? <Icon name="tick" size={16} color="onPrimary" /> : null}</View>
      <Text variant="small">{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: TAP_TARGET, flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.xs, borderRadius: radius.sm, alignSelf: 'flex-start' },
  pressed: { backgroundColor: colors.surfaceSunken },
  disabled: { opacity: 0.6 },
  box: { width: 22, height: 22, borderRadius: radius.sm, borderWidth: 2, borderColor: colors.lineStrong, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.surface },
  boxOn: { backgroundColor: colors.primary, borderColor: colors.primary },
});
