import { forwardRef, useId, useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { Text } from '@/components/ui/Text';
import { Icon } from '@/components/ui/icons';
import { colors, radius, space, TAP_TARGET, type as typeScale } from '@/components/ui/tokens';

type TextFieldProps = Omit<TextInputProps, 'style'> & {
  label: string;
  hint?: string;
  error?: string | null;
  testID?: string;
};

/**
 * A labelled input with an optional hint and an inline error under it. The error is tied to the
 * input (aria-describedby / aria-invalid on the web) and carries an icon, so it is not colour alone.
 */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, hint, error, testID, onFocus, onBlur, ...rest },
  ref,
) {
  const id = useId().replace(/:/g, '');
  const [focused, setFocused] = useState(false);
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
  return (
    <View style={styles.wrap}>
      <Text variant="label" nativeID={`${id}-label`}>
        {label}
      </Text>
      {hint ? (
        <Text variant="small" color="inkMuted" nativeID={`${id}-hint`} testID={testID ? `${testID}-hint` : undefined}>
          {hint}
        </Text>
      ) : null}
      <TextInput
        ref={ref}
        testID={testID}
        aria-label={label}
        accessibilityLabel={label}
        placeholderTextColor={colors.inkMuted}
        onFocus={(e) => {
          setFocused(true);
          onFocus?.(e);
        }}
        onBlur={(e) => {
          setFocused(false);
          onBlur?.(e);
        }}
        style={[styles.input, focused && styles.focused, error ? styles.invalid : null]}
        {...webDescription(describedBy, Boolean(error))}
        {...rest}
      />
      {error ? (
        <View style={styles.error} nativeID={`${id}-error`} testID={testID ? `${testID}-error` : undefined}>
          <Icon name="error" size={18} color="dangerText" />
          <Text variant="small" color="dangerText" style={styles.errorText} role="alert">
            {error}
          </Text>
        </View>
      ) : null}
    </View>
  );
});

/** react-native-web forwards these ARIA attributes; React Native's own types do not list them. */
function webDescription(describedBy: string, invalid: boolean): object {
  return { 'aria-describedby': describedBy || undefined, 'aria-invalid': invalid || undefined };
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, alignSelf: 'stretch' },
  input: {
    ...typeScale.body,
    color: colors.ink,
    minHeight: TAP_TARGET + 4,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    backgroundColor: colors.surface,
    borderColor: colors.lineStrong,
    borderWidth: 1,
    borderRadius: radius.md,
    marginTop: space.xs,
  },
  focused: { borderColor: colors.primary, borderWidth: 2, paddingHorizontal: space.md - 1 },
  invalid: { borderColor: colors.danger, borderWidth: 2, paddingHorizontal: space.md - 1 },
  error: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xs, marginTop: space.xs },
  errorText: { flex: 1 },
});
