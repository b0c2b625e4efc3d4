import { memo } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { Text, colors, radius, space } from '@/components/ui';
import { cableHref } from '@/lib/designs/links';
import { endText, placeText } from '@/lib/schedule/view';
import { lengthText } from '@/shared/labels/content';
import { MEDIA_NAMES } from '@/shared/rules/cables';
import type { ScheduleRow } from '@/shared/schedule/types';

/** Every card is this tall (and the gap under it this wide), so the list can place rows without measuring them. */
export const CARD_HEIGHT = 136;
export const CARD_GAP = 8;
export const CARD_ITEM = CARD_HEIGHT + CARD_GAP;

/**
 * One cable on the phone (a plain Pressable and router.push, not a Link: thousands of rows go past
 * while scrolling and a Link costs more to mount): the label in big type, the identifier, both ends
 * with their rack and unit.
 */
export const ScheduleCard = memo(function ScheduleCard({ row, id, n }: { row: ScheduleRow; id: number; n: number }) {
  const router = useRouter();
  const length = lengthText(row.lengthM ?? row.stockLengthM);
  const spoken = `${row.label}: ${endText(row.a)}, ${placeText(row.a.rack, row.a.ru)}, to ${endText(row.b)}, ${placeText(row.b.rack, row.b.ru)}`;
  return (
    <Pressable role="link" onPress={() => router.push(cableHref(id, n, row.id))} aria-label={spoken} style={styles.card} testID={`schedule-card-${row.id}`}>
      <View style={styles.top}>
        <Text variant="title" numberOfLines={1} style={styles.label}>
          {row.label}
        </Text>
        <Text variant="small" color="inkMuted" numberOfLines={1}>{`${MEDIA_NAMES[row.media]} · ${length}`}</Text>
      </View>
      <Text variant="caption" color="inkMuted" numberOfLines={1}>
        {row.identifier}
      </Text>
      <Text variant="bodyStrong" numberOfLines={1}>{`${endText(row.a)}  ·  ${placeText(row.a.rack, row.a.ru)}`}</Text>
      <Text variant="body" numberOfLines={1}>{`→ ${endText(row.b)}  ·  ${placeText(row.b.rack, row.b.ru)}`}</Text>
    </Pressable>
  );
});

const styles = StyleSheet.create({
  card: {
    height: CARD_HEIGHT,
    overflow: 'hidden',
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    paddingHorizontal: space.lg,
    paddingVertical: space.md,
    gap: 2,
  },
  top: { flexDirection: 'row', alignItems: 'baseline', justifyContent: 'space-between', gap: space.sm },
  label: { flexShrink: 1 },
});
