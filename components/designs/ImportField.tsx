import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Icon, Text, space } from '@/components/ui';
import { DocumentPreview } from '@/components/designs/DocumentPreview';
import { IssueList } from '@/components/designs/IssueList';
import { pickTopologyFile, type ImportResult } from '@/lib/import';
import type { Topology } from '@/shared/topology/schema';

type ImportFieldProps = {
  label: string;
  /** Called with the document once a picked file passes every check; null when it did not. */
  onDocument: (doc: Topology | null, fileName: string) => void;
  error?: string;
  testID: string;
  /** Replaces the picker in tests. */
  pick?: () => Promise<ImportResult | null>;
};

/**
 * Pick a topology JSON file and check it here with the shared validator, before anything is sent:
 * a file that fails shows every problem with its path; one that passes shows what it holds.
 */
export function ImportField({ label, onDocument, error, testID, pick = pickTopologyFile }: ImportFieldProps) {
  const [result, setResult] = useState<ImportResult | null>(null);
  const [reading, setReading] = useState(false);

  async function choose() {
    setReading(true);
    try {
      const picked = await pick();
      if (!picked) return;
      setResult(picked);
      onDocument(picked.ok ? picked.doc : null, picked.fileName);
    } finally {
      setReading(false);
    }
  }

  return (
    <View style={styles.wrap}>
      <Button
        label={result ? 'Choose another file' : label}
        variant="secondary"
        icon={<Icon name="upload" size={18} color="primary" />}
        loading={reading}
        loadingLabel="Reading the file…"
        onPress={() => void choose()}
        testID={`${testID}-pick`}
      />
      {result?.ok ? <DocumentPreview doc={result.doc} title={`${result.fileName} passes the checks`} testID={`${testID}-preview`} /> : null}
      {result && !result.ok ? <IssueList title={`${result.fileName} cannot be used`} issues={result.issues} testID={`${testID}-issues`} /> : null}
      {error && !result ? (
        <View style={styles.error}>
          <Icon name="error" size={18} color="dangerText" />
          <Text variant="small" color="dangerText" role="alert" testID={`${testID}-error`}>
            {error}
          </Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  error: { flexDirection: 'row', gap: space.xs, alignItems: 'flex-start' },
});
