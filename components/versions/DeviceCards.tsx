import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Card, DataTable, Heading, Text, colors, space, type Column } from '@/components/ui';
import type { DeviceView, PortRow } from '@/lib/designs/document-view';

const PORT_COLUMNS: readonly Column<keyof Omit<PortRow, 'id'>>[] = [
  { key: 'name', label: 'Port', flex: 0.8 },
  { key: 'role', label: 'Role', flex: 1 },
  { key: 'speed', label: 'Speed', flex: 1.1 },
  { key: 'network', label: 'Network', flex: 1.1 },
  { key: 'address', label: 'Address', flex: 1.3 },
  { key: 'cabledTo', label: 'Cabled to', flex: 2.6 },
];

/** Below this width a port is three short lines instead of a table row. */
const TABLE_MIN_WIDTH = 900;

/** Each device with its controllers or cards and their ports, addresses and where each is cabled. */
export function DeviceCards({ devices }: { devices: readonly DeviceView[] }) {
  const { width } = useWindowDimensions();
  const narrow = width < TABLE_MIN_WIDTH;
  return (
    <View style={styles.list} testID="version-devices">
      {devices.map((device) => (
        <Card key={device.id} testID={`device-${device.id}`}>
          <View style={styles.head}>
            <Heading level={3}>{device.name}</Heading>
            <Text variant="small" color="inkMuted">
              {[device.kind, ...device.details].join(' · ')}
            </Text>
          </View>
          {device.groups.map((group) => (
            <View key={group.id} style={styles.group}>
              <Text variant="smallStrong">{group.title}</Text>
              {group.ports.length > 0 && narrow ? <PortLines ports={group.ports} /> : null}
              {group.ports.length > 0 && !narrow ? <DataTable label={`${device.name} ${group.title}`} columns={PORT_COLUMNS} rows={group.ports} stackBelow={0} /> : null}
              {group.ports.length === 0 ? (
                <Text variant="small" color="inkMuted">
                  No ports
                </Text>
              ) : null}
            </View>
          ))}
        </Card>
      ))}
    </View>
  );
}

/** Phone form of a port: what it is, how it is addressed, where its cable goes. */
function PortLines({ ports }: { ports: readonly PortRow[] }) {
  return (
    <View role="list" style={styles.ports}>
      {ports.map((port) => (
        <View key={port.id} role="listitem" style={styles.port} testID={`port-${port.id}`}>
          <Text variant="smallStrong">{`${port.name} · ${port.role} · ${port.speed}`}</Text>
          <Text variant="small">{`${port.network === 'none' ? 'no network' : port.network} · ${port.address === 'none' ? 'no address' : port.address}`}</Text>
          <Text variant="small" color="inkMuted">{port.cabledTo === 'not cabled' ? 'not cabled' : `→ ${port.cabledTo}`}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  ports: { gap: 0 },
  port: { paddingVertical: space.xs, borderTopWidth: 1, borderTopColor: colors.line },
  list: { gap: space.md },
  head: { gap: 2 },
  group: { gap: space.xs },
});
