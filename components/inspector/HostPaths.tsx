import { StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Icon, Text, space } from '@/components/ui';
import type { Topology } from '@/shared/topology/schema';
import { subjectLabel } from '@/lib/editor/describe';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';

/** What the analysis says of one host's paths: per array, sessions, controllers and single points of failure. */
export function HostPaths({ hostId, doc }: { hostId: string; doc: Topology }) {
  const report = useStore(liveAnalysisStore, (s) => s.report);
  const pairs = report?.hosts.filter((p) => p.host === hostId) ?? [];
  return (
    <View style={styles.wrap} testID="inspector-host-paths">
      <Text variant="label">Paths to storage</Text>
      {!report ? (
        <Text variant="small" color="inkMuted">The analysis is running…</Text>
      ) : pairs.length === 0 ? (
        <View style={styles.line}>
          <Icon name="error" size={18} color="dangerText" />
          <Text variant="small" style={styles.text}>No sessions: this host reaches no storage array yet. Cable a card to a data switch that reaches the array.</Text>
        </View>
      ) : (
        pairs.map((pair) => (
          <View key={pair.array} style={styles.line}>
            <Icon name={pair.redundant ? 'success' : 'warning'} size={18} color={pair.redundant ? 'successText' : 'dangerText'} />
            <Text variant="small" style={styles.text}>
              {`${subjectLabel(doc, pair.array)}: ${pair.sessions} session${pair.sessions === 1 ? '' : 's'} to ${pair.controllersReached.map((c) => subjectLabel(doc, c)).join(' and ')}; `}
              {pair.redundant ? 'redundant, no single point of failure.' : `not redundant — losing ${pair.singlePointsOfFailure.map((u) => subjectLabel(doc, u)).join(', ') || 'one part'} cuts it off.`}
            </Text>
          </View>
        ))
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  line: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  text: { flex: 1 },
});
