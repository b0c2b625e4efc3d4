import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Text, TextField, space } from '@/components/ui';
import { connectChoices } from '@/lib/editor/connect';
import { portLabel } from '@/lib/editor/describe';
import { useEditorDoc } from '@/lib/editor/hooks';
import { cableNow } from '@/lib/editor/quick-cable';
import { PortRow } from '@/components/editor/PortRow';

const PAGE = 60;

/**
 * "Connect to…": the free ports a cable from `from` can go to, grouped by device, the fitting ones
 * first (lib/editor/connect.ts says how they are ranked), with a search over device, card or
 * controller, port and network. Choosing a port makes the cable.
 */
export function ConnectList({ from }: { from: string }) {
  const doc = useEditorDoc();
  const [query, setQuery] = useState('');
  const [limit, setLimit] = useState(PAGE);
  const [error, setError] = useState<string | null>(null);
  const groups = useMemo(() => connectChoices(doc, from, query), [doc, from, query]);
  const total = groups.reduce((n, g) => n + g.ports.length, 0);
  let shown = 0;
  return (
    <View style={styles.wrap} testID="connect-list">
      <Text variant="small" color="inkMuted">{`From ${portLabel(doc, from)}. Free ports, the ones that fit first.`}</Text>
      <TextField label="Find a port" value={query} onChangeText={(t) => { setQuery(t); setLimit(PAGE); }} placeholder="device, card, port or network" autoCapitalize="none" autoCorrect={false} testID="connect-search" />
      {error ? <Banner tone="error">{error}</Banner> : null}
      {total === 0 ? <Text variant="small">{query ? 'No free port matches.' : 'No free port is left on the other devices.'}</Text> : null}
      {groups.map((group) => {
        if (shown >= limit) return null;
        const ports = group.ports.slice(0, limit - shown);
        shown += ports.length;
        return (
          <View key={group.deviceId} style={styles.group} role="list" aria-label={group.device} testID={`connect-group-${group.deviceId}`}>
            <Text variant="label">{group.device}</Text>
            {ports.map((choice) => (
              <PortRow key={choice.portId} label={choice.label} network={choice.network} notes={choice.notes} onPress={() => setError(cableNow(choice.portId))} testID={`connect-port-${choice.portId}`} />
            ))}
          </View>
        );
      })}
      {total > limit ? <Button label={`Show more (${total - limit} left)`} variant="ghost" onPress={() => setLimit(limit + PAGE)} testID="connect-more" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  group: { gap: space.xs },
});
