import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Text, TextField, space } from '@/components/ui';
import type { SaveConflictBody } from '@/shared/api/designs';
import { isApiRequestError } from '@/lib/api/client';
import { useSaveVersion } from '@/lib/api/versions';
import { parseField, versionMessageField } from '@/lib/editor/fields';
import { editorStore } from '@/lib/editor/store';
import { describeFailure } from '@/lib/forms';
import { ConflictPanel } from '@/components/editor/ConflictPanel';
import { Overlay } from '@/components/editor/Overlay';

type SaveDialogProps = {
  designId: number;
  wide: boolean;
  onClose: () => void;
  onSaved: (number: number) => void;
  onOpenVersion: (number: number) => void;
};

/**
 * "Save version": a message, then POST with the version the work started from. A 409 means
 * someone saved a newer version meanwhile; the conflict panel shows what differs and offers to
 * open theirs or save this work on top of it.
 */
export function SaveDialog({ designId, wide, onClose, onSaved, onOpenVersion }: SaveDialogProps) {
  const save = useSaveVersion(designId);
  const [message, setMessage] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ latest: number | null } | null>(null);

  const submit = (baseVersion: number | null) => {
    const parsed = parseField(versionMessageField, message);
    if (!parsed.ok) return setFieldError(parsed.message);
    const doc = editorStore.getState().doc;
    setError(null);
    save.mutate(
      { baseVersion, message: parsed.value, document: doc },
      {
        onSuccess: ({ version }) => {
          editorStore.getState().markSaved(version.number, doc);
          onSaved(version.number);
        },
        onError: (failure) => {
          if (isApiRequestError(failure) && failure.status === 409) {
            const body = failure.body as Partial<SaveConflictBody> | undefined;
            setConflict({ latest: typeof body?.latestVersion === 'number' ? body.latestVersion : null });
            return;
          }
          const described = describeFailure(failure);
          setFieldError(described.fields.message ?? null);
          setError(described.form ?? (described.fields.message ? null : Object.values(described.fields)[0] ?? null));
        },
      },
    );
  };

  const base = editorStore.getState().baseVersion;
  return (
    <Overlay title="Save version" onClose={onClose} wide={wide} testID="save-dialog">
      {conflict ? (
        <ConflictPanel
          designId={designId}
          latest={conflict.latest}
          base={base}
          saving={save.isPending}
          onSaveOnTop={() => submit(conflict.latest)}
          onOpenTheirs={() => conflict.latest !== null && onOpenVersion(conflict.latest)}
        />
      ) : (
        <View style={styles.wrap}>
          <Text variant="small" color="inkMuted">
            {base === null ? 'This becomes the design’s first version.' : `This becomes a new version on top of version ${base}. Versions never change once saved.`}
          </Text>
          <TextField
            label="What changed"
            value={message}
            onChangeText={(text) => {
              setMessage(text);
              setFieldError(null);
            }}
            error={fieldError}
            multiline
            placeholder="e.g. Cable wms-db-1 card-2 to fab-b"
            testID="save-message"
            onSubmitEditing={() => submit(base)}
          />
          {error ? <Banner tone="error">{error}</Banner> : null}
          <View style={styles.actions}>
            <Button label="Save version" loading={save.isPending} loadingLabel="Saving…" onPress={() => submit(base)} testID="save-submit" />
            <Button label="Cancel" variant="ghost" onPress={onClose} />
          </View>
        </View>
      )}
    </Overlay>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md }, actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' } });
