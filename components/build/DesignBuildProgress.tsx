import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Badge, Button, Heading, Text, space } from '@/components/ui';
import { BuildProgressView } from '@/components/build/BuildProgressView';
import { useBuild } from '@/lib/api/build';
import { cablesToDoHref, checklistHref } from '@/lib/build/links';
import { formatDateTime } from '@/lib/format';

/**
 * The build's progress for the whole team on the design screen: the approved version's cables
 * tested and steps done, in total and per rack, and when the record was complete. Each rack opens
 * its cables still to do.
 */
export function DesignBuildProgress({ designId, version }: { designId: number; version: number }) {
  const build = useBuild(designId, version);
  if (!build.data) return null;
  const record = build.data;
  return (
    <View style={styles.wrap} testID="design-build">
      <View style={styles.head}>
        <Heading level={2}>{`Build of version ${version}`}</Heading>
        {record.complete ? <Badge label="Complete" tone="success" testID="design-build-complete" /> : <Badge label="In progress" tone="info" />}
      </View>
      {record.completedAt ? <Text variant="small" color="inkMuted">{`Every cable tested and every step done, ${formatDateTime(record.completedAt)}.`}</Text> : null}
      <BuildProgressView progress={record.progress} perRack rackHref={(rackId) => cablesToDoHref(designId, version, rackId)} testID="design-build-progress" />
      <Link href={checklistHref(designId, version)} asChild>
        <Button label="Bring-up checklist" variant="secondary" size="compact" testID="design-build-checklist" />
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
});
