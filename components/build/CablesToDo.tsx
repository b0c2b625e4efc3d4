import { useCallback, useMemo, useState } from 'react';
import { FlatList, Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Badge, Button, Heading, Icon, SegmentedPicker, Text, colors, radius, space, CONTENT_MAX_WIDTH, TAP_TARGET } from '@/components/ui';
import { QueueState } from '@/components/build/QueueState';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useShownBuild } from '@/lib/api/build';
import { useCableSchedule } from '@/lib/api/schedule';
import { useDesign } from '@/lib/api/designs';
import { checklistHref } from '@/lib/build/links';
import { cableHref } from '@/lib/designs/links';
import type { ShownCable } from '@/lib/build/pending';
import { plural, STATE_LABELS, STATE_TONES } from '@/lib/build/words';
import { DONE_STATE } from '@/shared/api/build';
import { ownValue } from '@/shared/keys/record';
import type { ScheduleEnd, ScheduleRow } from '@/shared/schedule/types';

type Filter = 'open' | 'all';
/** A rack chosen by its place in the progress list; "any" is every rack. */
type RackChoice = 'any' | `${number}`;

const ROW_HEIGHT = 112;

function endText(end: ScheduleEnd): string {
  return [end.device, end.part, end.port].filter(Boolean).join(' · ') + (end.rack ? ` (${end.rack}${end.ru !== null ? `-${end.ru}` : ''})` : '');
}

/**
 * The cables still to do on site, by rack: "not done yet" (anything not tested) by default, every
 * cable on request. Each row opens the cable's own page, the one its label's QR code leads to.
 */
export function CablesToDo({ id, n, rackId = null }: { id: number; n: number; rackId?: string | null }) {
  const design = useDesign(id);
  // The schedule screen's own cached answer: a cable opened from here (or offline) needs no new request.
  const schedule = useCableSchedule(id, n);
  const cables = { ...schedule, data: schedule.data?.cables };
  const { shown, query } = useShownBuild(id, n);
  const [filter, setFilter] = useState<Filter>('open');
  const racks = useMemo(() => shown?.progress.racks ?? [], [shown]);
  const initialRack = rackId === null ? -1 : racks.findIndex((r) => r.rackId === rackId);
  const [rackChoice, setRackChoice] = useState<RackChoice | null>(null);
  const chosen: RackChoice = rackChoice ?? (initialRack >= 0 ? (String(initialRack) as RackChoice) : 'any');
  const rack = chosen === 'any' ? null : (racks[Number(chosen)] ?? null);

  const rows = useMemo(() => {
    const list = cables.data ?? [];
    return list.filter((row) => {
      const status = shown ? ownValue(shown.cables, row.id) : undefined;
      if (filter === 'open' && status?.state === DONE_STATE) return false;
      if (!rack) return true;
      // Rows name their racks; the progress list names them the same way (displayName).
      if (rack.rack === null) return row.a.rack === null || row.b.rack === null;
      return row.a.rack === rack.rack || row.b.rack === rack.rack;
    });
  }, [cables.data, shown, filter, rack]);

  const renderItem = useCallback(
    ({ item, index }: { item: ScheduleRow; index: number }) => (
      <CableLine row={item} status={shown ? ownValue(shown.cables, item.id) : undefined} href={cableHref(id, n, item.id)} index={index} />
    ),
    [shown, id, n],
  );

  const header = (
    <View style={styles.header}>
      <Link href={checklistHref(id, n)} asChild>
        <Button label="Checklist" variant="ghost" size="compact" testID="todo-back" />
      </Link>
      <Heading level={1}>{`Cables to do: ${design.data?.design.name ?? 'design'}, version ${n}`}</Heading>
      <QueryStatus query={query} what="The build record" />
      <QueryStatus query={cables} what="The cables" testID="todo-error" />
      <QueueState designId={id} version={n} />
      <SegmentedPicker<Filter>
        label="Show"
        options={[
          { value: 'open', label: 'Not done yet' },
          { value: 'all', label: 'Every cable' },
        ]}
        value={filter}
        onChange={setFilter}
        testID="todo-filter"
      />
      {racks.length > 0 ? (
        <SegmentedPicker<RackChoice>
          label="Rack"
          options={[{ value: 'any', label: 'Every rack' }, ...racks.map((r, i) => ({ value: String(i) as RackChoice, label: r.rack ?? 'Not in a rack' }))]}
          value={chosen}
          onChange={setRackChoice}
          testID="todo-rack"
        />
      ) : null}
      {cables.data ? (
        <Text variant="small" color="inkMuted" testID="todo-count" aria-live="polite">
          {`${plural(rows.length, 'cable')}${filter === 'open' ? ' not tested yet' : ''}${rack ? ` in ${rack.rack ?? 'no rack'}` : ''}`}
        </Text>
      ) : null}
    </View>
  );

  return (
    <FlatList
      testID="todo-screen"
      style={styles.list}
      contentContainerStyle={styles.content}
      data={rows}
      keyExtractor={(row) => row.id}
      renderItem={renderItem}
      ListHeaderComponent={header}
      ListEmptyComponent={cables.data ? <Text testID="todo-empty">{filter === 'open' ? 'Every cable here is tested.' : 'No cables here.'}</Text> : null}
      getItemLayout={(_, index) => ({ length: ROW_HEIGHT + space.sm, offset: (ROW_HEIGHT + space.sm) * index, index })}
      initialNumToRender={10}
      windowSize={7}
    />
  );
}

function CableLine({ row, status, href, index }: { row: ScheduleRow; status: ShownCable | undefined; href: ReturnType<typeof cableHref>; index: number }) {
  const state = status?.state ?? 'not-started';
  return (
    <Link href={href} asChild>
      <Pressable style={styles.row} testID={`todo-row-${index}`} role="link" aria-label={`Cable ${row.label}, ${STATE_LABELS[state]}`}>
        <View style={styles.rowHead}>
          <Text variant="heading" numberOfLines={1} style={styles.label}>
            {row.label}
          </Text>
          <Badge label={status?.pending === 'waiting' ? `${STATE_LABELS[state]} · waiting` : STATE_LABELS[state]} tone={STATE_TONES[state]} />
          <Icon name="chevron" size={20} color="inkMuted" />
        </View>
        <Text variant="small" numberOfLines={1}>{`From ${endText(row.a)}`}</Text>
        <Text variant="small" numberOfLines={1}>{`To ${endText(row.b)}`}</Text>
        <Text variant="caption" color="inkMuted" numberOfLines={1}>
          {[row.identifier, row.media, row.stockLengthM !== null ? `${row.stockLengthM} m` : null].filter(Boolean).join(' · ')}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  list: { flex: 1, backgroundColor: colors.paper },
  content: { paddingHorizontal: space.lg, paddingTop: space.lg, paddingBottom: space.xxxl, width: '100%', maxWidth: CONTENT_MAX_WIDTH, alignSelf: 'center' },
  header: { gap: space.md, marginBottom: space.md },
  row: {
    height: ROW_HEIGHT,
    minHeight: TAP_TARGET,
    marginBottom: space.sm,
    padding: space.md,
    gap: 2,
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    overflow: 'hidden',
  },
  rowHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { flex: 1 },
});
