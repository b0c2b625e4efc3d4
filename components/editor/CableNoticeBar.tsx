import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Button, Icon, Text, colors, radius, space } from '@/components/ui';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { openNoticedCable, undoNoticedCable } from '@/lib/editor/quick-cable';

/** How long the notice stays: long enough to read and reach Undo (common practice for such notices). */
const SHOWN_MS = 12000;

/**
 * The notice of a cable just made: one short bar at the top of the canvas, with Undo and the
 * cable's settings. It covers no port the next tap may want (the canvas around it stays live) and
 * goes by itself, or with the next tap on the canvas.
 */
export function CableNoticeBar() {
  const notice = useStore(canvasUiStore, (s) => s.notice);
  useEffect(() => {
    if (!notice) return;
    const timer = setTimeout(() => {
      if (canvasUiStore.getState().notice === notice) canvasUiStore.setState({ notice: null });
    }, SHOWN_MS);
    return () => clearTimeout(timer);
  }, [notice]);
  if (!notice) return null;
  return (
    <View style={styles.wrap} pointerEvents="box-none">
      <View style={styles.bar} role="status" aria-live="polite" testID="cable-notice">
        <Icon name="success" size={18} color="successText" />
        <Text variant="small" style={styles.text} testID="cable-notice-text">
          {notice.text}
        </Text>
        <View style={styles.actions}>
          <Button label="Undo" variant="secondary" size="compact" onPress={() => undoNoticedCable()} testID="cable-notice-undo" />
          <Button label="Cable settings" variant="ghost" size="compact" onPress={() => openNoticedCable()} testID="cable-notice-settings" />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  // Below the zoom controls at the top-right corner, so neither hides the other.
  wrap: { position: 'absolute', top: 56, left: space.sm, right: space.sm, alignItems: 'center', zIndex: 15 },
  bar: {
    maxWidth: 560,
    width: '100%',
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.successText,
    backgroundColor: colors.successSoft,
  },
  text: { flex: 1, minWidth: 180 },
  actions: { flexDirection: 'row', gap: space.xs },
});
