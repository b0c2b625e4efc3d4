import { StyleSheet, View } from 'react-native';
import { Banner, Button, Icon, Text, space } from '@/components/ui';
import type { Namer } from '@/lib/report/names';
import type { HostRow } from '@/lib/report/view';
import type { ExposedPair } from '@/shared/analysis/types';
import { tupleKey } from '@/shared/keys/tuple';
import { printHidden } from '@/lib/print';

type WhatIfImpactProps = {
  failedNames: readonly string[];
  rows: readonly HostRow[];
  namer: Namer;
  pending: boolean;
  /** Pairs still connected after the chosen failures but hanging on a single point of failure. */
  exposed?: readonly ExposedPair[];
  onReset: () => void;
};

/** The simulation's verdict: which hosts would be cut off and which would keep access with less. */
export function WhatIfImpact({ failedNames, rows, namer, pending, exposed = [], onReset }: WhatIfImpactProps) {
  const lost = rows.filter((r) => r.effect === 'lost');
  const reduced = rows.filter((r) => r.effect === 'reduced');
  return (
    <Banner
      tone="warning"
      title="Simulation — not the saved report"
      testID="whatif-impact"
      action={
        <View {...printHidden()}>
          <Button label="Reset the simulation" variant="secondary" size="compact" onPress={onReset} testID="whatif-impact-reset" />
        </View>
      }
    >
      <Text variant="small" color="warningText">{`With ${failedNames.join(', ')} failed${pending ? ' (updating…)' : ''}:`}</Text>
      {lost.length > 0 ? (
        <View style={styles.list} testID="whatif-lost">
          {lost.map((row) => (
            <View key={`${row.host}-${row.array}`} style={styles.item} testID={`whatif-lost-${row.host}`}>
              <Icon name="unplugged" size={18} color="dangerText" />
              <Text variant="smallStrong" color="dangerText">{`${namer.device(row.host)} would lose access to ${namer.device(row.array)}`}</Text>
            </View>
          ))}
        </View>
      ) : (
        <View style={styles.item} testID="whatif-none-lost">
          <Icon name="success" size={18} color="successText" />
          <Text variant="smallStrong" color="successText">
            No host would lose access to its storage.
          </Text>
        </View>
      )}
      {reduced.length > 0 ? (
        <Text variant="small" color="warningText" testID="whatif-reduced">
          {`Still connected, but with less to spare: ${reduced.map((r) => namer.device(r.host)).join(', ')}.`}
        </Text>
      ) : null}
      {exposed.length > 0 ? (
        <View style={styles.list} testID="whatif-exposed">
          <Text variant="smallStrong" color="warningText">One more failure away from losing storage:</Text>
          {exposed.map((pair) => (
            <Text key={tupleKey([pair.host, pair.array])} variant="small" color="warningText" testID={`whatif-exposed-${pair.host}`}>
              {`${namer.device(pair.host)} to ${namer.device(pair.array)}, through ${pair.singlePointsOfFailure.map(namer.unit).join(', ')}`}
            </Text>
          ))}
        </View>
      ) : null}
    </Banner>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
