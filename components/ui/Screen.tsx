import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Heading, Text } from '@/components/ui/Text';
import { colors, CONTENT_MAX_WIDTH, space } from '@/components/ui/tokens';

type ScreenProps = {
  title?: string;
  /** One sentence under the title saying what this screen is for. */
  intro?: string;
  children: ReactNode;
  testID?: string;
  maxWidth?: number;
};

/** A scrolling page with a readable maximum width on wide windows. */
export function Screen({ title, intro, children, testID, maxWidth = CONTENT_MAX_WIDTH }: ScreenProps) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content} testID={testID} keyboardShouldPersistTaps="handled">
      <View style={[styles.column, { maxWidth }]}>
        {title ? (
          <View style={styles.header}>
            <Heading level={1}>{title}</Heading>
            {intro ? <Text color="inkMuted">{intro}</Text> : null}
          </View>
        ) : null}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, paddingHorizontal: space.lg, paddingTop: space.xl, paddingBottom: space.xxxl },
  column: { width: '100%', alignSelf: 'center', gap: space.lg },
  header: { gap: space.xs },
});
