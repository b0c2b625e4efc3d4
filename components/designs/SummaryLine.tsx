import { StyleSheet, View } from 'react-native';
import { Icon, Text, space, type ColorName, type IconName } from '@/components/ui';
import { summaryText, summaryTone } from '@/lib/designs/summary';
import type { ReportSummary } from '@/shared/analysis/summary';

const LOOKS: Record<ReturnType<typeof summaryTone>, { icon: IconName; color: ColorName }> = {
  success: { icon: 'success', color: 'successText' },
  warning: { icon: 'warning', color: 'warningText' },
  danger: { icon: 'error', color: 'dangerText' },
};

/** "6 of 6 hosts redundant · no errors", with an icon that repeats the verdict for quick scanning. */
export function SummaryLine({ summary, testID }: { summary: ReportSummary; testID?: string }) {
  const look = LOOKS[summaryTone(summary)];
  return (
    <View style={styles.row} testID={testID}>
      <Icon name={look.icon} size={18} color={look.color} />
      <Text variant="small" color={look.color} style={styles.text}>
        {summaryText(summary)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xs },
  text: { flexShrink: 1 },
});
