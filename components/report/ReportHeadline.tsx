import { StyleSheet, View } from 'react-native';
import { Badge, Icon, Text, colors, radius, space, type ColorName, type IconName } from '@/components/ui';
import { plural } from '@/lib/designs/summary';
import type { ReportSummary } from '@/shared/analysis/summary';

type Stat = { key: string; value: string; label: string; icon: IconName; color: ColorName };

function stats(summary: ReportSummary): Stat[] {
  const allRedundant = summary.hosts > 0 && summary.redundantHosts === summary.hosts;
  return [
    { key: 'hosts', value: `${summary.redundantHosts} of ${summary.hosts}`, label: 'hosts redundant', icon: allRedundant ? 'success' : 'warning', color: allRedundant ? 'successText' : 'warningText' },
    { key: 'errors', value: String(summary.errors), label: summary.errors === 1 ? 'error' : 'errors', icon: summary.errors ? 'error' : 'success', color: summary.errors ? 'dangerText' : 'successText' },
    { key: 'warnings', value: String(summary.warnings), label: summary.warnings === 1 ? 'warning' : 'warnings', icon: summary.warnings ? 'warning' : 'success', color: summary.warnings ? 'warningText' : 'successText' },
    {
      key: 'spof',
      value: String(summary.singlePointsOfFailure),
      label: summary.singlePointsOfFailure === 1 ? 'single point of failure' : 'single points of failure',
      icon: summary.singlePointsOfFailure ? 'error' : 'success',
      color: summary.singlePointsOfFailure ? 'dangerText' : 'successText',
    },
  ];
}

/** The four numbers a reviewer reads first; marked when they come from a simulation. */
/** `simulatedWith`: the names of the failed units when the numbers come from a simulation. */
export function ReportHeadline({ summary, simulatedWith }: { summary: ReportSummary; simulatedWith: readonly string[] | null }) {
  return (
    <View style={styles.wrap} testID="report-headline" aria-label={`${plural(summary.redundantHosts, 'host')} of ${summary.hosts} redundant`}>
      {simulatedWith ? <Badge label={`Simulation: ${simulatedWith.join(', ')} failed`} tone="copper" testID="report-headline-simulated" /> : null}
      <View style={styles.row}>
        {stats(summary).map((stat) => (
          <View key={stat.key} style={styles.stat} testID={`report-headline-${stat.key}`}>
            <View style={styles.valueRow}>
              <Icon name={stat.icon} size={20} color={stat.color} />
              <Text variant="display" color={stat.color} testID={`report-headline-${stat.key}-value`}>
                {stat.value}
              </Text>
            </View>
            <Text variant="small">{stat.label}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  stat: { flexGrow: 1, flexBasis: 150, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, gap: 2 },
  valueRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
