import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/Text';
import { colors, fonts, radius, space, type ColorName } from '@/components/ui/tokens';

export type BadgeTone = 'neutral' | 'primary' | 'copper' | 'info' | 'success' | 'warning' | 'danger';

const tones: Record<BadgeTone, { text: ColorName; bg: ColorName }> = {
  neutral: { text: 'ink', bg: 'surfaceSunken' },
  primary: { text: 'primary', bg: 'primarySoft' },
  copper: { text: 'copper', bg: 'paper' },
  info: { text: 'infoText', bg: 'infoSoft' },
  success: { text: 'successText', bg: 'successSoft' },
  warning: { text: 'warningText', bg: 'warningSoft' },
  danger: { text: 'dangerText', bg: 'dangerSoft' },
};

/** A short label; its words carry the meaning, the tint only helps scanning. */
export function Badge({ label, tone = 'neutral', testID }: { label: string; tone?: BadgeTone; testID?: string }) {
  const look = tones[tone];
  return (
    <View testID={testID} style={[styles.badge, { backgroundColor: colors[look.bg], borderColor: colors[look.text] }]}>
      <Text variant="caption" color={look.text} style={styles.text} numberOfLines={1}>
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    paddingHorizontal: space.sm,
    paddingVertical: 2,
    borderRadius: radius.pill,
    borderWidth: 1,
  },
  text: { fontFamily: fonts.semibold },
});
