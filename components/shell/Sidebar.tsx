import { StyleSheet, View } from 'react-native';
import { Text, colors, space } from '@/components/ui';
import { BrandMark } from '@/components/shell/BrandMark';
import { NavLink } from '@/components/shell/NavLink';
import { UserChip } from '@/components/shell/UserChip';
import type { NavItem, NavKey } from '@/lib/navigation';
import type { User } from '@/shared/api/auth';

type SidebarProps = { items: NavItem[]; active: NavKey | null; user: User; teamName: string | null };

export function Sidebar({ items, active, user, teamName }: SidebarProps) {
  return (
    <View style={styles.bar} testID="nav-sidebar">
      <View style={styles.top}>
        <BrandMark light />
        <View style={styles.team}>
          <Text variant="caption" color="onSidebarMuted">
            Team
          </Text>
          <Text variant="bodyStrong" color="onSidebar" testID="team-name">
            {teamName ?? ' '}
          </Text>
        </View>
      </View>
      <View role="navigation" aria-label="Main" style={styles.links}>
        {items.map((item) => (
          <NavLink key={item.key} item={item} active={item.key === active} placement="sidebar" />
        ))}
      </View>
      <View style={styles.footer}>
        <UserChip user={user} light />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    width: 256,
    backgroundColor: colors.sidebar,
    paddingHorizontal: space.md,
    paddingVertical: space.xl,
    gap: space.xl,
  },
  top: { gap: space.lg, paddingHorizontal: space.sm },
  team: { gap: 2 },
  links: { gap: space.xs, flex: 1 },
  footer: { paddingHorizontal: space.sm, paddingTop: space.lg, borderTopWidth: 1, borderTopColor: colors.sidebarActive },
});
