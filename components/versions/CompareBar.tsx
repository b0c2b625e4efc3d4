import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, Icon, Text, colors, radius, space } from '@/components/ui';
import { diffHref } from '@/lib/designs/links';

/** Shown while versions are picked for comparison: what to pick next, or the link to the diff. */
export function CompareBar({ designId, picked, onClear }: { designId: number; picked: readonly number[]; onClear: () => void }) {
  if (picked.length === 0) return null;
  const [from, to] = [...picked].sort((a, b) => a - b);
  return (
    <View style={styles.bar} testID="compare-bar">
      {picked.length === 1 ? (
        <Text variant="small">{`Version ${picked[0]} picked. Pick one more version to compare with it.`}</Text>
      ) : (
        <Link href={diffHref(designId, from, to)} asChild>
          <Button label={`Compare version ${from} with ${to}`} icon={<Icon name="compare" size={18} color="onPrimary" />} testID="compare-open" />
        </Link>
      )}
      <Button label="Clear" variant="ghost" size="compact" onPress={onClear} testID="compare-clear" />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, padding: space.sm, borderRadius: radius.md, backgroundColor: colors.primarySoft },
});
