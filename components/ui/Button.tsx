import type { ReactNode } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, View, type PressableProps, type StyleProp, type ViewStyle } from 'react-native';
import { usePressFeedback } from '@/lib/use-press-feedback';
import { Text } from '@/components/ui/Text';
import { colors, radius, space, TAP_TARGET, type ColorName } from '@/components/ui/tokens';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';

type ButtonProps = Omit<PressableProps, 'children' | 'style'> & {
  label: string;
  variant?: ButtonVariant;
  loading?: boolean;
  /** Shown while loading, so the button says what is happening ("Signing in…"). */
  loadingLabel?: string;
  icon?: ReactNode;
  fullWidth?: boolean;
  size?: 'regular' | 'compact';
  /** Set by `<Link asChild>` when the button navigates; merged under the button's own look. */
  style?: StyleProp<ViewStyle>;
};

const looks: Record<ButtonVariant, { bg: ColorName | null; pressed: ColorName | null; text: ColorName; border: ColorName | null }> = {
  primary: { bg: 'primary', pressed: 'primaryPressed', text: 'onPrimary', border: null },
  secondary: { bg: 'surface', pressed: 'surfaceSunken', text: 'primary', border: 'lineStrong' },
  danger: { bg: 'danger', pressed: 'dangerPressed', text: 'onPrimary', border: null },
  ghost: { bg: null, pressed: 'surfaceSunken', text: 'primary', border: null },
};

export function Button({
  label,
  variant = 'primary',
  loading = false,
  loadingLabel,
  icon,
  fullWidth = false,
  size = 'regular',
  disabled,
  style,
  onPressIn,
  onPressOut,
  ...rest
}: ButtonProps) {
  const look = looks[variant];
  const inactive = Boolean(disabled) || loading;
  const { pressed, handlers } = usePressFeedback(onPressIn, onPressOut);
  return (
    <Pressable
      role="button"
      accessibilityRole="button"
      aria-disabled={inactive}
      aria-busy={loading}
      disabled={inactive}
      {...rest}
      {...handlers}
      style={StyleSheet.flatten([
        style,
        styles.base,
        size === 'compact' && styles.compact,
        fullWidth && styles.fullWidth,
        { backgroundColor: pressed && look.pressed ? colors[look.pressed] : look.bg ? colors[look.bg] : 'transparent' },
        look.border && { borderColor: colors[look.border], borderWidth: 1 },
        inactive && styles.inactive,
      ])}
    >
      <View style={styles.content}>
        {loading ? <ActivityIndicator size="small" color={colors[look.text]} /> : icon}
        <Text variant="label" color={look.text} numberOfLines={1}>
          {loading && loadingLabel ? loadingLabel : label}
        </Text>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: TAP_TARGET,
    minWidth: TAP_TARGET,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    alignItems: 'center',
    justifyContent: 'center',
    // As wide as its label unless asked to fill: a lone button in a column should not become a bar.
    alignSelf: 'flex-start',
  },
  compact: { paddingHorizontal: space.md },
  fullWidth: { alignSelf: 'stretch' },
  content: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  inactive: { opacity: 0.6 },
});
