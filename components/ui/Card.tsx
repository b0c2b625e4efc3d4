import type { ReactNode } from 'react';
import { StyleSheet, View, type ViewProps } from 'react-native';
import { colors, radius, space } from '@/components/ui/tokens';

type CardProps = ViewProps & { children: ReactNode; padded?: boolean };

export function Card({ children, padded = true, style, ...rest }: CardProps) {
  return (
    <View style={[styles.card, padded && styles.padded, style]} {...rest}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    gap: space.md,
  },
  padded: { padding: space.lg },
});
