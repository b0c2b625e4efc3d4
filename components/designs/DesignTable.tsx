import { StyleSheet, View } from 'react-native';
import { Text, colors, radius, space } from '@/components/ui';
import { LinkRow } from '@/components/designs/LinkRow';
import { DesignStatus } from '@/components/designs/DesignStatus';
import { SummaryLine } from '@/components/designs/SummaryLine';
import { designHref } from '@/lib/designs/links';
import { formatDateTime } from '@/lib/format';
import type { DesignListItem } from '@/shared/api/designs';

const COLUMNS = [
  { key: 'name', label: 'Design', flex: 3 },
  { key: 'status', label: 'Status', flex: 1.4 },
  { key: 'version', label: 'Latest version', flex: 1.4 },
  { key: 'summary', label: 'Redundancy and findings', flex: 3 },
  { key: 'updated', label: 'Changed', flex: 1.6 },
] as const;

/** Wide layout: one row per design, each row a link to the design. */
export function DesignTable({ designs }: { designs: readonly DesignListItem[] }) {
  return (
    <View style={styles.table} role="table" aria-label="Designs" testID="designs-table">
      <View style={[styles.row, styles.header]} role="row">
        {COLUMNS.map((c) => (
          <View key={c.key} style={{ flex: c.flex }} role="columnheader">
            <Text variant="smallStrong" color="inkMuted">
              {c.label}
            </Text>
          </View>
        ))}
      </View>
      {designs.map((design) => (
        <LinkRow key={design.id} href={designHref(design.id)} role="row" testID={`design-${design.id}`} style={[styles.row, styles.body]} pressedStyle={styles.pressed}>
            <View style={{ flex: COLUMNS[0].flex }} role="cell">
              <Text variant="bodyStrong" color="primary">
                {design.name}
              </Text>
              {design.site ? (
                <Text variant="small" color="inkMuted">
                  {design.site}
                </Text>
              ) : null}
            </View>
            <View style={{ flex: COLUMNS[1].flex }} role="cell">
              <DesignStatus status={design.status} approvedVersion={design.approvedVersion} latest={design.latestVersion} testID={`design-${design.id}-status`} />
            </View>
            <View style={{ flex: COLUMNS[2].flex }} role="cell" testID={`design-${design.id}-latest`}>
              <Text variant="small">{design.latestVersion ? `Version ${design.latestVersion.number}` : 'No versions yet'}</Text>
            </View>
            <View style={{ flex: COLUMNS[3].flex }} role="cell">
              {design.latestVersion ? <SummaryLine summary={design.latestVersion.summary} /> : <Text variant="small" color="inkMuted">—</Text>}
            </View>
            <View style={{ flex: COLUMNS[4].flex }} role="cell">
              <Text variant="small" color="inkMuted">
                {formatDateTime(design.updatedAt)}
              </Text>
            </View>
        </LinkRow>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
  row: { flexDirection: 'row', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.md, alignItems: 'center' },
  header: { backgroundColor: colors.surfaceSunken },
  body: { borderTopWidth: 1, borderTopColor: colors.line },
  pressed: { backgroundColor: colors.surfaceSunken },
});
