import { StyleSheet, View } from 'react-native';
import { Card, Heading, Icon, Text, colors, space, type ColorName, type IconName } from '@/components/ui';
import type { Namer } from '@/lib/report/names';
import { ruleTitle } from '@/lib/report/rule-titles';
import { findingsBySeverity, SEVERITY_TITLES } from '@/lib/report/view';
import type { Finding, Severity } from '@/shared/analysis/types';

const LOOK: Record<Severity, { icon: IconName; color: ColorName }> = {
  error: { icon: 'error', color: 'dangerText' },
  warning: { icon: 'warning', color: 'warningText' },
  info: { icon: 'info', color: 'infoText' },
};

/** react-native-web renders `title` as a tooltip; React Native's types do not list it. */
function webTitle(title: string): object {
  return { title };
}

/** Every finding, errors first: its title in words (the rule id small beside it), the reason, and what it is about by name. */
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
                <View style={styles.titleRow}>
                  <Text variant="smallStrong" testID={`report-finding-${finding.rule}-title`}>
                    {ruleTitle(finding.rule)}
                  </Text>
                  <Text variant="caption" color="inkMuted" style={styles.rule} aria-label={`rule ${finding.rule}`} {...webTitle(`Rule ${finding.rule}`)}>
                    {finding.rule}
                  </Text>
                </View>
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
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: space.sm },
  rule: { fontFamily: 'monospace', fontSize: 11 },
});
