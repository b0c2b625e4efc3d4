import { useState } from 'react';
import type { GestureResponderEvent } from 'react-native';

type Handler = ((event: GestureResponderEvent) => void) | null | undefined;

/**
 * Pressed state kept in React state instead of Pressable's style function: expo-router's
 * `<Link asChild>` merges the child's style as an object, and a style function is lost there.
 */
export function usePressFeedback(onPressIn?: Handler, onPressOut?: Handler) {
  const [pressed, setPressed] = useState(false);
  return {
    pressed,
    handlers: {
      onPressIn: (event: GestureResponderEvent) => {
        setPressed(true);
        onPressIn?.(event);
      },
      onPressOut: (event: GestureResponderEvent) => {
        setPressed(false);
        onPressOut?.(event);
      },
    },
  };
}
