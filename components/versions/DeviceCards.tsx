import { StyleSheet, View } from 'react-native';
import { Card, DataTable, Heading, Text, space, type Column } from '@/components/ui';
import type { DeviceView, PortRow } from '@/lib/designs/document-view';

const PORT_COLUMNS: readonly Column<keyof Omit<PortRow, 'id'>>[] = [
  { key: 'name', label: 'Port', flex: 0.8 },
  { key: 'role', label: 'Role', flex: 1 },
  { key: 'speed', label: 'Speed', flex: 1.1 },
  { key: 'network', label: 'Network', flex: 1.1 },
  { key: 'address', label: 'Address', flex: 1.3 },
  { key: 'cabledTo', label: 'Cabled to', flex: 2.6 },
];

/** Each device with its controllers or cards and their ports, addresses and where each is cabled. */
export function DeviceCards({ devices }: { devices: readonly DeviceView[] }) {
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
              {group.ports.length > 0 ? (
                <DataTable label={`${device.name} ${group.title}`} columns={PORT_COLUMNS} rows={group.ports} stackBelow={900} />
              ) : (
                <Text variant="small" color="inkMuted">
                  No ports
                </Text>
              )}
            </View>
          ))}
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  head: { gap: 2 },
  group: { gap: space.xs },
});
