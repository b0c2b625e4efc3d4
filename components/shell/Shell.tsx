import type { ReactNode } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { usePathname } from 'expo-router';
import { colors, WIDE_BREAKPOINT } from '@/components/ui';
import { Sidebar } from '@/components/shell/Sidebar';
import { TabBar } from '@/components/shell/TabBar';
import { TopBar } from '@/components/shell/TopBar';
import { activeNavKey, navItemsFor } from '@/lib/navigation';
import type { User } from '@/shared/api/auth';

type ShellProps = { user: User; teamName: string | null; children: ReactNode };

/** The signed-in frame: phone first with bottom tabs; a sidebar once the window is wide enough. */
export function Shell({ user, teamName, children }: ShellProps) {
  const { width } = useWindowDimensions();
  const pathname = usePathname();
  const items = navItemsFor(user.role);
  const active = activeNavKey(pathname);
  // On a phone the canvas editor takes the whole screen; its own bar has the way back. The bars
  // give way to null, not to another tree, so the Slot below keeps its place and stays mounted.
  const immersive = /^\/designs\/[^/]+\/edit\/?$/.test(pathname);
  if (width >= WIDE_BREAKPOINT) {
    return (
      <View style={styles.wide} testID="shell-wide">
        <Sidebar items={items} active={active} user={user} teamName={teamName} />
        <View style={styles.main} role="main">
          {children}
        </View>
      </View>
    );
  }
  return (
    <View style={styles.narrow} testID="shell-narrow">
      {immersive ? null : <TopBar user={user} teamName={teamName} />}
      <View style={styles.main} role="main">
        {children}
      </View>
      {immersive ? null : <TabBar items={items} active={active} />}
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  narrow: { flex: 1, backgroundColor: colors.paper },
  main: { flex: 1 },
});
