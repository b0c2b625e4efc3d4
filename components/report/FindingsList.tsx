import { StyleSheet, View } from 'react-native';
import { Card, Heading, Icon, Text, colors, space, type ColorName, type IconName } from '@/components/ui';
import type { Namer } from '@/lib/report/names';
import { findingsBySeverity, SEVERITY_TITLES } from '@/lib/report/view';
import type { Finding, Severity } from '@/shared/analysis/types';

const LOOK: Record<Severity, { icon: IconName; color: ColorName }> = {
  error: { icon: 'error', color: 'dangerText' },
  warning: { icon: 'warning', color: 'warningText' },
  info: { icon: 'info', color: 'infoText' },
};

/** Every finding, errors first: the rule, the things it is about by name, and the reason. */
export function FindingsList({ findings, namer }: { findings: readonly Finding[]; namer: Namer }) {
  return (
    <Card testID="report-findings">
      <Heading level={2}>{`Findings (${findings.length})`}</Heading>
      {findingsBySeverity(findings).map(({ severity, findings: group }) => (
        <View key={severity} style={styles.group} testID={`report-findings-${severity}`}>
          <View style={styles.groupHead}>
            <Icon name={LOOK[severity].icon} size={20} color={LOOK[severity].color} />
            <Heading level={3} color={LOOK[severity].color}>{`${SEVERITY_TITLES[severity]} (${group.length})`}</Heading>
          </View>
          {group.length === 0 ? (
            <Text variant="small" color="inkMuted">
              None.
            </Text>
          ) : (
            group.map((finding, i) => (
              <View key={`${finding.rule}-${i}`} style={styles.finding} testID={`report-finding-${finding.rule}`}>
                <Text variant="caption" color="inkMuted" style={styles.rule}>
                  {finding.rule}
                </Text>
                <Text variant="small">{finding.message}</Text>
                {finding.subjects.length > 0 ? (
                  <Text variant="caption" color="inkMuted">{`About: ${finding.subjects.map(namer.name).join(', ')}`}</Text>
                ) : null}
              </View>
            ))
          )}
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  groupHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  finding: { gap: 2, paddingLeft: space.md, borderLeftWidth: 3, borderLeftColor: colors.line },
  rule: { fontFamily: 'monospace' },
});
