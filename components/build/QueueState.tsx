import { StyleSheet, View } from 'react-native';
import { Banner, Button, Icon, Text, colors, radius, space } from '@/components/ui';
import { buildQueue, useBuildQueue, useOnline, useSendNow } from '@/lib/api/build';
import { useMe } from '@/lib/api/auth';
import type { BuildQueue, QueuedItem } from '@/lib/build/queue';
import { plural, STATE_LABELS } from '@/lib/build/words';

type QueueStateProps = {
  /** Only this version's items; every item of this account when absent (the home screen). */
  designId?: number;
  version?: number;
  /** How an item is named in the list of refused ones (the cable's label, the step's title). */
  describe?: (item: QueuedItem) => string;
  queue?: BuildQueue;
};

function defaultDescription(item: QueuedItem): string {
  return item.kind === 'mark' ? `Cable ${item.fields.cableId}: ${STATE_LABELS[item.fields.state]}` : `Step ${item.fields.done ? 'done' : 'not done'}`;
}

/**
 * What this phone still has to send: how many marks wait, whether they are being sent, and the ones
 * the server refused, each with its sentence, a retry and a discard. Says so when there is no
 * connection; marks are never lost while it lasts (lib/build/queue.ts).
 */
export function QueueState({ designId, version, describe = defaultDescription, queue = buildQueue }: QueueStateProps) {
  const me = useMe().data;
  const items = useBuildQueue((s) => s.items, queue);
  const flushing = useBuildQueue((s) => s.flushing, queue);
  const online = useOnline();
  const sendNow = useSendNow(queue);
  const mine = items.filter((i) => me && i.userId === me.id && (designId === undefined || (i.designId === designId && i.version === version)));
  const waiting = mine.filter((i) => i.status === 'waiting');
  const sending = mine.filter((i) => i.status === 'sending');
  const refused = mine.filter((i) => i.status === 'refused');
  const lastError = waiting.find((i) => i.error)?.error ?? null;
  const pending = waiting.length + sending.length;

  return (
    <View style={styles.wrap} testID="queue-state" aria-live="polite">
      {!online ? (
        <Banner tone="warning" title="No connection" testID="queue-offline">
          Marks are kept on this phone and sent in order when the connection returns.
        </Banner>
      ) : null}
      {pending === 0 && refused.length === 0 ? (
        <View style={styles.row} testID="queue-clear">
          <Icon name="success" size={20} color="successText" />
          <Text variant="small" color="successText">
            Every mark from this phone is on the server.
          </Text>
        </View>
      ) : null}
      {pending > 0 ? (
        <View style={[styles.box, styles.waitingBox]}>
          <View style={styles.row}>
            <Icon name="clock" size={20} color="warningText" />
            <Text variant="bodyStrong" color="warningText" testID="queue-waiting-count">
              {`${plural(pending, 'mark')} waiting to send`}
            </Text>
          </View>
          {sending.length > 0 || flushing ? (
            <Text variant="small" color="warningText" testID="queue-sending">
              Sending…
            </Text>
          ) : lastError ? (
            <Text variant="small" color="warningText">
              {lastError}
            </Text>
          ) : null}
          {sendNow ? (
            <Button label="Send now" variant="secondary" fullWidth disabled={flushing} onPress={() => void sendNow()} testID="queue-send-now" />
          ) : null}
        </View>
      ) : null}
      {refused.map((item, index) => (
        <View key={item.clientId} style={[styles.box, styles.refusedBox]} testID={`queue-refused-${index}`}>
          <Text variant="smallStrong" color="dangerText">
            {`Not sent: ${describe(item)}`}
          </Text>
          <Text variant="small" color="dangerText">
            {item.error ?? 'The server did not take this mark.'}
          </Text>
          <View style={styles.actions}>
            <Button
              label="Retry"
              size="compact"
              onPress={() => {
                queue.getState().retry(item.clientId);
                void sendNow?.();
              }}
              testID={`queue-retry-${index}`}
            />
            <Button label="Discard" variant="ghost" size="compact" onPress={() => queue.getState().discard(item.clientId)} testID={`queue-discard-${index}`} />
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 24 },
  box: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderLeftWidth: 4 },
  waitingBox: { backgroundColor: colors.warningSoft, borderLeftColor: colors.warningText },
  refusedBox: { backgroundColor: colors.dangerSoft, borderLeftColor: colors.dangerText },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
