import { StyleSheet, View } from 'react-native';
import { Card, Heading, Text, colors, space } from '@/components/ui';
import { cutOffPhrases, type Namer } from '@/lib/report/names';
import { UNIT_KIND_LABELS } from '@/lib/report/units';
import type { FailureResult } from '@/shared/analysis/types';

/** Per failure unit: which hosts lose which arrays when that one thing fails. */
export function FailureUnits({ failures, namer }: { failures: readonly FailureResult[]; namer: Namer }) {
  return (
    <Card testID="report-failures">
      <Heading level={2}>What each single failure cuts off</Heading>
      {failures.length === 0 ? (
        <Text color="successText" testID="report-failures-none">
          No single cable, card, switch or controller cuts any host off any array.
        </Text>
      ) : (
        failures.map((failure) => (
          <View key={failure.unit} style={styles.row} testID={`report-failure-${failure.unit}`}>
            <Text variant="caption" color="inkMuted">
              {UNIT_KIND_LABELS[failure.kind]}
            </Text>
            <Text variant="bodyStrong">{namer.unit(failure.unit)}</Text>
            <Text variant="small" color="dangerText">{`Cuts off ${cutOffPhrases(namer, failure).join('; ')}`}</Text>
          </View>
        ))
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
});
