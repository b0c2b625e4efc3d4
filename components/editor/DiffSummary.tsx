import { StyleSheet, View } from 'react-native';
import { Text, colors, radius, space } from '@/components/ui';
import { DIFF_SECTIONS, type DiffEntry, type DiffSectionName, type TopologyDiff } from '@/shared/diff';

const SECTION_LABEL: Record<DiffSectionName, string> = { devices: 'Devices', groups: 'Controllers and cards', ports: 'Ports', cables: 'Cables', networks: 'Networks', addresses: 'Addresses' };
const MAX_ROWS = 8;

function show(value: unknown): string {
  return value === null || value === undefined ? '—' : String(value);
}

function entryLine(verb: string, entry: DiffEntry): string {
  if (verb !== 'changed') return `${verb === 'added' ? '+' : '−'} ${entry.name}`;
  const fields = entry.changes.slice(0, 3).map((c) => `${c.field} ${show(c.before)} → ${show(c.after)}`);
  return `~ ${entry.name}: ${fields.join('; ')}${entry.changes.length > 3 ? '; …' : ''}`;
}

/**
 * What differs between two documents, section by section, with the first few entries of each
 * ("+" added, "−" removed, "~" changed) — enough to decide whether to save on top.
 */
export function DiffSummary({ diff, beforeLabel, afterLabel }: { diff: TopologyDiff; beforeLabel: string; afterLabel: string }) {
  if (diff.empty) {
    return (
      <Text variant="small" testID="diff-summary">
        {`No differences in the design between ${beforeLabel} and ${afterLabel}${diff.layoutMoved > 0 ? ` (${diff.layoutMoved} boxes sit elsewhere on the canvas)` : ''}.`}
      </Text>
    );
  }
  return (
    <View style={styles.wrap} testID="diff-summary">
      <Text variant="small">{`Going from ${beforeLabel} to ${afterLabel}: ${diff.counts.total} change${diff.counts.total === 1 ? '' : 's'}.`}</Text>
      {diff.document.map((c) => (
        <Text key={c.field} variant="small">{`~ design ${c.field}: ${show(c.before)} → ${show(c.after)}`}</Text>
      ))}
      {DIFF_SECTIONS.map((name) => {
        const section = diff[name];
        const rows = [...section.added.map((e) => entryLine('added', e)), ...section.removed.map((e) => entryLine('removed', e)), ...section.changed.map((e) => entryLine('changed', e))];
        if (rows.length === 0) return null;
        return (
          <View key={name} style={styles.section}>
            <Text variant="smallStrong">{`${SECTION_LABEL[name]} (${rows.length})`}</Text>
            {rows.slice(0, MAX_ROWS).map((row, i) => (
              <Text key={i} variant="small" style={styles.mono}>
                {row}
              </Text>
            ))}
            {rows.length > MAX_ROWS ? <Text variant="caption" color="inkMuted">{`…and ${rows.length - MAX_ROWS} more`}</Text> : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  section: { gap: 2, padding: space.sm, borderRadius: radius.sm, backgroundColor: colors.surfaceSunken },
  mono: { fontVariant: ['tabular-nums'] },
});
