import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { SegmentedPicker, Text, TextField, space } from '@/components/ui';
import { DocumentPreview } from '@/components/designs/DocumentPreview';
import { buildPattern, PATTERN_HINTS, type PatternId, type PatternValues } from '@/lib/designs/new-design';
import type { FieldErrors } from '@/lib/forms';
import { PATTERNS } from '@/shared/patterns';

const PATTERN_OPTIONS = PATTERNS.map((p) => ({ value: p.id as PatternId, label: p.name }));

type PatternFieldsProps = { values: PatternValues; onChange: (values: PatternValues) => void; name: string; errors: FieldErrors };

/** Which pattern and how big; the built document is previewed with its analysis as the numbers change. */
export function PatternFields({ values, onChange, name, errors }: PatternFieldsProps) {
  const built = useMemo(() => buildPattern(values, name), [values, name]);
  // A number out of range says so under its field as it is typed, not only when the form is sent.
  const shown: FieldErrors = { ...(built.errors ?? {}), ...errors };
  const set = (field: keyof PatternValues) => (text: string) => onChange({ ...values, [field]: text });
  return (
    <View style={styles.wrap} testID="new-design-pattern">
      <SegmentedPicker label="Pattern" options={PATTERN_OPTIONS} value={values.pattern} onChange={(pattern) => onChange({ ...values, pattern })} testID="new-design-pattern-kind" />
      <Text variant="small" color="inkMuted">
        {PATTERN_HINTS[values.pattern]}
      </Text>
      <View style={styles.numbers}>
        <View style={styles.number}>
          <TextField label="Hosts" value={values.hosts} onChangeText={set('hosts')} inputMode="numeric" error={shown.hosts} testID="new-design-hosts" />
        </View>
        <View style={styles.number}>
          <TextField label="Cards per host" value={values.cardsPerHost} onChangeText={set('cardsPerHost')} inputMode="numeric" error={shown.cardsPerHost} testID="new-design-cards" />
        </View>
        <View style={styles.number}>
          <TextField label="Ports per card" value={values.portsPerCard} onChangeText={set('portsPerCard')} inputMode="numeric" error={shown.portsPerCard} testID="new-design-ports" />
        </View>
      </View>
      {built.doc ? <DocumentPreview doc={built.doc} title="This pattern starts with" testID="new-design-preview" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  numbers: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  number: { flexGrow: 1, flexBasis: 140 },
});
