import { StyleSheet, View } from 'react-native';
import { Badge, Text, colors, space } from '@/components/ui';
import { eventPhrase } from '@/lib/designs/review-rules';
import { formatDateTime } from '@/lib/format';
import type { ReviewEventDto } from '@/shared/api/designs';

/** The review history of one version, oldest first, as it happened. */
export function ReviewThread({ events, testID }: { events: readonly ReviewEventDto[]; testID?: string }) {
  if (events.length === 0) {
    return (
      <Text variant="small" color="inkMuted" testID={testID}>
        Nobody has submitted or reviewed this version yet.
      </Text>
    );
  }
  return (
    <View role="list" style={styles.list} testID={testID}>
      {events.map((event) => (
        <View key={event.id} role="listitem" style={styles.event} testID={`review-event-${event.id}`}>
          <View style={styles.head}>
            <Text variant="smallStrong">{`${event.actor.name} ${eventPhrase(event)}`}</Text>
            {event.override ? <Badge label="Override" tone="danger" testID={`review-event-${event.id}-override`} /> : null}
          </View>
          <Text variant="caption" color="inkMuted">
            {formatDateTime(event.createdAt)}
          </Text>
          {event.comment ? <Text variant="small">{event.comment}</Text> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  event: { gap: 2, paddingLeft: space.md, borderLeftWidth: 3, borderLeftColor: colors.line },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
