import { useMemo, useRef } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import { useStore } from 'zustand';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import type { Gestures } from '@/lib/editor/gestures';
import { useEditorDoc } from '@/lib/editor/hooks';
import { colors } from '@/components/ui';
import { CanvasScene } from '@/components/canvas/CanvasScene';
import { useCanvasPointer } from '@/components/canvas/useCanvasPointer';

/**
 * The canvas: a plain element that takes every pointer, measures itself for the viewport math,
 * and draws the scene. All decisions are the gesture controller's; hit-testing is the model's.
 */
export function Canvas({ gestures }: { gestures: Gestures }) {
  const ref = useRef<View>(null);
  useCanvasPointer(ref, gestures);
  const screen = useStore(canvasUiStore, (s) => s.screen);
  const name = useEditorDoc().name;
  const onLayout = useMemo(
    () => (e: LayoutChangeEvent) => {
      const { width, height } = e.nativeEvent.layout;
      const old = canvasUiStore.getState().screen;
      if (old.width !== width || old.height !== height) canvasUiStore.setState({ screen: { width, height } });
    },
    [],
  );
  return (
    <View ref={ref} style={styles.canvas} onLayout={onLayout} testID="canvas">
      {screen.width > 0 && screen.height > 0 ? <CanvasScene width={screen.width} height={screen.height} label={`Diagram of ${name}`} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  canvas: { flex: 1, overflow: 'hidden', backgroundColor: colors.paper },
});
