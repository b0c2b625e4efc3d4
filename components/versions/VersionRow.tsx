import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Checkbox, Text, colors, radius, space } from '@/components/ui';
import { StatusBadge } from '@/components/designs/StatusBadge';
import { SummaryLine } from '@/components/designs/SummaryLine';
import { formatDateTime } from '@/lib/format';
import type { VersionSummary } from '@/shared/api/designs';

type VersionRowProps = {
  version: VersionSummary;
  selected: boolean;
  onSelect: () => void;
  comparing: boolean;
  /** Absent when there is nothing to compare with (a single version). */
  onCompare?: (on: boolean) => void;
  /** On a phone the selected version's details open right under its row. */
  children?: ReactNode;
};

/** One version in the list: number, message, author, time, summary and review state. */
export function VersionRow({ version, selected, onSelect, comparing, onCompare, children }: VersionRowProps) {
  const tid = `version-${version.number}`;
  return (
    <View role="listitem" style={[styles.row, selected && styles.selected]} testID={tid}>
      <Pressable
        role="button"
        {...currentMark(selected)}
        onPress={onSelect}
        style={({ pressed }) => [styles.press, pressed && styles.pressed]}
        testID={`${tid}-open`}
      >
        <View style={styles.head}>
          <Text variant="bodyStrong">{`Version ${version.number}`}</Text>
          <StatusBadge status={version.review.state} testID={`${tid}-state`} />
          {selected ? (
            <Text variant="caption" color="primary">
              Shown
            </Text>
          ) : null}
        </View>
        <Text variant="small">{version.message}</Text>
        <Text variant="caption" color="inkMuted">
          {`${version.author.name} · ${formatDateTime(version.createdAt)}`}
        </Text>
        <SummaryLine summary={version.summary} testID={`${tid}-summary`} />
      </Pressable>
      {onCompare ? <Checkbox label={`Compare version ${version.number}`} checked={comparing} onChange={onCompare} testID={`${tid}-compare`} /> : null}
      {children}
    </View>
  );
}

/** The shown version is the current one of the list (aria-current on the web; React Native's types lack it). */
function currentMark(selected: boolean): object {
  return { 'aria-current': selected ? 'true' : undefined };
}

const styles = StyleSheet.create({
  row: { borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, padding: space.sm, gap: space.xs },
  selected: { borderColor: colors.primary, borderWidth: 2, padding: space.sm - 1 },
  press: { gap: 2, padding: space.xs, borderRadius: radius.sm },
  pressed: { backgroundColor: colors.surfaceSunken },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
});
