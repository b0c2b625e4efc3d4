import { useMemo, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Banner, Button, Text, colors, space } from '@/components/ui';
import { diffTopologies } from '@/shared/diff';
import { useVersion } from '@/lib/api/versions';
import { useEditorDoc } from '@/lib/editor/hooks';
import { formatDateTime } from '@/lib/format';
import { DiffSummary } from '@/components/editor/DiffSummary';

type ConflictPanelProps = {
  designId: number;
  latest: number | null;
  base: number | null;
  saving: boolean;
  onSaveOnTop: () => void;
  onOpenTheirs: () => void;
};

/** Someone saved a newer version while this work was open: what it changed against this work, and the two ways on. */
export function ConflictPanel({ designId, latest, base, saving, onSaveOnTop, onOpenTheirs }: ConflictPanelProps) {
  const theirs = useVersion(designId, latest ?? 0, { enabled: latest !== null });
  const mine = useEditorDoc();
  const [confirmOpen, setConfirmOpen] = useState(false);
  const diff = useMemo(() => (theirs.data ? diffTopologies(theirs.data.document, mine) : null), [theirs.data, mine]);
  const who = theirs.data ? `${theirs.data.author.name} saved version ${theirs.data.number} (${formatDateTime(theirs.data.createdAt)}): “${theirs.data.message}”` : `Version ${latest} was saved`;
  return (
    <View style={styles.wrap} testID="save-conflict">
      <Banner tone="warning" title="Someone saved a newer version">
        {`${who} while you were working on ${base === null ? 'a design without versions' : `version ${base}`}. Saving now would pass over their changes unseen.`}
      </Banner>
      {latest !== null && !theirs.data && !theirs.error ? <ActivityIndicator color={colors.primary} /> : null}
      {theirs.error ? <Banner tone="error">{theirs.error.message}</Banner> : null}
      {diff ? <DiffSummary diff={diff} beforeLabel={`version ${latest}`} afterLabel="your work" /> : null}
      <Text variant="small" color="inkMuted">
        Saving on top makes your work the next version as it is now: whatever of theirs is listed above as changed or removed is replaced by yours.
      </Text>
      <View style={styles.actions}>
        <Button label={latest === null ? 'Save as the first version' : `Save my work as version ${latest + 1}`} loading={saving} loadingLabel="Saving…" disabled={latest !== null && !diff} onPress={onSaveOnTop} testID="conflict-save-on-top" />
        {latest !== null ? <Button label={`Open version ${latest} instead`} variant="secondary" onPress={() => setConfirmOpen(true)} testID="conflict-open-theirs" /> : null}
      </View>
      {confirmOpen ? (
        <Banner tone="error" title={`Open version ${latest} and drop your changes?`}>
          <View style={styles.actions}>
            <Button label="Drop my changes and open it" variant="danger" size="compact" onPress={onOpenTheirs} testID="conflict-open-confirm" />
            <Button label="Keep working" variant="ghost" size="compact" onPress={() => setConfirmOpen(false)} />
          </View>
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md }, actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' } });
