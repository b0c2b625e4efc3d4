import type { ReactNode } from 'react';
import { Pressable, type StyleProp, type ViewStyle } from 'react-native';
import { Link, type Href } from 'expo-router';
import { usePressFeedback } from '@/lib/use-press-feedback';

type LinkRowProps = { href: Href; style: StyleProp<ViewStyle>; pressedStyle: StyleProp<ViewStyle>; role?: 'link' | 'row'; testID?: string; children: ReactNode };

/**
 * A whole card or table row that opens a link. Pressed state lives in React state because
 * `<Link asChild>` merges the child's style as an object and would drop a style function.
 */
export function LinkRow({ href, style, pressedStyle, role = 'link', testID, children }: LinkRowProps) {
  const { pressed, handlers } = usePressFeedback();
  return (
    <Link href={href} asChild>
      <Pressable role={role} testID={testID} {...handlers} style={[style, pressed && pressedStyle]}>
        {children}
      </Pressable>
    </Link>
  );
}
