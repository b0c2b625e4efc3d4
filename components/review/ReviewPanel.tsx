import { StyleSheet, View } from 'react-native';
import { Heading, Icon, Text, space } from '@/components/ui';
import { StatusBadge } from '@/components/designs/StatusBadge';
import { ReviewActions } from '@/components/review/ReviewActions';
import { ReviewThread } from '@/components/review/ReviewThread';
import { reviewOptions } from '@/lib/designs/review-rules';
import type { VersionSummary } from '@/shared/api/designs';
import type { Role } from '@/shared/roles';

type ReviewPanelProps = { designId: number; version: VersionSummary; latestNumber: number; viewer: { id: number; role: Role } };

/** Review of one version: its state, the thread, and the steps the signed-in role allows. */
export function ReviewPanel({ designId, version, latestNumber, viewer }: ReviewPanelProps) {
  const options = reviewOptions(viewer, version, latestNumber);
  return (
    <View style={styles.wrap} testID="review-panel">
      <View style={styles.head}>
        <Heading level={3}>Review</Heading>
        <StatusBadge status={version.review.state} testID="review-state" />
      </View>
      <ReviewThread events={version.review.events} testID="review-thread" />
      {options.note ? (
        <View style={styles.note} testID="review-note">
          <Icon name="info" size={18} color="infoText" />
          <Text variant="small" color="infoText" style={styles.noteText}>
            {options.note}
          </Text>
        </View>
      ) : null}
      {options.submit || options.decide ? <ReviewActions key={version.number} designId={designId} number={version.number} options={options} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  note: { flexDirection: 'row', gap: space.xs, alignItems: 'flex-start' },
  noteText: { flex: 1 },
});
