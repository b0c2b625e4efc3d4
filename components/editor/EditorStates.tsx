import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Banner, Button, Text, colors, space } from '@/components/ui';

/** While the design opens, or why it could not. */
export function EditorLoading({ error }: { error?: { message: string; retry: () => void } }) {
  return (
    <View style={styles.center} testID="editor-loading">
      {error ? (
        <View style={styles.problem}>
          <Banner tone="error" title="The design could not be opened">
            {error.message}
          </Banner>
          <Button label="Try again" onPress={error.retry} />
        </View>
      ) : (
        <>
          <ActivityIndicator size="large" color={colors.primary} />
          <Text color="inkMuted">Opening the design…</Text>
        </>
      )}
    </View>
  );
}

type NoticesProps = { layoutFixed: boolean; savedAs: number | null; readOnly: boolean; onClose: () => void };

/** The canvas's notes: a layout re-arranged on opening, a version just saved. */
export function EditorNotices({ layoutFixed, savedAs, readOnly, onClose }: NoticesProps) {
  if (!layoutFixed && savedAs === null) return null;
  const ok = (testID?: string) => <Button label="OK" variant="ghost" size="compact" onPress={onClose} testID={testID} />;
  return (
    <View style={styles.notice}>
      {layoutFixed ? (
        <Banner tone="info" title="Boxes re-arranged" testID="editor-layout-fixed" action={ok('editor-notice-close')}>
          {readOnly ? 'The saved layout had overlapping boxes on this canvas, so they are shown arranged afresh.' : 'The saved layout had overlapping boxes on this canvas, so they were arranged afresh. The new layout goes with the next version you save.'}
        </Banner>
      ) : null}
      {savedAs !== null ? (
        <Banner tone="success" testID="editor-saved" action={ok()}>
          {`Saved as version ${savedAs}.`}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, backgroundColor: colors.paper, padding: space.lg },
  problem: { width: '100%', maxWidth: 480, gap: space.md },
  notice: { position: 'absolute', left: space.md, bottom: space.md, gap: space.sm, maxWidth: 480 },
});
