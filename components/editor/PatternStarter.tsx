import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Text, colors, radius, space } from '@/components/ui';
import { PATTERN_IDS, type PatternId } from '@/lib/editor/commands';
import { PATTERNS } from '@/shared/patterns';
import { useEditorDoc } from '@/lib/editor/hooks';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { NumberStepper } from '@/components/editor/NumberStepper';
import { applyPatternFromPalette } from '@/components/editor/palette-actions';

// The shared patterns' own names and sentences, as the new-design form shows them.
const patternOf = (id: PatternId) => PATTERNS.find((p) => p.id === id)!;

type Mode = 'replace' | 'merge';

/** Start from a pattern: replace the drawing (undo brings it back) or add the pattern beside it. */
export function PatternStarter({ onApplied }: { onApplied: () => void }) {
  const doc = useEditorDoc();
  const [pattern, setPattern] = useState<PatternId>('dual-fabric-management');
  const [hosts, setHosts] = useState(4);
  const [mode, setMode] = useState<Mode>('replace');
  const [error, setError] = useState<string | null>(null);
  const empty = doc.devices.length === 0;
  return (
    <View style={styles.wrap} testID="pattern-starter">
      <Text variant="bodyStrong">Start from a pattern</Text>
      <ChipPicker<PatternId> label="Pattern" chips={PATTERN_IDS.map((id) => ({ value: id, label: patternOf(id).name }))} value={pattern} onChange={setPattern} testID="pattern-choice" />
      <Text variant="small" color="inkMuted">
        {patternOf(pattern).about}
      </Text>
      <NumberStepper label="Hosts" value={hosts} min={1} max={32} onChange={setHosts} testID="pattern-hosts" />
      {!empty ? (
        <ChipPicker<Mode>
          label="With the current drawing"
          chips={[
            { value: 'replace', label: 'Replace it' },
            { value: 'merge', label: 'Add beside it' },
          ]}
          value={mode}
          onChange={setMode}
          testID="pattern-mode"
        />
      ) : null}
      {error ? <Banner tone="error">{error}</Banner> : null}
      <Button
        label={empty || mode === 'merge' ? 'Apply pattern' : 'Replace with pattern'}
        variant="secondary"
        fullWidth
        testID="pattern-apply"
        onPress={() => {
          const refusal = applyPatternFromPalette({ pattern, options: { hosts }, mode: empty ? 'replace' : mode });
          setError(refusal);
          if (!refusal) onApplied();
        }}
      />
      {!empty && mode === 'replace' ? (
        <Text variant="caption" color="inkMuted">
          Replacing keeps the design’s name; Undo brings the drawing back.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm, marginTop: space.md, padding: space.sm, borderRadius: radius.md, backgroundColor: colors.surfaceSunken },
});
