import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Banner, Button, colors, space, Text } from '@/components/ui';

/** While the app asks the server who is signed in. */
export function SessionLoading() {
  return (
    <View style={styles.center} testID="session-loading">
      <ActivityIndicator size="large" color={colors.primary} />
      <Text color="inkMuted">Opening Cablewright…</Text>
    </View>
  );
}

/** The server could not say who is signed in (unreachable or failing): say so and offer a retry. */
export function SessionProblem({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <View style={styles.center} testID="session-problem">
      <View style={styles.box}>
        <Banner tone="error" title="Cablewright cannot reach its server">
          {message}
        </Banner>
        <Button label="Try again" onPress={onRetry} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, backgroundColor: colors.paper, padding: space.lg },
  box: { width: '100%', maxWidth: 440, gap: space.md },
});
