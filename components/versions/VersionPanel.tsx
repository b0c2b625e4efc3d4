import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, Heading, Icon, Text, colors, space } from '@/components/ui';
import { StatusBadge } from '@/components/designs/StatusBadge';
import { SummaryLine } from '@/components/designs/SummaryLine';
import { ReviewPanel } from '@/components/review/ReviewPanel';
import { DownloadButton } from '@/components/versions/DownloadButton';
import { RestoreForm } from '@/components/versions/RestoreForm';
import { reportHref, versionHref } from '@/lib/designs/links';
import { formatDateTime } from '@/lib/format';
import type { VersionSummary } from '@/shared/api/designs';
import { can, type Role } from '@/shared/roles';

type VersionPanelProps = {
  designId: number;
  designName: string;
  version: VersionSummary;
  latestNumber: number;
  viewer: { id: number; role: Role };
  onSelect: (n: number) => void;
  /** Under its own row in the phone list, which already shows the message, author and summary. */
  embedded?: boolean;
};

/** The selected version: what it is, what to do with it, and its review. */
export function VersionPanel({ designId, designName, version, latestNumber, viewer, onSelect, embedded = false }: VersionPanelProps) {
  const [restoring, setRestoring] = useState(false);
  const editor = can(viewer.role, 'editDesigns');
  const n = version.number;
  return (
    <View style={styles.wrap} testID="version-panel">
      {embedded ? null : (
        <>
          <View style={styles.head}>
            <Heading level={2}>{`Version ${n}${n === latestNumber ? ' (latest)' : ''}`}</Heading>
            <StatusBadge status={version.review.state} />
          </View>
          <Text>{version.message}</Text>
          <Text variant="small" color="inkMuted">{`Saved by ${version.author.name}, ${formatDateTime(version.createdAt)}`}</Text>
          <SummaryLine summary={version.summary} testID="version-panel-summary" />
        </>
      )}
      <View style={styles.actions}>
        <Link href={reportHref(designId, n)} asChild>
          <Button label="Failure report" size="compact" icon={<Icon name="warning" size={18} color="onPrimary" />} testID="version-report" />
        </Link>
        <Link href={versionHref(designId, n)} asChild>
          <Button label="View read-only" variant="secondary" size="compact" testID="version-view" />
        </Link>
        <DownloadButton designId={designId} designName={designName} number={n} />
        {editor && n !== latestNumber && !restoring ? (
          <Button label="Restore…" variant="ghost" size="compact" onPress={() => setRestoring(true)} testID="version-restore" />
        ) : null}
      </View>
      {restoring ? (
        <RestoreForm
          designId={designId}
          number={n}
          latestNumber={latestNumber}
          onCancel={() => setRestoring(false)}
          onRestored={(created) => {
            setRestoring(false);
            onSelect(created);
          }}
        />
      ) : null}
      <View style={styles.divider} />
      <ReviewPanel designId={designId} version={version} latestNumber={latestNumber} viewer={viewer} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
  divider: { height: 1, backgroundColor: colors.line, marginVertical: space.sm },
});
