import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { Button, Text, space } from '@/components/ui';
import { sheetSurface } from '@/components/editor/BottomSheet';

type CablingStripProps = { from: string; onConnect: () => void; onDetails: () => void; onStop: () => void };

/**
 * The phone's sheet while a cable is being drawn: one short bar, so the port at the other end stays
 * on screen to be tapped — or chosen from a list with "Connect to…", no aiming needed. The port's
 * settings are one tap away.
 */
export function CablingStrip({ from, onConnect, onDetails, onStop }: CablingStripProps) {
  const insets = useSafeAreaInsets();
  return (
    <View style={[sheetSurface, styles.strip, { paddingBottom: insets.bottom + space.sm }]} role="region" aria-label="Cabling" testID="cabling-strip">
      <Text variant="small" testID="cabling-strip-text">
        {`Cabling from ${from}: tap the port at the other end, or choose it from a list.`}
      </Text>
      <View style={styles.actions}>
        <Button label="Connect to…" size="compact" onPress={onConnect} testID="cabling-strip-connect" />
        <Button label="Port settings" variant="secondary" size="compact" onPress={onDetails} testID="cabling-strip-details" />
        <Button label="Stop cabling" variant="ghost" size="compact" onPress={onStop} testID="cabling-strip-stop" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  strip: { gap: space.sm, paddingTop: space.md, paddingHorizontal: space.lg },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
