import { useEffect, type ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { Heading, colors, radius, space } from '@/components/ui';
import { IconButton } from '@/components/editor/IconButton';

type OverlayProps = {
  title: string;
  onClose: () => void;
  children: ReactNode;
  testID?: string;
  /** On a phone the panel rises from the bottom edge; on a wide screen it sits in the middle. */
  wide: boolean;
  maxWidth?: number;
};

/**
 * A dialog over the editor: a scrim that closes it, a titled panel with a close button, Escape to
 * close. Rendered inside the editor's frame, so the shell around stays reachable.
 */
export function Overlay({ title, onClose, children, testID, wide, maxWidth = 560 }: OverlayProps) {
  useEffect(() => {
    if (typeof window === 'undefined' || typeof window.addEventListener !== 'function') return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        e.stopPropagation();
        onClose();
      }
    };
    window.addEventListener('keydown', onKey, true);
    return () => window.removeEventListener('keydown', onKey, true);
  }, [onClose]);
  return (
    <View style={[StyleSheet.absoluteFill, styles.layer, wide ? styles.centred : styles.bottom]}>
      <Pressable style={[StyleSheet.absoluteFill, styles.scrim]} onPress={onClose} aria-label="Close" accessibilityRole="button" />
      <View role="dialog" aria-label={title} testID={testID} style={[styles.panel, wide ? [styles.panelWide, { maxWidth }] : styles.panelNarrow]}>
        <View style={styles.header}>
          <Heading level={2} style={styles.title}>
            {title}
          </Heading>
          <IconButton icon="close" label="Close" onPress={onClose} testID={testID ? `${testID}-close` : undefined} />
        </View>
        <ScrollView style={styles.scroll} contentContainerStyle={styles.body} keyboardShouldPersistTaps="handled">
          {children}
        </ScrollView>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  layer: { zIndex: 20 },
  centred: { alignItems: 'center', justifyContent: 'center', padding: space.xl },
  bottom: { justifyContent: 'flex-end' },
  scrim: { backgroundColor: 'rgba(15, 61, 62, 0.28)' },
  panel: { backgroundColor: colors.surface, borderColor: colors.line, borderWidth: 1, overflow: 'hidden' },
  panelWide: { width: '100%', maxHeight: '90%', borderRadius: radius.lg },
  panelNarrow: { maxHeight: '88%', borderTopLeftRadius: radius.lg, borderTopRightRadius: radius.lg },
  header: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md, paddingLeft: space.lg, paddingRight: space.sm, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
  title: { flex: 1 },
  scroll: { flexGrow: 0 },
  body: { padding: space.lg, gap: space.md },
});
