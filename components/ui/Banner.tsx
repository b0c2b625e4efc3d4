import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/Text';
import { Icon, type IconName } from '@/components/ui/icons';
import { colors, radius, space, type ColorName } from '@/components/ui/tokens';

export type BannerTone = 'info' | 'warning' | 'error' | 'success';

/** Each tone has an icon and a spoken prefix, so its meaning never rests on colour alone. */
const tones: Record<BannerTone, { icon: IconName; text: ColorName; bg: ColorName; prefix: string }> = {
  info: { icon: 'info', text: 'infoText', bg: 'infoSoft', prefix: 'Note' },
  warning: { icon: 'warning', text: 'warningText', bg: 'warningSoft', prefix: 'Warning' },
  error: { icon: 'error', text: 'dangerText', bg: 'dangerSoft', prefix: 'Problem' },
  success: { icon: 'success', text: 'successText', bg: 'successSoft', prefix: 'Done' },
};

type BannerProps = { tone: BannerTone; title?: string; children?: ReactNode; testID?: string; action?: ReactNode };

export function Banner({ tone, title, children, testID, action }: BannerProps) {
  const look = tones[tone];
  return (
    <View
      testID={testID}
      role={tone === 'error' ? 'alert' : 'status'}
      style={[styles.banner, { backgroundColor: colors[look.bg], borderLeftColor: colors[look.text] }]}
    >
      <Icon name={look.icon} size={22} color={look.text} />
      <View style={styles.body}>
        <Text variant="smallStrong" color={look.text}>
          {title ?? look.prefix}
        </Text>
        {typeof children === 'string' ? (
          <Text variant="small" color={look.text}>
            {children}
          </Text>
        ) : (
          children
        )}
        {action}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    flexDirection: 'row',
    gap: space.md,
    padding: space.md,
    borderRadius: radius.md,
    borderLeftWidth: 4,
    alignItems: 'flex-start',
  },
  body: { flex: 1, gap: space.xs },
});
