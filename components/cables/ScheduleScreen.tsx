import { useCallback, useDeferredValue, useMemo, useState } from 'react';
import { FlatList, StyleSheet, useWindowDimensions, View, type ListRenderItemInfo } from 'react-native';
import { Link } from 'expo-router';
import { Button, Heading, Icon, Text, TextField, WIDE_BREAKPOINT, colors, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { ExportButtons } from '@/components/cables/ExportButtons';
import { FilterChips } from '@/components/cables/FilterChips';
import { CARD_GAP, CARD_ITEM, ScheduleCard } from '@/components/cables/ScheduleCard';
import { ScheduleTableHeader, ScheduleTableRow, TABLE_ROW_HEIGHT } from '@/components/cables/ScheduleTable';
import { useDesign } from '@/lib/api/designs';
import { useCableSchedule } from '@/lib/api/schedule';
import { labelSheetHref, versionHref } from '@/lib/designs/links';
import {
  filterChoices,
  indexRows,
  NO_FILTERS,
  NO_NETWORK,
  SCHEDULE_ORDER,
  visibleRows,
  type IndexedRow,
  type ScheduleFilters,
  type Sort,
  type SortKey,
} from '@/lib/schedule/view';
import { MEDIA_NAMES } from '@/shared/rules/cables';
import type { Media } from '@/shared/topology/schema';

/**
 * A version's cable schedule for everyone who may read the version. Phone: cards in big type and
 * one search box (label, device, port; every keystroke narrows the list). Wide: a table sortable by
 * its headings and filtered by rack, device, network (fabric) and media. Both are virtualised lists
 * of fixed-height rows, so 10,000 cables scroll without laying out more than a screenful.
 */
export function ScheduleScreen({ id, n }: { id: number; n: number }) {
  const schedule = useCableSchedule(id, n);
  const design = useDesign(id);
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_BREAKPOINT;
  const [query, setQuery] = useState('');
  const [filters, setFilters] = useState<ScheduleFilters>(NO_FILTERS);
  const [sort, setSort] = useState<Sort>(SCHEDULE_ORDER);
  const deferredQuery = useDeferredValue(query);
  const rows = schedule.data?.cables;
  const indexed = useMemo(() => (rows ? indexRows(rows) : []), [rows]);
  const choices = useMemo(() => (rows ? filterChoices(rows) : null), [rows]);
  // The phone has no filters or sorting on screen, so none apply there.
  const shownFilters = wide ? filters : NO_FILTERS;
  const shownSort = wide ? sort : SCHEDULE_ORDER;
  const visible = useMemo(() => visibleRows(indexed, deferredQuery, shownFilters, shownSort), [indexed, deferredQuery, shownFilters, shownSort]);
  const name = design.data?.design.name ?? 'Design';

  const onSort = useCallback(
    (key: SortKey) => setSort((now) => (now.key === key ? { key, direction: now.direction === 'asc' ? 'desc' : 'asc' } : { key, direction: 'asc' })),
    [],
  );
  const renderCard = useCallback(
    ({ item }: ListRenderItemInfo<IndexedRow>) => (
      <View style={styles.cardSlot}>
        <ScheduleCard row={item.row} id={id} n={n} />
      </View>
    ),
    [id, n],
  );
  const renderRow = useCallback(({ item }: ListRenderItemInfo<IndexedRow>) => <ScheduleTableRow row={item.row} id={id} n={n} />, [id, n]);
  const itemHeight = wide ? TABLE_ROW_HEIGHT : CARD_ITEM;
  const getItemLayout = useCallback((_: unknown, index: number) => ({ length: itemHeight, offset: itemHeight * index, index }), [itemHeight]);

  const total = rows?.length ?? 0;
  const filtered = deferredQuery.trim() !== '' || shownFilters !== NO_FILTERS;

  return (
    <View style={styles.screen} testID="schedule-screen">
      <View style={[styles.column, styles.top]}>
        <View style={styles.links}>
          <Link href={versionHref(id, n)} asChild>
            <Button label={`Version ${n}`} variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} testID="schedule-back" />
          </Link>
          <Link href={labelSheetHref(id, n)} asChild>
            <Button label="Label sheet" variant="secondary" size="compact" icon={<Icon name="print" size={18} color="primary" />} testID="schedule-labels" />
          </Link>
        </View>
        <Heading level={1}>{`Cable schedule: ${name}, version ${n}`}</Heading>
        <ExportButtons id={id} n={n} designName={name} />
        <QueryStatus query={schedule} what="The cable schedule" testID="schedule-error" />
        {rows ? (
          <>
            <View style={wide ? styles.searchRow : undefined}>
              <View style={wide ? styles.searchWide : undefined}>
                <TextField
                  label="Find a cable"
                  hint="By label, device or port, e.g. HR-A-07, vault-1 or p12"
                  value={query}
                  onChangeText={setQuery}
                  autoCapitalize="none"
                  autoCorrect={false}
                  inputMode="search"
                  enterKeyHint="search"
                  testID="schedule-search"
                />
              </View>
              {wide ? (
                <View style={styles.deviceFilter}>
                  <TextField
                    label="Device"
                    hint="Either end"
                    value={filters.device}
                    onChangeText={(device) => setFilters((f) => ({ ...f, device }))}
                    autoCapitalize="none"
                    autoCorrect={false}
                    testID="schedule-filter-device"
                  />
                </View>
              ) : null}
            </View>
            {wide && choices ? (
              <View style={styles.filters} testID="schedule-filters">
                <FilterChips
                  label="Rack"
                  choices={choices.racks.map((rack) => ({ value: rack, label: rack }))}
                  value={filters.rack}
                  onChange={(rack) => setFilters((f) => ({ ...f, rack }))}
                  testID="schedule-filter-rack"
                />
                <FilterChips
                  label="Network"
                  choices={choices.networks.map((network) => ({ value: network, label: network === NO_NETWORK ? 'between switches' : network }))}
                  value={filters.network}
                  onChange={(network) => setFilters((f) => ({ ...f, network }))}
                  testID="schedule-filter-network"
                />
                <FilterChips<Media>
                  label="Media"
                  choices={choices.media.map((media) => ({ value: media, label: MEDIA_NAMES[media] }))}
                  value={filters.media}
                  onChange={(media) => setFilters((f) => ({ ...f, media }))}
                  testID="schedule-filter-media"
                />
              </View>
            ) : null}
            <Text variant="small" color="inkMuted" aria-live="polite" testID="schedule-count">
              {filtered ? `${visible.length} of ${total} cables` : `${total} cables`}
            </Text>
          </>
        ) : null}
      </View>
      {rows ? (
        <View style={[styles.column, styles.listArea]}>
          {wide ? <ScheduleTableHeader sort={sort} onSort={onSort} /> : null}
          <FlatList
            data={visible}
            keyExtractor={(item) => item.row.id}
            renderItem={wide ? renderRow : renderCard}
            getItemLayout={getItemLayout}
            initialNumToRender={wide ? 24 : 8}
            maxToRenderPerBatch={wide ? 24 : 10}
            windowSize={7}
            style={wide ? styles.table : undefined}
            contentContainerStyle={wide ? undefined : styles.cards}
            keyboardShouldPersistTaps="handled"
            role="list"
            aria-label="Cables"
            testID="schedule-list"
            ListEmptyComponent={
              <Text color="inkMuted" style={styles.empty} testID="schedule-empty">
                {total === 0 ? 'This version has no cables yet.' : 'No cable matches. Try part of a label, a device name or a port.'}
              </Text>
            }
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  screen: { flex: 1, backgroundColor: colors.paper },
  column: { width: '100%', maxWidth: 1280, alignSelf: 'center', paddingHorizontal: space.lg },
  top: { paddingTop: space.lg, paddingBottom: space.sm, gap: space.sm },
  links: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  searchRow: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-end' },
  searchWide: { flex: 2, maxWidth: 520 },
  filters: { gap: space.xs },
  deviceFilter: { flex: 1, maxWidth: 320 },
  listArea: { flex: 1, minHeight: 0, paddingBottom: space.lg },
  table: { flex: 1, borderWidth: 1, borderColor: colors.line, borderTopWidth: 0, backgroundColor: colors.surface },
  cards: { paddingBottom: space.xl },
  cardSlot: { height: CARD_ITEM, paddingBottom: CARD_GAP },
  empty: { padding: space.lg },
});
