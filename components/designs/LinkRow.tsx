import type { ReactNode } from 'react';
import { Pressable, StyleSheet, type StyleProp, type ViewStyle } from 'react-native';
import { Link, type Href } from 'expo-router';
import { usePressFeedback } from '@/lib/use-press-feedback';

type LinkRowProps = { href: Href; style: StyleProp<ViewStyle>; pressedStyle: StyleProp<ViewStyle>; role?: 'link' | 'row'; testID?: string; children: ReactNode };

/**
 * A whole card or table row that opens a link. Pressed state lives in React state because
 * `<Link asChild>` merges the child's style as an object: a style function would be dropped and an
 * array spread into numbered keys, so the style is one flat object.
 */
export function LinkRow({ href, style, pressedStyle, role = 'link', testID, children }: LinkRowProps) {
  const { pressed, handlers } = usePressFeedback();
  return (
    <Link href={href} asChild>
      <Pressable role={role} testID={testID} {...handlers} style={StyleSheet.flatten([style, pressed && pressedStyle])}>
        {children}
      </Pressable>
    </Link>
  );
}
