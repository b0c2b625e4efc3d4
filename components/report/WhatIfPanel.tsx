import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Button, Card, Heading, Text, TextField, colors, radius, space } from '@/components/ui';
import { searchUnits, UNIT_KIND_LABELS, type FailureUnit } from '@/lib/report/units';
import { printHidden } from '@/lib/print';

type WhatIfPanelProps = {
  units: readonly FailureUnit[];
  /** The search field's hint, with examples from the open design. */
  hint: string;
  failed: readonly string[];
  onChange: (failed: string[]) => void;
};

/** Pick units to fail, by searching their names; the report below is recomputed with them failed. */
export function WhatIfPanel({ units, hint, failed, onChange }: WhatIfPanelProps) {
  const [query, setQuery] = useState('');
  const found = useMemo(() => searchUnits(units, query).filter((u) => !failed.includes(u.id)), [units, query, failed]);
  const byId = useMemo(() => new Map(units.map((u) => [u.id, u])), [units]);

  return (
    <Card testID="whatif-panel" {...printHidden()}>
      <Heading level={2}>What if…</Heading>
      <Text variant="small" color="inkMuted">
        Fail cables, cards, switches or controllers and see what is left. Computed in your browser; nothing is saved.
      </Text>
      <TextField
        label="Find a unit to fail"
        hint={hint}
        value={query}
        onChangeText={setQuery}
        autoCapitalize="none"
        inputMode="search"
        testID="whatif-search"
      />
      {query.trim() && found.length === 0 ? (
        <Text variant="small" color="inkMuted" testID="whatif-no-match">
          {`Nothing to fail matches “${query.trim()}”.`}
        </Text>
      ) : null}
      {found.length > 0 ? (
        <View role="list" style={styles.results} testID="whatif-results">
          {found.map((unit) => (
            <Pressable
              key={unit.id}
              role="button"
              aria-label={`Fail ${unit.name}`}
              onPress={() => {
                onChange([...failed, unit.id]);
                setQuery('');
              }}
              style={({ pressed }) => [styles.result, pressed && styles.pressed]}
              testID={`whatif-add-${unit.id}`}
            >
              <Text variant="caption" color="inkMuted" style={styles.kind}>
                {UNIT_KIND_LABELS[unit.kind]}
              </Text>
              <Text variant="small" style={styles.name}>
                {unit.name}
              </Text>
              <Text variant="smallStrong" color="primary">
                Fail
              </Text>
            </Pressable>
          ))}
        </View>
      ) : null}
      {failed.length > 0 ? (
        <View style={styles.picked} testID="whatif-failed">
          <Text variant="smallStrong">{`Failed (${failed.length}):`}</Text>
          {failed.map((id) => (
            <View key={id} style={styles.chip} testID={`whatif-failed-${id}`}>
              <Text variant="small" style={styles.name}>
                {byId.get(id)?.name ?? id}
              </Text>
              <Button label="Bring back" variant="ghost" size="compact" onPress={() => onChange(failed.filter((f) => f !== id))} testID={`whatif-remove-${id}`} />
            </View>
          ))}
          <Button label="Reset: fail nothing" variant="secondary" size="compact" onPress={() => onChange([])} testID="whatif-reset" />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  results: { gap: space.xs },
  result: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 44, paddingHorizontal: space.sm, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.line },
  pressed: { backgroundColor: colors.surfaceSunken },
  kind: { width: 72 },
  name: { flex: 1 },
  picked: { gap: space.xs },
  chip: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingLeft: space.sm, borderRadius: radius.sm, backgroundColor: colors.surfaceSunken },
});
