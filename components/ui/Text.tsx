import { Text as RNText, type TextProps as RNTextProps, StyleSheet } from 'react-native';
import { colors, type ColorName, type as typeScale, type TypeVariant } from '@/components/ui/tokens';

export type TextProps = RNTextProps & { variant?: TypeVariant; color?: ColorName };

export function Text({ variant = 'body', color = 'ink', style, ...rest }: TextProps) {
  return <RNText style={[typeScale[variant], { color: colors[color] }, style]} {...rest} />;
}

type HeadingProps = TextProps & { level?: 1 | 2 | 3 };

const headingVariant = { 1: 'title', 2: 'heading', 3: 'bodyStrong' } as const;

/** A heading that assistive technology announces as one (role + aria-level on the web). */
export function Heading({ level = 1, variant, style, ...rest }: HeadingProps) {
  return (
    <Text
      role="heading"
      {...webLevel(level)}
      variant={variant ?? headingVariant[level]}
      style={[styles.heading, style]}
      {...rest}
    />
  );
}

/** react-native-web forwards aria-level to the DOM; React Native's own types do not list it. */
function webLevel(level: number): object {
  return { 'aria-level': level };
}

const styles = StyleSheet.create({ heading: { letterSpacing: -0.2 } });
