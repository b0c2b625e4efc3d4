import { useState } from 'react';
import { Button, Icon, Text } from '@/components/ui';
import { useVersionLoader } from '@/lib/api/versions';
import { downloadJson, versionFileName } from '@/lib/download';

/** Save a version's topology document as a JSON file named after the design and the version. */
export function DownloadButton({ designId, designName, number }: { designId: number; designName: string; number: number }) {
  const load = useVersionLoader(designId);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const fileName = versionFileName(designName, number);

  async function download() {
    setBusy(true);
    setProblem(null);
    try {
      const version = await load(number);
      if (!downloadJson(fileName, version.document)) setProblem('Downloads work in the browser only.');
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The version could not be loaded.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <>
      <Button
        label="Download JSON"
        variant="secondary"
        size="compact"
        icon={<Icon name="download" size={18} color="primary" />}
        loading={busy}
        accessibilityHint={`Saves ${fileName}`}
        onPress={() => void download()}
        testID="version-download"
      />
      {problem ? (
        <Text variant="small" color="dangerText" role="alert">
          {problem}
        </Text>
      ) : null}
    </>
  );
}
