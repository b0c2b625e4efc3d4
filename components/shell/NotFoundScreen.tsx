import { Link, usePathname } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { BrandMark } from '@/components/shell/BrandMark';
import { Button, EmptyState, colors, space } from '@/components/ui';

export function NotFoundScreen() {
  const pathname = usePathname();
  return (
    <View style={styles.page} testID="not-found">
      <View style={styles.column}>
        <BrandMark />
        <EmptyState icon="info" title="There is no page at this address">
          {`Nothing in Cablewright lives at ${pathname}. The link may be mistyped or out of date.`}
        </EmptyState>
        <Link href="/designs" asChild>
          <Button label="Go to Designs" />
        </Link>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper, justifyContent: 'center', padding: space.lg },
  column: { width: '100%', maxWidth: 560, alignSelf: 'center', gap: space.lg },
});
