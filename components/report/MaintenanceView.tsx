import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, Heading, Icon, Text, colors, space } from '@/components/ui';
import { maintenanceRows, type MaintenanceRow } from '@/lib/report/maintenance';
import type { Namer } from '@/lib/report/names';
import { UNIT_KIND_LABELS } from '@/lib/report/units';
import type { AfterOneResult, Report } from '@/shared/analysis/types';
import { tupleKey } from '@/shared/keys/tuple';

/** Rows shown before "Show every unit": a 5,000-host design has hundreds of units. */
const FIRST_ROWS = 12;

/** The biggest things first when naming what a host hangs on: a feed explains more than a cable. */
const KIND_RANK = new Map<string, number>([['feed', 0], ['switch', 1], ['controller', 2], ['psu', 3], ['adapter', 4], ['cable', 5]]);

function biggestFirst(namer: Namer, units: readonly string[]): string[] {
  const rank = (id: string) => KIND_RANK.get(namer.kindOf(id) ?? 'cable') ?? 5;
  return [...units].sort((x, y) => rank(x) - rank(y) || (x < y ? -1 : x > y ? 1 : 0));
}

type MaintenanceViewProps = {
  afterOne: readonly AfterOneResult[] | undefined;
  loading: boolean;
  baseline: Report;
  namer: Namer;
};

/**
 * "Take down X: these hosts are exposed through Y" — for a maintenance window, what each switch,
 * controller, fabric cable, power supply or feed leaves hanging on one last thing while it is down,
 * the units that expose the most hosts first. A unit opens to list its hosts; a host that was already
 * exposed before is marked so, in words, not by colour alone.
 */
export function MaintenanceView({ afterOne, loading, baseline, namer }: MaintenanceViewProps) {
  const rows = useMemo(() => (afterOne ? maintenanceRows(afterOne, baseline) : []), [afterOne, baseline]);
  const [open, setOpen] = useState<string | null>(null);
  const [all, setAll] = useState(false);
  const risky = rows.filter((r) => r.hostsExposed > 0 || r.cutOff.length > 0);
  const safe = rows.filter((r) => r.hostsExposed === 0 && r.cutOff.length === 0);
  const shown = all ? risky : risky.slice(0, FIRST_ROWS);
  return (
    <Card testID="report-maintenance">
      <Heading level={2}>Maintenance: taking one thing down</Heading>
      <Text variant="small" color="inkMuted">
        While each unit below is down for work, these hosts hang on one last path; anything on that path failing too cuts them off.
        Plan the window, keep a backup, and follow the equipment&apos;s and your site&apos;s procedures for live storage and power work.
      </Text>
      {loading ? (
        <Text variant="small" color="inkMuted" testID="maintenance-loading">
          Working out what each failure leaves exposed…
        </Text>
      ) : null}
      {!loading && afterOne && risky.length === 0 ? (
        <Text color="successText" testID="maintenance-none">
          Any one of these units can be taken down alone: every host keeps a second path while it is down.
        </Text>
      ) : null}
      {shown.map((row) => (
        <UnitRow key={row.unit} row={row} namer={namer} open={open === row.unit} onToggle={() => setOpen(open === row.unit ? null : row.unit)} />
      ))}
      {!all && risky.length > FIRST_ROWS ? (
        <Button label={`Show every unit (${risky.length})`} variant="secondary" size="compact" onPress={() => setAll(true)} testID="maintenance-all" />
      ) : null}
      {safe.length > 0 ? (
        <Text variant="small" color="inkMuted" testID="maintenance-safe">
          {`${safe.length} more ${safe.length === 1 ? 'unit leaves' : 'units leave'} every host with two paths while down.`}
        </Text>
      ) : null}
    </Card>
  );
}

function UnitRow({ row, namer, open, onToggle }: { row: MaintenanceRow; namer: Namer; open: boolean; onToggle: () => void }) {
  const kind = namer.kindOf(row.unit);
  const count = `${row.hostsExposed} host${row.hostsExposed === 1 ? '' : 's'} exposed${row.hostsNewlyExposed < row.hostsExposed ? ` (${row.hostsNewlyExposed} by this work)` : ''}`;
  return (
    <View style={styles.row} testID={`maintenance-unit-${row.unit}`}>
      <Text variant="caption" color="inkMuted">
        {kind ? UNIT_KIND_LABELS[kind] : 'Unit'}
      </Text>
      <Text variant="bodyStrong">{`Take down ${namer.unit(row.unit)}`}</Text>
      <Text variant="small" color={row.hostsExposed > 0 ? 'warningText' : 'inkMuted'}>
        {row.cutOff.length > 0 ? `${count}; cuts off ${row.cutOff.map((p) => `${namer.device(p.host)} from ${namer.device(p.array)}`).join('; ')}` : count}
      </Text>
      <Button
        label={open ? 'Hide the hosts' : 'Show the hosts'}
        variant="ghost"
        size="compact"
        onPress={onToggle}
        accessibilityState={{ expanded: open }}
        testID={`maintenance-toggle-${row.unit}`}
      />
      {open ? (
        <View style={styles.hosts} testID={`maintenance-hosts-${row.unit}`}>
          {row.exposed.map((pair) => (
            <View key={tupleKey([pair.host, pair.array])} style={styles.host} testID={`maintenance-host-${row.unit}-${pair.host}`}>
              <Icon name="warning" size={16} color="warningText" />
              <View style={styles.hostText}>
                <Text variant="smallStrong">{`${namer.device(pair.host)} to ${namer.device(pair.array)}${pair.already ? ' (already exposed)' : ''}`}</Text>
                <Text variant="small" color="inkMuted">{`exposed through ${biggestFirst(namer, pair.singlePointsOfFailure).map(namer.unit).join(', ')}`}</Text>
              </View>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  hosts: { gap: space.xs, paddingLeft: space.sm },
  host: { flexDirection: 'row', gap: space.xs, alignItems: 'flex-start' },
  hostText: { flex: 1, minWidth: 0 },
});
