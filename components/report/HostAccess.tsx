import { StyleSheet, View } from 'react-native';
import { Badge, Card, Heading, Icon, Text, colors, radius, space } from '@/components/ui';
import { plural } from '@/lib/designs/summary';
import { controllerShortName, type Namer } from '@/lib/report/names';
import type { HostRow } from '@/lib/report/view';
import type { TopologyIndex } from '@/shared/topology';

/** `unreached`: hosts with data ports that reach no array even before any simulated failure. */
type HostAccessProps = { rows: readonly HostRow[]; unreached: readonly string[]; namer: Namer; index: TopologyIndex };

/** Per host and array: sessions, controllers reached and every single point of failure by name. */
export function HostAccess({ rows, unreached, namer, index }: HostAccessProps) {
  return (
    <Card testID="report-hosts">
      <Heading level={2}>Hosts and arrays</Heading>
      {unreached.map((host) => (
        <View key={host} style={[styles.row, styles.lost]} testID={`report-unreached-${host}`}>
          <View style={styles.head}>
            <Text variant="bodyStrong">{namer.device(host)}</Text>
            <Badge label="No storage access" tone="danger" />
          </View>
          <Text variant="small" color="dangerText">
            No data path reaches a controller of any array: check its cables and the networks of its ports.
          </Text>
        </View>
      ))}
      {rows.length === 0 && unreached.length === 0 ? (
        <Text color="inkMuted">No host reaches an array, so there are no storage paths to test.</Text>
      ) : (
        rows.map((row) => <HostAccessRow key={`${row.host}-${row.array}`} row={row} namer={namer} index={index} />)
      )}
    </Card>
  );
}

function HostAccessRow({ row, namer, index }: { row: HostRow; namer: Namer; index: TopologyIndex }) {
  const result = row.after;
  const tid = `report-host-${row.host}`;
  const lost = row.effect === 'lost';
  return (
    <View style={[styles.row, lost && styles.lost]} testID={tid}>
      <View style={styles.head}>
        <Text variant="bodyStrong">{`${namer.device(row.host)} → ${namer.device(row.array)}`}</Text>
        {lost ? (
          <View style={styles.flag} testID={`${tid}-lost`}>
            <Icon name="unplugged" size={18} color="dangerText" />
            <Text variant="smallStrong" color="dangerText">
              Would lose access
            </Text>
          </View>
        ) : result?.redundant ? (
          <Badge label="Redundant" tone="success" testID={`${tid}-state`} />
        ) : (
          <Badge label="Not redundant" tone="danger" testID={`${tid}-state`} />
        )}
        {row.effect === 'reduced' ? <Badge label="Reduced by the simulation" tone="warning" testID={`${tid}-reduced`} /> : null}
      </View>
      {result ? (
        <>
          <Text variant="small" testID={`${tid}-sessions`}>
            {`${plural(result.sessions, 'session')}${row.effect && result.sessions !== row.before.sessions ? ` (${row.before.sessions} without the failures)` : ''} · controllers reached: ${
              result.controllersReached.map((c) => controllerShortName(index, c)).join(', ') || 'none'
            }`}
          </Text>
          {result.singlePointsOfFailure.length > 0 ? (
            <View style={styles.spofs} testID={`${tid}-spofs`}>
              <Text variant="smallStrong" color="dangerText">
                {`Single points of failure (${result.singlePointsOfFailure.length}):`}
              </Text>
              {result.singlePointsOfFailure.map((unit) => (
                <Text key={unit} variant="small" color="dangerText">{`• ${namer.unit(unit)}`}</Text>
              ))}
            </View>
          ) : (
            <Text variant="small" color="successText">
              No single cable, card, switch or controller cuts it off.
            </Text>
          )}
        </>
      ) : (
        <Text variant="small" color="dangerText">{`No session left to ${namer.device(row.array)}: it had ${plural(row.before.sessions, 'session')} without the failures.`}</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, paddingVertical: space.sm, paddingHorizontal: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  lost: { backgroundColor: colors.dangerSoft, borderRadius: radius.sm, borderTopColor: colors.dangerSoft },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  flag: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  spofs: { gap: 2 },
});
