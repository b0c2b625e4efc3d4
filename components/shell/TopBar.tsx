import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { Text, colors, space } from '@/components/ui';
import { BrandGlyph } from '@/components/shell/BrandMark';
import { UserChip } from '@/components/shell/UserChip';
import type { User } from '@/shared/api/auth';

/** The phone header: which team this is and who is signed in. */
export function TopBar({ user, teamName }: { user: User; teamName: string | null }) {
  const insets = useSafeAreaInsets();
  return (
    <View style={[styles.bar, { paddingTop: insets.top + space.sm }]} testID="top-bar">
      <View style={styles.team}>
        <BrandGlyph size={26} />
        <Text variant="smallStrong" numberOfLines={1} style={styles.teamName} testID="team-name">
          {teamName ?? 'Cablewright'}
        </Text>
      </View>
      <UserChip user={user} compact />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  team: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  teamName: { flexShrink: 1 },
});
