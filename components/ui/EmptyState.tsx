import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Heading, Text } from '@/components/ui/Text';
import { Icon, type IconName } from '@/components/ui/icons';
import { colors, radius, space } from '@/components/ui/tokens';

type EmptyStateProps = { icon: IconName; title: string; children: ReactNode; action?: ReactNode; testID?: string };

/** What a screen shows when there is nothing yet: what will appear here, and what to do about it. */
export function EmptyState({ icon, title, children, action, testID }: EmptyStateProps) {
  return (
    <View style={styles.wrap} testID={testID}>
      <View style={styles.mark}>
        <Icon name={icon} size={34} color="primary" />
      </View>
      <Heading level={2} style={styles.center}>
        {title}
      </Heading>
      {typeof children === 'string' ? (
        <Text color="inkMuted" style={[styles.center, styles.body]}>
          {children}
        </Text>
      ) : (
        children
      )}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: {
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.xxxl,
    paddingHorizontal: space.xl,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
  },
  mark: {
    width: 64,
    height: 64,
    borderRadius: 32,
    backgroundColor: colors.primarySoft,
    alignItems: 'center',
    justifyContent: 'center',
  },
  center: { textAlign: 'center' },
  body: { maxWidth: 480 },
});
