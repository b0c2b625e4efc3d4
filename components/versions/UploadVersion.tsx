import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Card, Heading, TextField, space } from '@/components/ui';
import { ImportField } from '@/components/designs/ImportField';
import { IssueList } from '@/components/designs/IssueList';
import { isApiRequestError } from '@/lib/api/client';
import { useSaveVersion } from '@/lib/api/versions';
import { describeFailure, validate } from '@/lib/forms';
import type { ImportResult } from '@/lib/import';
import { saveVersionBody } from '@/shared/api/designs';
import type { Topology } from '@/shared/topology/schema';

type UploadVersionProps = {
  designId: number;
  /** The newest version this screen knows of; the save is refused (409) if someone saved after it. */
  latestNumber: number | null;
  onSaved: (n: number) => void;
  onClose: () => void;
  pickFile?: () => Promise<ImportResult | null>;
};

/** Upload a topology file as the design's next version. */
export function UploadVersion({ designId, latestNumber, onSaved, onClose, pickFile }: UploadVersionProps) {
  const save = useSaveVersion(designId);
  const [doc, setDoc] = useState<Topology | null>(null);
  const [message, setMessage] = useState('');
  const [errors, setErrors] = useState<{ message?: string; file?: string }>({});
  const failure = describeFailure(save.error);
  const conflict = isApiRequestError(save.error) && save.error.status === 409;
  const documentIssues = isApiRequestError(save.error) ? save.error.issues.filter((i) => i.path.startsWith('document')) : [];
  const next = (latestNumber ?? 0) + 1;

  function send() {
    const checked = validate(saveVersionBody, { baseVersion: latestNumber, message, document: doc ?? undefined });
    const fileError = doc ? undefined : 'Choose a topology file that passes the checks';
    setErrors({ message: checked.errors?.message, file: fileError });
    if (!checked.data || fileError) return;
    save.mutate(checked.data, { onSuccess: ({ version }) => onSaved(version.number) });
  }

  return (
    <Card testID="upload-version">
      <Heading level={2}>{`Upload a document as version ${next}`}</Heading>
      <ImportField label="Choose a topology file" testID="upload-file" error={errors.file} pick={pickFile} onDocument={setDoc} />
      <TextField label="What changed in this version" value={message} onChangeText={setMessage} error={errors.message ?? failure.fields.message} testID="upload-message" />
      {documentIssues.length > 0 ? <IssueList title="The server refused the document" issues={documentIssues} testID="upload-server-issues" /> : null}
      {failure.form ? (
        <Banner tone={conflict ? 'warning' : 'error'} title={conflict ? 'Someone saved a newer version' : 'Not saved'} testID="upload-error">
          {conflict
            ? `${failure.form} This screen now shows the newer versions; your file and message are still here, so you can check the differences and upload again.`
            : failure.form}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        <Button label={`Save as version ${next}`} loading={save.isPending} loadingLabel="Saving…" onPress={send} testID="upload-save" />
        <Button label="Cancel" variant="ghost" onPress={onClose} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
