import { StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { colors, radius, space } from '@/components/ui';
import type { Gestures } from '@/lib/editor/gestures';
import { IconButton } from '@/components/editor/IconButton';

/** Zoom out, zoom in, fit and what cable tags say, floating at the canvas's top-right corner (over it, on both sizes). */
export function CanvasControls({ gestures }: { gestures: Gestures }) {
  const tags = useStore(canvasUiStore, (s) => s.cableTags);
  return (
    <View style={styles.box} testID="canvas-controls">
      <IconButton
        icon="tag"
        label={tags === 'label' ? 'Cable tags show labels: show fabric and medium' : 'Cable tags show fabric and medium: show labels'}
        active={tags === 'label'}
        onPress={() => canvasUiStore.setState({ cableTags: tags === 'label' ? 'fabric' : 'label' })}
        testID="canvas-cable-tags"
      />
      <IconButton icon="zoomOut" label="Zoom out" shortcut="−" onPress={() => gestures.zoomStep(-1)} testID="canvas-zoom-out" />
      <IconButton icon="zoomIn" label="Zoom in" shortcut="+" onPress={() => gestures.zoomStep(1)} testID="canvas-zoom-in" />
      <IconButton icon="fit" label="Fit to screen" shortcut="F" onPress={() => gestures.fit()} testID="canvas-fit" />
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    position: 'absolute',
    top: space.sm,
    right: space.sm,
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    padding: 2,
  },
});
