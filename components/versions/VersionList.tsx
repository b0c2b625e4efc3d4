import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Heading, Text, space } from '@/components/ui';
import { CompareBar } from '@/components/versions/CompareBar';
import { VersionRow } from '@/components/versions/VersionRow';
import type { VersionSummary } from '@/shared/api/designs';

type VersionListProps = {
  designId: number;
  versions: readonly VersionSummary[];
  selected: number | null;
  onSelect: (n: number) => void;
  /** Phone layout: details of the selected version, rendered under its row. */
  renderSelected?: (version: VersionSummary) => ReactNode;
};

/** Every version of the design, newest first; pick one to see it, tick two to compare them. */
export function VersionList({ designId, versions, selected, onSelect, renderSelected }: VersionListProps) {
  const [picked, setPicked] = useState<number[]>([]);
  const toggle = (n: number, on: boolean) =>
    // A third tick replaces the older of the two picks, so there are never more than two.
    setPicked((current) => (on ? [...current.filter((p) => p !== n), n].slice(-2) : current.filter((p) => p !== n)));

  return (
    <View style={styles.wrap} testID="version-list">
      <Heading level={2}>{`Versions (${versions.length})`}</Heading>
      {versions.length > 1 ? (
        <Text variant="small" color="inkMuted">
          Tick two versions to see what changed between them.
        </Text>
      ) : null}
      <CompareBar designId={designId} picked={picked} onClear={() => setPicked([])} />
      <View role="list" style={styles.list}>
        {versions.map((version) => (
          <VersionRow
            key={version.number}
            version={version}
            selected={version.number === selected}
            onSelect={() => onSelect(version.number)}
            comparing={picked.includes(version.number)}
            onCompare={versions.length > 1 ? (on) => toggle(version.number, on) : undefined}
          >
            {renderSelected && version.number === selected ? renderSelected(version) : null}
          </VersionRow>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  list: { gap: space.sm },
});
