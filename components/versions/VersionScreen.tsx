import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, DataTable, Heading, Icon, Screen, Tabs, Text, space, type Column } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { StatusBadge } from '@/components/designs/StatusBadge';
import { SummaryLine } from '@/components/designs/SummaryLine';
import { DeviceCards } from '@/components/versions/DeviceCards';
import { DownloadButton } from '@/components/versions/DownloadButton';
import { useDesign } from '@/lib/api/designs';
import { useVersion } from '@/lib/api/versions';
import { cableRows, deviceViews, networkRows, type CableRow, type NetworkRow } from '@/lib/designs/document-view';
import { designHref, reportHref, scheduleHref } from '@/lib/designs/links';
import { formatDateTime } from '@/lib/format';
import { indexTopology } from '@/shared/topology';

type Section = 'devices' | 'cables' | 'networks';

const CABLE_COLUMNS: readonly Column<keyof Omit<CableRow, 'id'>>[] = [
  { key: 'label', label: 'Label', flex: 0.8 },
  { key: 'from', label: 'From', flex: 1.6 },
  { key: 'to', label: 'To', flex: 1.6 },
  { key: 'media', label: 'Media', flex: 1.2 },
  { key: 'length', label: 'Length', flex: 0.8 },
];

const NETWORK_COLUMNS: readonly Column<keyof Omit<NetworkRow, 'id'>>[] = [
  { key: 'name', label: 'Network', flex: 1.2 },
  { key: 'purpose', label: 'Purpose', flex: 1 },
  { key: 'cidr', label: 'Subnet', flex: 1.3 },
  { key: 'vlan', label: 'VLAN', flex: 0.6 },
  { key: 'mtu', label: 'MTU', flex: 0.6 },
  { key: 'gateway', label: 'Gateway', flex: 1 },
];

/** One version, read-only: its devices, cables and networks, as saved. */
export function VersionScreen({ id, n }: { id: number; n: number }) {
  const version = useVersion(id, n);
  const design = useDesign(id);
  const [section, setSection] = useState<Section>('devices');
  const doc = version.data?.document;
  const views = useMemo(() => {
    if (!doc) return null;
    const index = indexTopology(doc);
    return { devices: deviceViews(doc, index), cables: cableRows(doc, index), networks: networkRows(doc) };
  }, [doc]);
  const name = design.data?.design.name ?? doc?.name ?? 'Design';

  return (
    <Screen testID="version-screen" maxWidth={1280}>
      <Link href={designHref(id, n)} asChild>
        <Button label={`Back to ${name}`} variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} testID="version-back" />
      </Link>
      <View style={styles.title}>
        <Heading level={1}>{`${name}, version ${n}`}</Heading>
        {version.data ? <StatusBadge status={version.data.review.state} /> : null}
      </View>
      <QueryStatus query={version} what={`Version ${n}`} testID="version-error" />
      {version.data && views ? (
        <>
          <Text>{version.data.message}</Text>
          <Text variant="small" color="inkMuted">{`Saved by ${version.data.author.name}, ${formatDateTime(version.data.createdAt)} · read-only: versions never change`}</Text>
          <SummaryLine summary={version.data.summary} />
          <View style={styles.actions}>
            <Link href={reportHref(id, n)} asChild>
              <Button label="Failure report" size="compact" testID="version-report" />
            </Link>
            <Link href={scheduleHref(id, n)} asChild>
              <Button label="Cable schedule" variant="secondary" size="compact" testID="version-schedule" />
            </Link>
            <DownloadButton designId={id} designName={name} number={n} />
          </View>
          <Tabs
            label="Parts of the design"
            value={section}
            onChange={setSection}
            testID="version-tabs"
            tabs={[
              { value: 'devices', label: 'Devices', count: views.devices.length },
              { value: 'cables', label: 'Cables', count: views.cables.length },
              { value: 'networks', label: 'Networks', count: views.networks.length },
            ]}
          />
          {section === 'devices' ? <DeviceCards devices={views.devices} /> : null}
          {section === 'cables' ? (
            <>
              <Link href={scheduleHref(id, n)} asChild>
                <Button label="Open the cable schedule: search, racks, labels and exports" variant="ghost" size="compact" testID="version-cables-schedule" />
              </Link>
              <DataTable label="Cables" columns={CABLE_COLUMNS} rows={views.cables} testID="version-cables" />
            </>
          ) : null}
          {section === 'networks' ? <DataTable label="Networks" columns={NETWORK_COLUMNS} rows={views.networks} testID="version-networks" /> : null}
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
