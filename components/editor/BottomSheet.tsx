import type { ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { Text, colors, radius, space } from '@/components/ui';
import { IconButton } from '@/components/editor/IconButton';

type BottomSheetProps = {
  title: string;
  expanded: boolean;
  onToggle: () => void;
  onClose: () => void;
  children: ReactNode;
  testID?: string;
};

/**
 * The phone's inspector: a sheet over the bottom of the canvas, low (a third of the screen) so
 * the selection stays visible, or raised for longer forms. The handle toggles between the two.
 */
export function BottomSheet({ title, expanded, onToggle, onClose, children, testID }: BottomSheetProps) {
  const insets = useSafeAreaInsets();
  return (
    <View style={[sheetSurface, expanded ? styles.expanded : styles.low, { paddingBottom: insets.bottom }]} testID={testID} role="region" aria-label={title}>
      <Pressable onPress={onToggle} style={styles.handleRow} role="button" aria-label={expanded ? 'Lower the sheet' : 'Raise the sheet'} aria-expanded={expanded} testID={testID ? `${testID}-handle` : undefined}>
        <View style={styles.handle} />
      </Pressable>
      <View style={styles.header}>
        <Text variant="bodyStrong" numberOfLines={1} style={styles.title}>
          {title}
        </Text>
        <IconButton icon="close" label="Close" onPress={onClose} testID={testID ? `${testID}-close` : undefined} />
      </View>
      <ScrollView style={styles.scroll} contentContainerStyle={styles.body} keyboardShouldPersistTaps="handled">
        {children}
      </ScrollView>
    </View>
  );
}

/** The surface every phone sheet sits on: pinned to the bottom over the canvas, rounded at the top. */
export const sheetSurface = StyleSheet.create({
  base: {
    position: 'absolute',
    left: 0,
    right: 0,
    bottom: 0,
    backgroundColor: colors.surface,
    borderTopLeftRadius: radius.lg,
    borderTopRightRadius: radius.lg,
    borderTopWidth: 1,
    borderColor: colors.lineStrong,
    zIndex: 10,
  },
}).base;

const styles = StyleSheet.create({
  low: { height: '42%' },
  expanded: { height: '82%' },
  handleRow: { alignItems: 'center', paddingTop: space.sm, paddingBottom: space.xs, minHeight: 24 },
  handle: { width: 44, height: 5, borderRadius: 3, backgroundColor: colors.lineStrong },
  header: { flexDirection: 'row', alignItems: 'center', paddingLeft: space.lg, paddingRight: space.sm },
  title: { flex: 1 },
  scroll: { flex: 1 },
  body: { paddingHorizontal: space.lg, paddingBottom: space.xl, gap: space.md },
});
