import { StyleSheet, View } from 'react-native';
import { Badge, Card, Heading, Text, space, type BadgeTone } from '@/components/ui';
import { changeText, countsText, SECTION_TITLES } from '@/lib/designs/diff-words';
import type { DiffEntry, DiffSection, DiffSectionName } from '@/shared/diff';

type Kind = 'added' | 'removed' | 'changed';
const KINDS: readonly Kind[] = ['added', 'removed', 'changed'];
const KIND_LOOK: Record<Kind, { label: string; tone: BadgeTone }> = {
  added: { label: 'Added', tone: 'success' },
  removed: { label: 'Removed', tone: 'danger' },
  changed: { label: 'Changed', tone: 'info' },
};

/** One section of a diff: every added, removed and changed thing, each with its fields. */
export function DiffSectionView({ name, section }: { name: DiffSectionName; section: DiffSection }) {
  const counts = { added: section.added.length, removed: section.removed.length, changed: section.changed.length };
  if (counts.added + counts.removed + counts.changed === 0) return null;
  return (
    <Card testID={`diff-${name}`}>
      <View style={styles.head}>
        <Heading level={2}>{SECTION_TITLES[name]}</Heading>
        <Text variant="small" color="inkMuted">
          {countsText(counts)}
        </Text>
      </View>
      {KINDS.flatMap((kind) => section[kind].map((entry) => <EntryRow key={`${kind}-${entry.id}`} entry={entry} kind={kind} testID={`diff-${name}-${kind}-${entry.id}`} />))}
    </Card>
  );
}

function EntryRow({ entry, kind, testID }: { entry: DiffEntry; kind: Kind; testID: string }) {
  const look = KIND_LOOK[kind];
  return (
    <View style={styles.entry} testID={testID}>
      <View style={styles.entryHead}>
        <Badge label={look.label} tone={look.tone} />
        <Text variant="smallStrong" style={styles.name}>
          {entry.name}
        </Text>
      </View>
      {entry.changes.map((change) => (
        <Text key={change.field} variant="small" color="inkMuted" style={styles.change}>
          {changeText(change, kind)}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  head: { gap: 2 },
  entry: { gap: 2 },
  entryHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  name: { flexShrink: 1 },
  change: { paddingLeft: space.md },
});
