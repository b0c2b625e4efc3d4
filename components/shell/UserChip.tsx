import { StyleSheet, View } from 'react-native';
import { Text, colors, space } from '@/components/ui';
import { initials, roleLabel } from '@/lib/format';
import type { User } from '@/shared/api/auth';

/** Who is signed in: initials, name and role; `light` for the dark sidebar. */
export function UserChip({ user, light = false, compact = false }: { user: User; light?: boolean; compact?: boolean }) {
  return (
    <View style={styles.row} testID="signed-in-user">
      <View style={[styles.avatar, light && styles.avatarLight]}>
        <Text variant="smallStrong" color={light ? 'ink' : 'onPrimary'}>
          {initials(user.name)}
        </Text>
      </View>
      <View style={styles.text}>
        <Text variant={compact ? 'smallStrong' : 'bodyStrong'} color={light ? 'onSidebar' : 'ink'} numberOfLines={1}>
          {user.name}
        </Text>
        <Text variant="caption" color={light ? 'onSidebarMuted' : 'inkMuted'} numberOfLines={1}>
          {roleLabel(user.role)}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  avatar: {
    width: 36,
    height: 36,
    borderRadius: 18,
    backgroundColor: colors.primary,
    alignItems: 'center',
    justifyContent: 'center',
  },
  avatarLight: { backgroundColor: colors.copperSoft },
  text: { flexShrink: 1 },
});
