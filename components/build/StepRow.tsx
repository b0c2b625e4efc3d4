import { memo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Button, Icon, Text, TextField, colors, radius, space, TAP_TARGET } from '@/components/ui';
import type { ShownStep } from '@/lib/build/pending';
import { formatDateTime } from '@/lib/format';
import type { Step } from '@/shared/build/steps';

type StepRowProps = {
  step: Step;
  status: ShownStep | undefined;
  index: number;
  canMark: boolean;
  onMark: (done: boolean, note: string | undefined) => string | null;
};

/** One bring-up step: what to do with the design's values, the planned session count where there is one, and a big tick. */
export const StepRow = memo(function StepRow({ step, status, index, canMark, onMark }: StepRowProps) {
  const [editing, setEditing] = useState(false);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const done = status?.done ?? false;
  const testID = `step-${step.kind}-${index}`;
  // Caution rows sit on warningSoft: their text is warningText, the pair tokens.ts holds to 4.5:1.
  const ink = step.caution ? 'warningText' : 'ink';
  const muted = step.caution ? 'warningText' : 'inkMuted';

  const toggle = () => {
    const problem = onMark(!done, status?.note ?? undefined);
    setError(problem);
  };
  const saveNote = () => {
    const problem = onMark(done, note.trim() || undefined);
    setError(problem);
    if (!problem) setEditing(false);
  };

  return (
    <View style={[styles.row, step.caution && styles.caution, done && styles.done]} testID={testID}>
      <View style={styles.head}>
        {step.caution ? <Icon name="warning" size={22} color="warningText" /> : null}
        <Text variant="bodyStrong" style={styles.title} color={ink} testID={`${testID}-title`}>
          {step.title}
        </Text>
      </View>
      <Text variant="body" color={ink}>
        {step.detail}
      </Text>
      {step.expectedSessions !== null ? (
        <View style={styles.sessions}>
          <Text variant="smallStrong" color="primary">
            Planned sessions
          </Text>
          <Text variant="title" color="primary" testID={`${testID}-sessions`}>
            {String(step.expectedSessions)}
          </Text>
        </View>
      ) : null}
      <Text variant="caption" color={muted}>{`Source: ${step.source}`}</Text>
      <Pressable
        role="checkbox"
        accessibilityRole="checkbox"
        aria-checked={done}
        accessibilityState={{ checked: done, disabled: !canMark }}
        aria-label={`${step.title}: done`}
        disabled={!canMark}
        onPress={toggle}
        testID={`${testID}-done`}
        style={({ pressed }) => [styles.tick, pressed && styles.tickPressed, !canMark && styles.inactive]}
      >
        <View style={[styles.box, done && styles.boxOn]}>{done ? <Icon name="tick" size={22} color="onPrimary" /> : null}</View>
        <Text variant="bodyStrong">{done ? (step.caution ? 'Read and understood' : 'Done') : step.caution ? 'Mark as read' : 'Mark done'}</Text>
      </Pressable>
      {status?.by && status.at ? (
        <Text variant="small" color={muted} testID={`${testID}-by`}>
          {`${status.done ? 'Done' : 'Reopened'} by ${status.by.name}, ${formatDateTime(status.at)}${status.pending === 'waiting' ? ' · waiting to send' : status.pending === 'refused' ? ' · not sent' : ''}`}
        </Text>
      ) : null}
      {status?.note ? <Text variant="small" color={ink}>{`Note: ${status.note}`}</Text> : null}
      {error ? (
        <Text variant="smallStrong" color={step.caution ? 'warningText' : 'dangerText'} role="alert">
          {error}
        </Text>
      ) : null}
      {canMark && editing ? (
        <View style={styles.noteBox}>
          <TextField label="Note" value={note} onChangeText={setNote} multiline testID={`${testID}-note`} />
          <View style={styles.actions}>
            <Button label="Save note" onPress={saveNote} testID={`${testID}-note-save`} />
            <Button label="Cancel" variant="ghost" onPress={() => setEditing(false)} />
          </View>
        </View>
      ) : canMark ? (
        <Button
          label={status?.note ? 'Change note' : 'Add a note'}
          variant="ghost"
          size="compact"
          onPress={() => {
            setNote(status?.note ?? '');
            setEditing(true);
          }}
          testID={`${testID}-note-open`}
        />
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  row: { gap: space.sm, padding: space.lg, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line },
  caution: { backgroundColor: colors.warningSoft, borderColor: colors.warningText },
  done: { borderColor: colors.successText },
  head: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  title: { flex: 1 },
  sessions: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.sm, backgroundColor: colors.primarySoft, borderRadius: radius.md, alignSelf: 'flex-start' },
  tick: { minHeight: TAP_TARGET + 8, flexDirection: 'row', alignItems: 'center', gap: space.md, paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.lineStrong, backgroundColor: colors.surface },
  tickPressed: { backgroundColor: colors.surfaceSunken },
  inactive: { opacity: 0.6 },
  box: { width: 30, height: 30, borderRadius: radius.sm, borderWidth: 2, borderColor: colors.lineStrong, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.surface },
  boxOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  noteBox: { gap: space.sm },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
