import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { BrandMark } from '@/components/shell/BrandMark';
import { Text, colors, space } from '@/components/ui';

/** The signed-out frame: the product's name, one line on what it is for, and a single card. */
export function AuthFrame({ children }: { children: ReactNode }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      <View style={styles.column}>
        <View style={styles.intro}>
          <BrandMark />
          <Text color="inkMuted">Plan, prove and build storage networks where every host keeps a second path.</Text>
        </View>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, justifyContent: 'center', padding: space.lg, paddingVertical: space.xxl },
  column: { width: '100%', maxWidth: 440, alignSelf: 'center', gap: space.xl },
  intro: { gap: space.sm },
});
