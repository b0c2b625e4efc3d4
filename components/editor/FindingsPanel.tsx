import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Text, colors, radius, space } from '@/components/ui';
import type { Finding, Severity } from '@/shared/analysis/types';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { subjectLabel } from '@/lib/editor/describe';
import { focusFinding } from '@/lib/editor/focus';
import { buildSnapshot } from '@/lib/editor/geometry';
import { useEditorDoc } from '@/lib/editor/hooks';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { editorStore } from '@/lib/editor/store';
import { severityCounts } from '@/lib/report/view';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { FindingLine } from '@/components/inspector/FindingsAbout';
import { ruleTitle } from '@/lib/report/rule-titles';

type Filter = 'all' | Severity;

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
const PAGE = 100;

/**
 * The live findings, most severe first. Tapping one selects its subjects and brings them into
 * view; on a phone `onFocused` closes the sheet so the canvas shows them.
 */
export function FindingsPanel({ onFocused }: { onFocused?: () => void }) {
  const report = useStore(liveAnalysisStore, (s) => s.report);
  const pending = useStore(liveAnalysisStore, (s) => s.pending);
  const doc = useEditorDoc();
  const [filter, setFilter] = useState<Filter>('all');
  const [limit, setLimit] = useState(PAGE);
  const findings = useMemo(() => (report?.findings ?? []).filter((f) => filter === 'all' || f.severity === filter), [report, filter]);
  // Test ids count within each rule: the second single point of failure is finding-single-point-of-failure-1.
  const ordinals = useMemo(() => {
    const seen = new Map<string, number>();
    return findings.map((f) => {
      const n = seen.get(f.rule) ?? 0;
      seen.set(f.rule, n + 1);
      return n;
    });
  }, [findings]);
  const counts = useMemo(() => severityCounts(report?.findings ?? []), [report]);

  const focus = (finding: Finding) => {
    const state = editorStore.getState();
    const result = focusFinding(buildSnapshot(state.doc), finding, state.viewport, canvasUiStore.getState().screen);
    if (result.selection.length > 0) state.select(result.selection);
    if (result.viewport) state.setViewport(result.viewport);
    onFocused?.();
  };

  return (
    <View style={styles.wrap} testID="findings-panel">
      <Text variant="small" color="inkMuted" testID="findings-status" aria-live="polite">
        {!report ? 'The analysis is running…' : `${plural(counts.error, 'problem')}, ${plural(counts.warning, 'warning')}, ${plural(counts.info, 'note')}${pending ? ' — updating…' : ''}`}
      </Text>
      <ChipPicker<Filter>
        label="Show"
        chips={[
          { value: 'all', label: 'All' },
          { value: 'error', label: `Problems (${counts.error})` },
          { value: 'warning', label: `Warnings (${counts.warning})` },
          { value: 'info', label: `Notes (${counts.info})` },
        ]}
        value={filter}
        onChange={(f) => {
          setFilter(f);
          setLimit(PAGE);
        }}
        testID="findings-filter"
      />
      {report && findings.length === 0 ? <Text variant="small">Nothing to report here.</Text> : null}
      {findings.slice(0, limit).map((finding, i) => (
        <Pressable key={`${finding.rule}:${finding.subjects.join(',')}:${i}`} role="button" aria-label={`Show: ${finding.message}`} onPress={() => focus(finding)} style={({ pressed }) => [styles.item, pressed && styles.pressed]} testID={`finding-${finding.rule}-${ordinals[i]}`}>
          <FindingLine finding={finding} />
          {finding.subjects.length > 0 ? (
            <Text variant="caption" color="inkMuted" numberOfLines={2}>
              {`${ruleTitle(finding.rule)} · ${finding.subjects.slice(0, 4).map((id) => subjectLabel(doc, id)).join(', ')}${finding.subjects.length > 4 ? '…' : ''}`}
            </Text>
          ) : (
            <Text variant="caption" color="inkMuted">{`${ruleTitle(finding.rule)} · the whole design`}</Text>
          )}
        </Pressable>
      ))}
      {findings.length > limit ? (
        <Pressable role="button" onPress={() => setLimit(limit + PAGE)} style={styles.more}>
          <Text variant="smallStrong" color="primary">{`Show ${Math.min(PAGE, findings.length - limit)} more of ${findings.length - limit}`}</Text>
        </Pressable>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  item: { gap: space.xs, padding: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  pressed: { backgroundColor: colors.surfaceSunken },
  more: { minHeight: 44, justifyContent: 'center' },
});
