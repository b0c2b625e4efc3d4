import { StyleSheet, View } from 'react-native';
import { Text, colors, radius, space } from '@/components/ui';
import type { Count } from '@/shared/api/build';

type ProgressBarProps = { label: string; count: Count; doneWord: string; testID?: string };

/** "Cables: 12 of 40 tested" over a bar; the words carry the numbers, the bar only helps the eye. */
export function ProgressBar({ label, count, doneWord, testID }: ProgressBarProps) {
  const share = count.total === 0 ? 0 : count.done / count.total;
  const text = `${count.done} of ${count.total} ${doneWord}`;
  return (
    <View style={styles.wrap} testID={testID}>
      <View style={styles.words}>
        <Text variant="smallStrong">{label}</Text>
        <Text variant="small" testID={testID ? `${testID}-text` : undefined}>
          {text}
        </Text>
      </View>
      <View
        style={styles.track}
        role="progressbar"
        aria-label={`${label}: ${text}`}
        aria-valuemin={0}
        aria-valuemax={count.total}
        aria-valuenow={count.done}
      >
        <View style={[styles.fill, { width: `${Math.round(share * 1000) / 10}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  words: { flexDirection: 'row', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  // The track's edge is lineStrong (3:1 against the surface, tokens.ts) so the bar's extent shows in daylight.
  track: { height: 12, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.lineStrong, backgroundColor: colors.surfaceSunken, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: colors.primary },
});
