import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Card, Heading, Text, space } from '@/components/ui';
import { ProgressBar } from '@/components/build/ProgressBar';
import { stateSummary } from '@/lib/build/words';
import type { BuildProgress } from '@/shared/api/build';
import type { Href } from 'expo-router';

type BuildProgressViewProps = {
  progress: BuildProgress;
  /** Per rack too (the design screen); the checklist shows the totals only. */
  perRack?: boolean;
  /** Where a rack's line leads (its cables to do), when it should be a link. */
  rackHref?: (rackId: string | null) => Href;
  testID?: string;
};

/** The build's progress: cables tested and steps done, the cables per state, and optionally per rack. */
export function BuildProgressView({ progress, perRack = false, rackHref, testID }: BuildProgressViewProps) {
  const summary = stateSummary(progress.states);
  return (
    <Card testID={testID}>
      <ProgressBar label="Cables" count={progress.cables} doneWord="tested" testID={testID ? `${testID}-cables` : undefined} />
      <ProgressBar label="Bring-up steps" count={progress.steps} doneWord="done" testID={testID ? `${testID}-steps` : undefined} />
      {summary ? <Text variant="small">{summary}</Text> : null}
      {perRack && progress.racks.length > 0 ? (
        <View style={styles.racks}>
          <Heading level={3}>Per rack</Heading>
          {progress.racks.map((rack, index) => {
            const name = rack.rack ?? 'Not in a rack';
            const line = (
              <View style={styles.rack} testID={testID ? `${testID}-rack-${index}` : undefined}>
                <Text variant="bodyStrong">{name}</Text>
                <Text variant="small">{`Cables ${rack.cables.done} of ${rack.cables.total} tested · steps ${rack.steps.done} of ${rack.steps.total} done`}</Text>
              </View>
            );
            return rackHref ? (
              <Link key={rack.rackId ?? '\u0000none'} href={rackHref(rack.rackId)} style={styles.rackLink}>
                {line}
              </Link>
            ) : (
              <View key={rack.rackId ?? '\u0000none'}>{line}</View>
            );
          })}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  racks: { gap: space.sm },
  rack: { gap: 2, minHeight: 44, justifyContent: 'center' },
  rackLink: { minHeight: 44 },
});
