import { useState } from 'react';
import { Image, Pressable, StyleSheet, View } from 'react-native';
import { Badge, Banner, Button, Heading, Icon, Text, TextField, colors, radius, space, TAP_TARGET } from '@/components/ui';
import { PhotoPicker, type PickedPhoto } from '@/components/build/PhotoPicker';
import { QueueState } from '@/components/build/QueueState';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { buildQueue, photoUrl, useBuildHistory, useBuildQueue, useOnline, useShownBuild, useUploadPhoto } from '@/lib/api/build';
import { useMe } from '@/lib/api/auth';
import { useScheduleRow } from '@/lib/api/schedule';
import { undoMark } from '@/lib/build/pending';
import type { BuildQueue, QueuedMark } from '@/lib/build/queue';
import { useMarking } from '@/lib/build/use-marking';
import { STATE_LABELS, STATE_TONES } from '@/lib/build/words';
import { formatDateTime } from '@/lib/format';
import { PHOTO_MAX_BYTES, type CableState, type HistoryEntry } from '@/shared/api/build';
import { ownValue } from '@/shared/keys/record';

type CableMarksProps = {
  designId: number;
  version: number;
  cableId: string;
  /** The cable's printed label, for sentences ("A01-07 marked run"); the id when absent. */
  label?: string;
  queue?: BuildQueue;
};

type CableHistoryEntry = Extract<HistoryEntry, { kind: 'cable' }>;
type Line = { key: string; state: CableState; note: string | null; by: string; at: string; waiting: 'waiting' | 'refused' | null };

const ONE_TAP: readonly { state: Exclude<CableState, 'not-started' | 'problem'>; label: string }[] = [
  { state: 'run', label: 'Run' },
  { state: 'tested', label: 'Tested' },
];

const megabytes = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/**
 * The installer's check-off of one cable (issue 11): run, tested or problem in one tap (a problem
 * asks what is wrong), undo the last mark (a new mark, or taking back a mark still waiting on this
 * phone), the history with names and times, and photos from the camera or files with thumbnails.
 * Every mark goes through the phone's queue, so it is kept without signal and shown as waiting.
 */
export function CableMarks({ designId, version, cableId, label, queue = buildQueue }: CableMarksProps) {
  const me = useMe().data;
  const { shown, query } = useShownBuild(designId, version, queue);
  const history = useBuildHistory(designId, version);
  const marking = useMarking(designId, version, shown, queue);
  const upload = useUploadPhoto(designId, version);
  const online = useOnline();
  const items = useBuildQueue((s) => s.items, queue);
  const [problem, setProblem] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: 'error' | 'info'; text: string } | null>(null);
  const { row } = useScheduleRow(designId, version, cableId);
  const name = label ?? row?.label ?? cableId;

  const queued = items.filter((i): i is QueuedMark => i.kind === 'mark' && i.designId === designId && i.version === version && i.fields.cableId === cableId && i.userId === me?.id);
  const marks = (history.data ?? []).filter((m): m is CableHistoryEntry => m.kind === 'cable' && m.cableId === cableId);
  const status = shown ? ownValue(shown.cables, cableId) : undefined;
  // Hooks above, answers below: nothing is drawn from a record that has not arrived.
  const photos = shown ? (ownValue(shown.photos.cables, cableId) ?? []) : [];

  if (!shown) {
    return (
      <View style={styles.wrap} testID="cable-marks">
        <QueryStatus query={query} what="The build record" />
      </View>
    );
  }
  if (!status) {
    return (
      <Banner tone="error" title="Not in this version" testID="cable-marks-missing">
        {`This version has no cable ${name}.`}
      </Banner>
    );
  }

  const mark = (state: CableState, note?: string) => {
    const refused = marking.markCable({ cableId, state, ...(note ? { note } : {}) });
    setMessage(refused ? { tone: 'error', text: refused } : null);
    return refused;
  };

  const undo = () => {
    const last = queued[queued.length - 1];
    if (last) {
      if (!marking.discard(last)) setMessage({ tone: 'info', text: 'That mark is being sent right now; undo it again in a moment.' });
      else setMessage({ tone: 'info', text: `The ${STATE_LABELS[last.fields.state].toLowerCase()} mark was taken back before it was sent.` });
      return;
    }
    const back = undoMark(marks, cableId);
    if (!back) return;
    const refused = mark(back.state, back.note);
    if (!refused) setMessage({ tone: 'info', text: `Back to ${STATE_LABELS[back.state].toLowerCase()}; both marks stay in the history.` });
  };

  const addPhoto = (photo: PickedPhoto) => {
    if (photo.size > PHOTO_MAX_BYTES) {
      setMessage({ tone: 'error', text: `That photo is ${megabytes(photo.size)}; a photo can be at most ${megabytes(PHOTO_MAX_BYTES)}.` });
      return;
    }
    setMessage(null);
    upload.mutate({ file: photo.file, fileName: photo.name, cableId }, { onError: (error) => setMessage({ tone: 'error', text: error.message }) });
  };

  const lines: Line[] = [
    ...[...queued].reverse().map((q) => ({ key: q.clientId, state: q.fields.state, note: q.fields.note?.trim() || null, by: me?.name ?? 'You', at: q.queuedAt, waiting: q.status === 'refused' ? ('refused' as const) : ('waiting' as const) })),
    ...[...marks].reverse().map((m) => ({ key: String(m.id), state: m.state, note: m.note, by: m.by.name, at: m.at, waiting: null })),
  ];
  const state = status?.state ?? 'not-started';
  const canUndo = marking.canMark && (queued.length > 0 || marks.length > 0);

  return (
    <View style={styles.wrap} testID="cable-marks">
      <Heading level={2}>{`On site: ${name}`}</Heading>
      <View style={styles.current}>
        <Text variant="smallStrong">Now</Text>
        <Badge label={STATE_LABELS[state]} tone={STATE_TONES[state]} testID="cable-marks-state" />
        {status?.pending ? <Badge label={status.pending === 'refused' ? 'Not sent' : 'Waiting to send'} tone="warning" testID="cable-marks-waiting" /> : null}
      </View>
      {status?.by && status.at ? <Text variant="small" color="inkMuted">{`${status.by.name}, ${formatDateTime(status.at)}`}</Text> : null}
      {status?.note ? <Text variant="small">{`Note: ${status.note}`}</Text> : null}
      {marking.why ? <Banner tone="info">{marking.why}</Banner> : null}

      {marking.canMark ? (
        <>
          <View style={styles.buttons}>
            {ONE_TAP.map((option) => (
              <StateButton key={option.state} label={option.label} active={state === option.state} onPress={() => mark(option.state)} testID={`cable-mark-${option.state}`} />
            ))}
            <StateButton label="Problem" active={state === 'problem'} danger onPress={() => setProblem(problem === null ? '' : null)} testID="cable-mark-problem" />
          </View>
          {problem !== null ? (
            <View style={styles.problem}>
              <TextField label="What is wrong?" hint="A problem needs a note, so the next person knows what to fix." value={problem} onChangeText={setProblem} multiline testID="cable-problem-note" />
              <View style={styles.row}>
                <Button
                  label="Save problem"
                  variant="danger"
                  onPress={() => {
                    if (!mark('problem', problem.trim() || undefined)) setProblem(null);
                  }}
                  testID="cable-problem-save"
                />
                <Button label="Cancel" variant="ghost" onPress={() => setProblem(null)} />
              </View>
            </View>
          ) : null}
          <Button label="Undo the last mark" variant="secondary" fullWidth icon={<Icon name="undo" size={20} color="primary" />} disabled={!canUndo} onPress={undo} testID="cable-mark-undo" />
        </>
      ) : null}
      {message ? (
        <Text variant="smallStrong" color={message.tone === 'error' ? 'dangerText' : 'ink'} role={message.tone === 'error' ? 'alert' : 'status'} testID="cable-marks-message">
          {message.text}
        </Text>
      ) : null}
      <QueueState designId={designId} version={version} queue={queue} />

      <Heading level={3}>Photos</Heading>
      {photos.length > 0 ? (
        <View style={styles.thumbs} testID="cable-photos">
          {photos.map((photo, index) => (
            <Pressable key={photo.id} role="link" aria-label={`Photo ${index + 1} by ${photo.by.name}, ${formatDateTime(photo.at)}`} onPress={() => openPhoto(photo.id)} style={styles.thumb} testID={`cable-photo-${index}`}>
              <Image source={{ uri: photoUrl(photo.id) }} style={styles.thumbImage} accessibilityIgnoresInvertColors />
            </Pressable>
          ))}
        </View>
      ) : (
        <Text variant="small" color="inkMuted" testID="cable-photos-none">
          No photos of this cable yet.
        </Text>
      )}
      {marking.canMark ? (
        <>
          {!online ? <Text variant="small">Photos need a connection; marks do not.</Text> : null}
          <PhotoPicker onPicked={addPhoto} disabled={upload.isPending || !online} testID="cable-photo-add" />
          {upload.isPending ? <Text variant="small">Sending the photo…</Text> : null}
        </>
      ) : null}

      <Heading level={3}>History</Heading>
      <QueryStatus query={history} what="The history" />
      {history.data && lines.length === 0 ? (
        <Text variant="small" color="inkMuted">
          No marks yet.
        </Text>
      ) : null}
      <View style={styles.history} testID="cable-history">
        {lines.map((line, index) => (
          <View key={line.key} style={styles.line} testID={`cable-history-${index}`}>
            <View style={styles.row}>
              <Badge label={STATE_LABELS[line.state]} tone={STATE_TONES[line.state]} />
              {line.waiting ? <Badge label={line.waiting === 'refused' ? 'Not sent' : 'Waiting to send'} tone="warning" /> : null}
            </View>
            <Text variant="small">{`${line.by}, ${formatDateTime(line.at)}`}</Text>
            {line.note ? <Text variant="small">{line.note}</Text> : null}
          </View>
        ))}
      </View>
    </View>
  );
}

/** Photos open full size in a new tab on the web; the route is the team's only (docs/api.md). */
function openPhoto(photoId: string) {
  const open = (globalThis as { open?: (url: string, target: string) => unknown }).open;
  if (typeof open === 'function') open(photoUrl(photoId), '_blank');
}

function StateButton({ label, active, danger = false, onPress, testID }: { label: string; active: boolean; danger?: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="button"
      accessibilityRole="button"
      aria-pressed={active}
      accessibilityState={{ selected: active }}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [styles.stateButton, active && (danger ? styles.stateDanger : styles.stateActive), pressed && styles.statePressed]}
    >
      {active ? <Icon name="tick" size={20} color="onPrimary" /> : null}
      <Text variant="heading" color={active ? 'onPrimary' : danger ? 'dangerText' : 'primary'}>
        {label}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  current: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  buttons: { flexDirection: 'row', gap: space.sm },
  stateButton: {
    flex: 1,
    minHeight: TAP_TARGET + 16,
    minWidth: TAP_TARGET,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.xs,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
  },
  stateActive: { backgroundColor: colors.primary, borderColor: colors.primary },
  stateDanger: { backgroundColor: colors.danger, borderColor: colors.danger },
  statePressed: { opacity: 0.85 },
  problem: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'center' },
  thumbs: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  thumb: { width: 88, height: 88, borderRadius: radius.md, overflow: 'hidden', borderWidth: 1, borderColor: colors.lineStrong },
  thumbImage: { width: '100%', height: '100%' },
  history: { gap: space.sm },
  line: { gap: 2, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
});
