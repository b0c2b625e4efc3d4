import { memo } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { Text, colors, space } from '@/components/ui';
import { cableHref } from '@/lib/designs/links';
import { endText, placeText, type Sort, type SortKey } from '@/lib/schedule/view';
import { lengthText } from '@/shared/labels/content';
import { MEDIA_NAMES } from '@/shared/rules/cables';
import type { ScheduleRow } from '@/shared/schedule/types';

/** Every table row is this tall (at least a 44 px target), so the list places rows without measuring them. */
export const TABLE_ROW_HEIGHT = 52;

type ColumnKey = 'label' | 'near' | 'nearPlace' | 'far' | 'farPlace' | 'media' | 'length' | 'network';
export const TABLE_COLUMNS: readonly { key: ColumnKey; label: string; flex: number; sort: SortKey | null }[] = [
  { key: 'label', label: 'Label', flex: 1, sort: 'label' },
  { key: 'near', label: 'Near end', flex: 2, sort: 'device' },
  { key: 'nearPlace', label: 'Rack', flex: 0.9, sort: 'rack' },
  { key: 'far', label: 'Far end', flex: 2, sort: null },
  { key: 'farPlace', label: 'Far rack', flex: 0.9, sort: null },
  { key: 'media', label: 'Media', flex: 1.1, sort: 'media' },
  { key: 'length', label: 'Length', flex: 0.8, sort: 'length' },
  { key: 'network', label: 'Network', flex: 1.3, sort: 'network' },
];

function cells(row: ScheduleRow): Record<ColumnKey, string> {
  return {
    label: row.label,
    near: endText(row.a),
    nearPlace: placeText(row.a.rack, row.a.ru),
    far: endText(row.b),
    farPlace: placeText(row.b.rack, row.b.ru),
    media: MEDIA_NAMES[row.media],
    length: lengthText(row.lengthM ?? row.stockLengthM),
    network: row.network === null ? '—' : row.vlan === null ? row.network : `${row.network} (${row.vlan})`,
  };
}

/** The header row: sortable headings are buttons that say their order (aria-sort on the web). */
export function ScheduleTableHeader({ sort, onSort }: { sort: Sort; onSort: (key: SortKey) => void }) {
  return (
    <View role="row" style={[styles.row, styles.header]} testID="schedule-table-header">
      {TABLE_COLUMNS.map((column) => {
        const active = column.sort !== null && sort.key === column.sort;
        const order = active ? (sort.direction === 'asc' ? 'ascending' : 'descending') : 'none';
        return (
          <View key={column.key} role="columnheader" aria-sort={order} style={{ flex: column.flex }}>
            {column.sort === null ? (
              <Text variant="smallStrong" color="inkMuted">
                {column.label}
              </Text>
            ) : (
              <Pressable
                role="button"
                aria-label={`Sort by ${column.label.toLowerCase()}${active ? `, now ${order}` : ''}`}
                onPress={() => onSort(column.sort!)}
                style={styles.sortButton}
                testID={`schedule-sort-${column.sort}`}
              >
                <Text variant="smallStrong" color={active ? 'primary' : 'inkMuted'} style={active ? styles.underline : undefined}>
                  {column.label}
                </Text>
                {active ? <Text variant="smallStrong" color="primary">{sort.direction === 'asc' ? '▲' : '▼'}</Text> : null}
              </Pressable>
            )}
          </View>
        );
      })}
      <View style={styles.chevron} />
    </View>
  );
}

export const ScheduleTableRow = memo(function ScheduleTableRow({ row, id, n }: { row: ScheduleRow; id: number; n: number }) {
  const router = useRouter();
  const values = cells(row);
  return (
    <Pressable role="link" onPress={() => router.push(cableHref(id, n, row.id))} aria-label={`${row.label}: ${values.near} to ${values.far}`} style={ROW_STYLE} testID={`schedule-row-${row.id}`}>
      {TABLE_COLUMNS.map((column) => (
        <View key={column.key} style={{ flex: column.flex }}>
          <Text variant={column.key === 'label' ? 'smallStrong' : 'small'} numberOfLines={1}>
            {values[column.key]}
          </Text>
        </View>
      ))}
      <Text variant="bodyStrong" color="inkMuted" style={styles.chevron} aria-hidden>
        ›
      </Text>
    </Pressable>
  );
});

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingHorizontal: space.md },
  header: { minHeight: TABLE_ROW_HEIGHT, backgroundColor: colors.surfaceSunken, borderBottomWidth: 1, borderBottomColor: colors.line },
  body: { height: TABLE_ROW_HEIGHT, backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.line },
  sortButton: { minHeight: 44, flexDirection: 'row', alignItems: 'center', gap: 4 },
  underline: { textDecorationLine: 'underline' },
  chevron: { width: 18 },
});

/** One style object for every row, flattened once. */
const ROW_STYLE = StyleSheet.flatten([styles.row, styles.body]);
