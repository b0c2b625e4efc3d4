import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Text, TextField, colors, radius, space } from '@/components/ui';
import { useRestoreVersion } from '@/lib/api/versions';
import { describeFailure, validate } from '@/lib/forms';
import { restoreBody } from '@/shared/api/designs';

type RestoreFormProps = { designId: number; number: number; latestNumber: number; onRestored: (n: number) => void; onCancel: () => void };

/** Restoring copies an old version's document into a new version; nothing is overwritten. */
export function RestoreForm({ designId, number, latestNumber, onRestored, onCancel }: RestoreFormProps) {
  const restore = useRestoreVersion(designId);
  const [message, setMessage] = useState(`Restore version ${number}`);
  const [error, setError] = useState<string | null>(null);
  const failure = describeFailure(restore.error);

  function send() {
    const checked = validate(restoreBody, { message });
    setError(checked.errors?.message ?? null);
    if (!checked.data) return;
    restore.mutate({ n: number, ...checked.data }, { onSuccess: ({ version }) => onRestored(version.number) });
  }

  return (
    <View style={styles.box} testID="restore-form">
      <Text variant="small">{`Version ${number}'s document becomes version ${latestNumber + 1}. Every existing version stays as it is.`}</Text>
      <TextField label="Message for the new version" value={message} onChangeText={setMessage} error={error ?? failure.fields.message} testID="restore-message" />
      {failure.form ? (
        <Banner tone="error" title="Not restored" testID="restore-error">
          {failure.form}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        <Button label={`Restore as version ${latestNumber + 1}`} size="compact" loading={restore.isPending} loadingLabel="Restoring…" onPress={send} testID="restore-confirm" />
        <Button label="Cancel" variant="ghost" size="compact" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunken },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
