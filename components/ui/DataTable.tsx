import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Text } from '@/components/ui/Text';
import { colors, radius, space } from '@/components/ui/tokens';

export type Column<K extends string> = { key: K; label: string; flex?: number };

type DataTableProps<K extends string> = {
  label: string;
  columns: readonly Column<K>[];
  rows: readonly ({ id: string } & Record<K, string>)[];
  /** Below this width each row becomes a small card of label–value lines (a phone cannot fit columns). */
  stackBelow?: number;
  testID?: string;
};

/** Plain text in rows and columns, announced as a table; stacked on narrow screens. */
export function DataTable<K extends string>({ label, columns, rows, stackBelow = 720, testID }: DataTableProps<K>) {
  const { width } = useWindowDimensions();
  if (width < stackBelow) {
    return (
      <View role="list" aria-label={label} style={styles.stack} testID={testID}>
        {rows.map((row) => (
          <View key={row.id} role="listitem" style={styles.card} testID={testID ? `${testID}-${row.id}` : undefined}>
            {columns.map((c, i) => (
              <View key={c.key} style={styles.pair}>
                <Text variant="caption" color="inkMuted" style={styles.pairLabel}>
                  {c.label}
                </Text>
                <Text variant={i === 0 ? 'smallStrong' : 'small'} style={styles.pairValue}>
                  {row[c.key]}
                </Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    );
  }
  return (
    <View role="table" aria-label={label} style={styles.table} testID={testID}>
      <View role="row" style={[styles.row, styles.header]}>
        {columns.map((c) => (
          <View key={c.key} role="columnheader" style={{ flex: c.flex ?? 1 }}>
            <Text variant="smallStrong" color="inkMuted">
              {c.label}
            </Text>
          </View>
        ))}
      </View>
      {rows.map((row) => (
        <View key={row.id} role="row" style={[styles.row, styles.body]} testID={testID ? `${testID}-${row.id}` : undefined}>
          {columns.map((c) => (
            <View key={c.key} role="cell" style={{ flex: c.flex ?? 1 }}>
              <Text variant="small">{row[c.key]}</Text>
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, overflow: 'hidden' },
  row: { flexDirection: 'row', gap: space.md, paddingHorizontal: space.md, paddingVertical: space.sm },
  header: { backgroundColor: colors.surfaceSunken },
  body: { borderTopWidth: 1, borderTopColor: colors.line },
  stack: { gap: space.sm },
  card: { borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, padding: space.md, gap: 2 },
  pair: { flexDirection: 'row', gap: space.sm },
  pairLabel: { width: 96, paddingTop: 1 },
  pairValue: { flex: 1 },
});
