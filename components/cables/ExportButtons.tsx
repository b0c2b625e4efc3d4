import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Icon, Text, space } from '@/components/ui';
import { api } from '@/lib/api/client';
import { buildSheetPath, type BuildSheetFile } from '@/lib/api/schedule';
import { downloadBlob } from '@/lib/download';
import { exportFileName } from '@/shared/schedule/tables';

/** The server's files of a version's build sheet (docs/api.md), saved under the names the server gives them. */
const FILES: readonly { file: BuildSheetFile; label: string; what: string; extension: string; testID: string }[] = [
  { file: 'cables.csv', label: 'Cables CSV', what: 'cables', extension: 'csv', testID: 'schedule-export-cables' },
  { file: 'addresses.csv', label: 'Addresses CSV', what: 'addresses', extension: 'csv', testID: 'schedule-export-addresses' },
  { file: 'cables.xlsx', label: 'Workbook', what: 'cables', extension: 'xlsx', testID: 'schedule-export-workbook' },
];

export function ExportButtons({ id, n, designName }: { id: number; n: number; designName: string }) {
  const [busy, setBusy] = useState<BuildSheetFile | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  async function save(entry: (typeof FILES)[number]) {
    setBusy(entry.file);
    setProblem(null);
    try {
      const blob = await api.file(buildSheetPath(id, n, entry.file));
      if (!downloadBlob(exportFileName(designName, n, entry.what, entry.extension), blob)) setProblem('Downloads work in the browser only.');
    } catch (error) {
      setProblem(error instanceof Error ? error.message : `The ${entry.label} could not be made.`);
    } finally {
      setBusy(null);
    }
  }

  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        {FILES.map((entry) => (
          <Button
            key={entry.file}
            label={entry.label}
            variant="secondary"
            size="compact"
            icon={<Icon name="download" size={18} color="primary" />}
            loading={busy === entry.file}
            disabled={busy !== null && busy !== entry.file}
            accessibilityHint={`Saves ${exportFileName(designName, n, entry.what, entry.extension)}`}
            onPress={() => void save(entry)}
            testID={entry.testID}
          />
        ))}
      </View>
      {problem ? (
        <Text variant="small" color="dangerText" role="alert" testID="schedule-export-problem">
          {problem}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
