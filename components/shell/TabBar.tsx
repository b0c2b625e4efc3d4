import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors } from '@/components/ui';
import { NavLink } from '@/components/shell/NavLink';
import type { NavItem, NavKey } from '@/lib/navigation';

export function TabBar({ items, active }: { items: NavItem[]; active: NavKey | null }) {
  const insets = useSafeAreaInsets();
  return (
    <View role="navigation" aria-label="Main" testID="nav-tabs" style={[styles.bar, { paddingBottom: insets.bottom }]}>
      {items.map((item) => (
        <NavLink key={item.key} item={item} active={item.key === active} placement="tab" />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
});
