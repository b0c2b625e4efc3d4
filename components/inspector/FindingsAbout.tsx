import { StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Icon, Text, space } from '@/components/ui';
import type { Finding } from '@/shared/analysis/types';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';

const EMPTY: Finding[] = [];

const SEVERITY_WORD = { error: 'Problem', warning: 'Warning', info: 'Note' } as const;

/** One finding as a line: an icon and a spoken word for its severity, then the analysis's sentence. */
export function FindingLine({ finding }: { finding: Finding }) {
  const icon = finding.severity === 'error' ? 'error' : finding.severity === 'warning' ? 'warning' : 'info';
  const color = finding.severity === 'error' ? 'dangerText' : finding.severity === 'warning' ? 'warningText' : 'infoText';
  return (
    <View style={styles.line}>
      <Icon name={icon} size={18} color={color} />
      <Text variant="small" style={styles.text}>
        <Text variant="smallStrong" color={color}>
          {`${SEVERITY_WORD[finding.severity]}: `}
        </Text>
        {finding.message}
      </Text>
    </View>
  );
}

/** The live analysis's findings that name one of `ids`, each once, in the report's order. */
export function FindingsAbout({ ids, title = 'Findings', testID, designWide = false }: { ids: string[]; title?: string; testID?: string; designWide?: boolean }) {
  const bySubject = useStore(liveAnalysisStore, (s) => s.marks.findingsBySubject);
  const report = useStore(liveAnalysisStore, (s) => s.report);
  const seen = new Set<Finding>();
  if (designWide) for (const f of report?.findings ?? EMPTY) if (f.subjects.length === 0) seen.add(f);
  for (const id of ids) for (const f of bySubject.get(id) ?? EMPTY) seen.add(f);
  const findings = [...seen];
  return (
    <View style={styles.wrap} testID={testID}>
      <Text variant="label">{title}</Text>
      {findings.length === 0 ? (
        <Text variant="small" color="inkMuted">
          The analysis has nothing to say about this.
        </Text>
      ) : (
        findings.map((f, i) => <FindingLine key={`${f.rule}-${i}`} finding={f} />)
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  line: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  text: { flex: 1 },
});
