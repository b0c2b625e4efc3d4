import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { Icon, Text, colors, fonts, radius, space, TAP_TARGET } from '@/components/ui';
import type { NavItem } from '@/lib/navigation';
import { usePressFeedback } from '@/lib/use-press-feedback';

type NavLinkProps = { item: NavItem; active: boolean; placement: 'tab' | 'sidebar' };

/** One destination in the tab bar or the sidebar; a real link on the web (middle-click, new tab). */
export function NavLink({ item, active, placement }: NavLinkProps) {
  const isTab = placement === 'tab';
  const { pressed, handlers } = usePressFeedback();
  const textColor = isTab ? (active ? 'primary' : 'inkMuted') : active ? 'onSidebar' : 'onSidebarMuted';
  return (
    <Link href={item.href} asChild>
      <Pressable
        testID={`nav-${item.key}`}
        role="link"
        aria-label={item.label}
        aria-current={active ? 'page' : undefined}
        {...handlers}
        style={StyleSheet.flatten([
          isTab ? styles.tab : styles.side,
          !isTab && active && styles.sideActive,
          pressed && (isTab ? styles.tabPressed : styles.sidePressed),
        ])}
      >
        {isTab ? <View style={[styles.tabMarker, active && styles.tabMarkerActive]} /> : null}
        <Icon name={item.icon} size={isTab ? 24 : 22} color={isTab ? textColor : active ? 'copperSoft' : 'onSidebarMuted'} />
        <Text variant={isTab ? 'caption' : 'bodyStrong'} color={textColor} style={isTab && active ? styles.tabLabelActive : undefined}>
          {item.label}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  tab: {
    flex: 1,
    minHeight: TAP_TARGET + 12,
    alignItems: 'center',
    justifyContent: 'center',
    gap: 2,
    paddingTop: space.xs,
  },
  tabPressed: { backgroundColor: colors.surfaceSunken },
  tabMarker: { position: 'absolute', top: 0, height: 3, width: 36, borderRadius: 2, backgroundColor: 'transparent' },
  tabMarkerActive: { backgroundColor: colors.copper },
  tabLabelActive: { fontFamily: fonts.semibold },
  side: {
    minHeight: TAP_TARGET,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderLeftWidth: 3,
    borderLeftColor: 'transparent',
  },
  sideActive: { backgroundColor: colors.sidebarActive, borderLeftColor: colors.copperSoft },
  sidePressed: { backgroundColor: colors.sidebarActive },
});
