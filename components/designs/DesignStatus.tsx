import { StyleSheet, View } from 'react-native';
import { Badge, Text, space } from '@/components/ui';
import { statusParts, statusText } from '@/lib/designs/summary';
import type { DesignStatus as Status } from '@/shared/api/designs';

type Props = {
  status: Status;
  approvedVersion: { number: number } | null;
  latest: { number: number; review: Status } | null;
  testID?: string;
};

/** A design's status in words, the approved version and a newer one beside it ("Approved v3 · draft v4"). */
export function DesignStatus({ status, approvedVersion, latest, testID }: Props) {
  const parts = statusParts({ status, approvedVersion, latest });
  return (
    <View style={styles.row} aria-label={statusText(parts)} testID={testID}>
      {parts.map((part, i) => (
        <View key={part.label} style={styles.part}>
          {i > 0 ? (
            <Text variant="small" color="inkMuted">
              ·
            </Text>
          ) : null}
          <Badge label={part.label} tone={part.tone} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  part: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
