import { useMemo, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Banner, Button, Card, Heading, Icon, LabeledValue, Screen, Text, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { CableDrawing } from '@/components/cables/CableDrawing';
import { useDesign } from '@/lib/api/designs';
import { useScheduleRow } from '@/lib/api/schedule';
import { useVersion } from '@/lib/api/versions';
import { labelSheetHref, scheduleHref } from '@/lib/designs/links';
import { cableDrawing, endKinds, partWord } from '@/lib/schedule/drawing';
import { lengthText } from '@/shared/labels/content';
import { MEDIA_NAMES } from '@/shared/rules/cables';
import type { ScheduleEnd, ScheduleRow } from '@/shared/schedule/types';
import { indexTopology } from '@/shared/topology';
import type { DeviceKind } from '@/shared/topology/schema';

type CableDetailProps = {
  id: number;
  n: number;
  cableId: string;
  /**
   * The build region under the cable's facts (testID `cable-detail-build`): the installer's check-off
   * panel goes here. The region is there (empty) without children.
   */
  children?: ReactNode;
};

/**
 * One cable of a version's schedule: both ends (device, controller or card, port, rack, unit), the
 * TIA-606 style identifier, the printed label, media, chosen / estimated / stock length, network and
 * VLAN, and a small drawing of the two devices with the cabled ports marked. The page a label's QR
 * code opens.
 */
export function CableDetailScreen({ id, n, cableId, children }: CableDetailProps) {
  const { query, row } = useScheduleRow(id, n, cableId);
  const version = useVersion(id, n);
  const design = useDesign(id);
  const doc = version.data?.document;
  const index = useMemo(() => (doc ? indexTopology(doc) : null), [doc]);
  const drawing = useMemo(() => (doc && row && index ? cableDrawing(doc, row, index) : null), [doc, row, index]);
  const kinds = row ? endKinds(index, row) : { a: null, b: null };
  const name = design.data?.design.name ?? doc?.name ?? 'Design';

  return (
    <Screen testID="cable-detail-screen" maxWidth={1080}>
      <View style={styles.top}>
        <Link href={scheduleHref(id, n)} asChild>
          <Button label="Cable schedule" variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} testID="cable-detail-back" />
        </Link>
        <Link href={labelSheetHref(id, n)} asChild>
          <Button label="Label sheet" variant="secondary" size="compact" icon={<Icon name="print" size={18} color="primary" />} testID="cable-detail-labels" />
        </Link>
      </View>
      <QueryStatus query={query} what="The cable schedule" testID="cable-detail-error" />
      {query.data && !row ? (
        <Banner tone="error" title="This cable is not in the version" testID="cable-detail-missing">
          {`${name}, version ${n} has no cable with the id ${cableId}. It may have been removed in this version; open the schedule to find it.`}
        </Banner>
      ) : null}
      {row ? (
        <>
          <View style={styles.title}>
            <Text variant="small" color="inkMuted">{`${name}, version ${n}`}</Text>
            <Heading level={1} variant="display" testID="cable-detail-label">
              {row.label}
            </Heading>
            <Text variant="bodyStrong" selectable testID="cable-detail-identifier" aria-label={`Identifier ${row.identifier}`}>
              {row.identifier}
            </Text>
          </View>
          <View style={styles.ends}>
            <EndCard title="Near end" end={row.a} kind={kinds.a} testID="cable-detail-a" />
            <EndCard title="Far end" end={row.b} kind={kinds.b} testID="cable-detail-b" />
          </View>
          <CableFacts row={row} />
          {drawing ? <CableDrawing model={drawing} label={row.label} /> : null}
          <View style={styles.build} testID="cable-detail-build">
            {children}
          </View>
        </>
      ) : null}
    </Screen>
  );
}

function EndCard({ title, end, kind, testID }: { title: string; end: ScheduleEnd; kind: DeviceKind | null; testID: string }) {
  return (
    <Card style={styles.end} testID={testID}>
      <Heading level={2}>{title}</Heading>
      <View style={styles.facts}>
        <LabeledValue label="Device" value={end.device} testID={`${testID}-device`} />
        {end.part !== null ? <LabeledValue label={partWord(kind)} value={end.part} testID={`${testID}-part`} /> : null}
        <LabeledValue label="Port" value={end.port} testID={`${testID}-port`} />
        <LabeledValue label="Rack" value={end.rack ?? 'not placed'} testID={`${testID}-rack`} />
        <LabeledValue label="Unit (RU)" value={end.ru === null ? 'not placed' : String(end.ru)} testID={`${testID}-ru`} />
      </View>
    </Card>
  );
}

function CableFacts({ row }: { row: ScheduleRow }) {
  const network = row.network === null ? 'none (between switches)' : row.vlan === null ? row.network : `${row.network}, VLAN ${row.vlan}`;
  return (
    <Card testID="cable-detail-facts">
      <View style={styles.facts}>
        <LabeledValue label="Media" value={MEDIA_NAMES[row.media]} testID="cable-detail-media" />
        <LabeledValue label="Chosen length" value={lengthText(row.lengthM)} testID="cable-detail-length" />
        <LabeledValue
          label="Estimated length"
          value={row.estimatedLengthM === null ? 'needs both ends in racks' : `${row.estimatedLengthM} m`}
          testID="cable-detail-estimate"
        />
        <LabeledValue label="Stock length to take" value={row.stockLengthM === null ? 'none in stock sizes' : `${row.stockLengthM} m`} testID="cable-detail-stock" />
        <LabeledValue label="Network" value={network} testID="cable-detail-network" />
      </View>
      {row.lengthM !== null && row.estimatedLengthM !== null && row.lengthM < row.estimatedLengthM ? (
        <Banner tone="warning" title="Shorter than the estimate" testID="cable-detail-short">
          {`The chosen ${row.lengthM} m is shorter than the ${row.estimatedLengthM} m the rack positions call for.`}
        </Banner>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  title: { gap: space.xs },
  ends: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  end: { flexGrow: 1, flexBasis: 300 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.md },
  build: { gap: space.lg },
});
