import { useEffect, useMemo } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, Heading, Icon, Screen, Text, WIDE_BREAKPOINT, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { FailureUnits } from '@/components/report/FailureUnits';
import { FindingsList } from '@/components/report/FindingsList';
import { HostAccess } from '@/components/report/HostAccess';
import { LoginPlanCard } from '@/components/report/LoginPlanCard';
import { MaintenanceView } from '@/components/report/MaintenanceView';
import { SecretsCard } from '@/components/report/SecretsCard';
import { ReportHeadline } from '@/components/report/ReportHeadline';
import { useWhatIf } from '@/components/report/useWhatIf';
import { WhatIfImpact } from '@/components/report/WhatIfImpact';
import { WhatIfPanel } from '@/components/report/WhatIfPanel';
import { useReportPage, useVersionAfterOne } from '@/lib/api/versions';
import { exposureOf } from '@/lib/report/maintenance';
import { designHref } from '@/lib/designs/links';
import { installPrintStyles, printHidden, printPage } from '@/lib/print';
import { createNamer } from '@/lib/report/names';
import { failureUnits, searchHint } from '@/lib/report/units';
import { hostRows, hostsWithoutAccess } from '@/lib/report/view';
import { indexTopology } from '@/shared/topology';

/**
 * The failure report of one version: the saved analysis from the server, and a what-if mode that
 * recomputes it in the browser with chosen units failed. While simulating, every section shows the
 * simulated report and says so.
 */
export function ReportScreen({ id, n }: { id: number; n: number }) {
  // One request for the design, the version and its stored report (GET …/report-page).
  const page = useReportPage(id, n);
  const version = page.data?.version;
  const doc = version?.document;
  const afterOne = useVersionAfterOne(id, n);
  const whatIf = useWhatIf(doc);
  const lookups = useMemo(() => {
    if (!doc) return null;
    const index = indexTopology(doc);
    return { index, namer: createNamer(doc, index), units: failureUnits(doc, index), hint: searchHint(doc) };
  }, [doc]);
  useEffect(installPrintStyles, []);

  const name = page.data?.design.name ?? doc?.name ?? 'Design';
  const baseline = page.data;
  const shown = whatIf.simulated ?? baseline ?? null;
  const failedNames = lookups ? whatIf.settled.map(lookups.namer.unit) : [];
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_BREAKPOINT;
  const rows = baseline ? hostRows(baseline.report, whatIf.simulated?.report ?? null) : [];
  const unreached = useMemo(() => (doc && baseline ? hostsWithoutAccess(doc, baseline.report) : []), [doc, baseline]);

  return (
    <Screen testID="report-screen" maxWidth={1280}>
      <View style={styles.top} {...printHidden()}>
        <Link href={designHref(id, n)} asChild>
          <Button label={`Back to ${name}`} variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} testID="report-back" />
        </Link>
        <Button label="Print" variant="secondary" size="compact" icon={<Icon name="print" size={18} color="primary" />} onPress={() => printPage()} testID="report-print" />
      </View>
      <View style={styles.title}>
        <Heading level={1}>{`Failure report: ${name}, version ${n}`}</Heading>
        {version ? <Text variant="small" color="inkMuted">{version.message}</Text> : null}
      </View>
      <QueryStatus query={page} what={`Version ${n}`} testID="report-version-error" />
      {shown && lookups && baseline ? (
        <>
          <ReportHeadline summary={shown.summary} simulatedWith={whatIf.simulated ? failedNames : null} />
          <View style={wide ? styles.columns : styles.stack}>
            <View style={wide ? styles.side : styles.stack}>
              <WhatIfPanel units={lookups.units} hint={lookups.hint} failed={whatIf.failed} onChange={whatIf.setFailed} />
              {whatIf.simulated ? (
                <WhatIfImpact
                  failedNames={failedNames}
                  rows={rows}
                  namer={lookups.namer}
                  pending={whatIf.pending}
                  exposed={exposureOf(whatIf.simulated.report)}
                  onReset={() => whatIf.setFailed([])}
                />
              ) : null}
            </View>
            <View style={wide ? styles.main : styles.stack}>
              <HostAccess rows={rows} unreached={unreached} namer={lookups.namer} index={lookups.index} />
              <FailureUnits failures={shown.report.failures} namer={lookups.namer} />
              <MaintenanceView afterOne={afterOne.data} loading={afterOne.isLoading} baseline={baseline.report} namer={lookups.namer} />
              <FindingsList findings={shown.report.findings} namer={lookups.namer} />
              <LoginPlanCard id={id} n={n} />
              <View {...printHidden()}>
                <SecretsCard id={id} />
              </View>
            </View>
          </View>
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  // Wide: the what-if controls sit beside the results they change; row-reverse keeps them first for
  // keyboard and screen-reader order, as on the phone.
  columns: { flexDirection: 'row-reverse', gap: space.lg, alignItems: 'flex-start' },
  main: { flex: 3, minWidth: 0, gap: space.lg },
  side: { flex: 2, minWidth: 0, gap: space.lg },
  stack: { gap: space.lg },
  top: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  title: { gap: space.xs },
});
