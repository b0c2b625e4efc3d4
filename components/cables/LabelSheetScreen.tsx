import { memo, useEffect, useMemo, useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Banner, Button, Heading, Icon, Screen, SegmentedPicker, Text, fonts, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { FilterChips } from '@/components/cables/FilterChips';
import { LabelQr } from '@/components/cables/LabelQr';
import { useDesign } from '@/lib/api/designs';
import { useCableSchedule } from '@/lib/api/schedule';
import { scheduleHref } from '@/lib/designs/links';
import {
  LABEL_GAP_MM,
  LABEL_STOCKS,
  labelsPerPage,
  labelStock,
  mmToPx,
  PAGE_MARGIN_MM,
  paper,
  PAPERS,
  ptToPx,
  readLabelSettings,
  writeLabelSettings,
  type LabelSettings,
  type LabelStock,
  type LabelStockId,
  type PaperId,
} from '@/lib/labels/stock';
import { filterChoices } from '@/lib/schedule/view';
import { installPrintStyles, printHidden, printKeepTogether, printPage } from '@/lib/print';
import { labelSheet, type CableEndLabel } from '@/shared/labels/content';

/** Labels drawn at once: a large design prints rack by rack or batch by batch, not 20,000 QR codes in one page. */
const BATCH_LABELS = 400;
const PAGE_STYLE_ID = 'cablewright-label-page';

/** The app's own address, for the QR codes: the origin this page was opened at. */
function appOrigin(): string {
  if (Platform.OS === 'web' && typeof window !== 'undefined' && window.location?.origin) return window.location.origin;
  return process.env.EXPO_PUBLIC_APP_URL ?? '';
}

/** The printed page's size and margin follow the chosen paper. */
function usePageStyle(paperId: PaperId) {
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    let style = document.getElementById(PAGE_STYLE_ID);
    if (!style) {
      style = document.createElement('style');
      style.id = PAGE_STYLE_ID;
      document.head.appendChild(style);
    }
    style.textContent = `@media print { @page { size: ${paper(paperId).cssSize}; margin: ${PAGE_MARGIN_MM}mm; } }`;
    return () => style?.remove();
  }, [paperId]);
}

/**
 * A printable sheet of cable labels, one per cable end: the identifier (this end first), the label,
 * media and length, and a QR code of the cable's detail address, so a phone camera opens the cable.
 * Stock and paper are a setting kept in the browser; print CSS sizes the page for A4 or US Letter.
 */
export function LabelSheetScreen({ id, n }: { id: number; n: number }) {
  const schedule = useCableSchedule(id, n);
  const design = useDesign(id);
  const [settings, setSettings] = useState<LabelSettings>(() => readLabelSettings());
  const [rack, setRack] = useState<string | null>(null);
  const [batch, setBatch] = useState(0);
  useEffect(installPrintStyles, []);
  usePageStyle(settings.paper);

  const rows = schedule.data?.cables;
  const racks = useMemo(() => (rows ? filterChoices(rows).racks : []), [rows]);
  const labels = useMemo(() => {
    if (!rows) return [];
    const kept = rack === null ? rows : rows.filter((row) => row.a.rack === rack || row.b.rack === rack);
    return labelSheet(kept, { appUrl: appOrigin(), designId: id, version: n });
  }, [rows, rack, id, n]);
  const stock = labelStock(settings.stock);
  const fit = labelsPerPage(stock, settings.paper);
  const batchSize = Math.max(fit.perPage, Math.floor(BATCH_LABELS / fit.perPage) * fit.perPage);
  const batches = Math.max(1, Math.ceil(labels.length / batchSize));
  const shownBatch = Math.min(batch, batches - 1);
  const shown = labels.slice(shownBatch * batchSize, (shownBatch + 1) * batchSize);
  const printable = mmToPx(paper(settings.paper).widthMm - 2 * PAGE_MARGIN_MM);
  const name = design.data?.design.name ?? 'Design';

  function change(next: Partial<LabelSettings>) {
    const merged = { ...settings, ...next };
    setSettings(merged);
    writeLabelSettings(merged);
    setBatch(0);
  }

  return (
    <Screen testID="label-sheet-screen" maxWidth={1080}>
      <View style={styles.controls} {...printHidden()}>
        <View style={styles.links}>
          <Link href={scheduleHref(id, n)} asChild>
            <Button label="Cable schedule" variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} testID="labels-back" />
          </Link>
          <Button label="Print labels" size="compact" icon={<Icon name="print" size={18} color="onPrimary" />} onPress={() => printPage()} testID="labels-print" />
        </View>
        <Heading level={1}>{`Label sheet: ${name}, version ${n}`}</Heading>
        <Text color="inkMuted">
          One label per cable end. Scan a label's code with a phone to open that cable. Print at 100 % (no "fit to page"), so the labels keep their size.
        </Text>
        <SegmentedPicker<LabelStockId>
          label="Label stock"
          options={LABEL_STOCKS.map((s) => ({ value: s.id, label: s.name }))}
          value={settings.stock}
          onChange={(value) => change({ stock: value })}
          testID="labels-stock"
        />
        <SegmentedPicker<PaperId>
          label="Paper"
          options={PAPERS.map((p) => ({ value: p.id, label: p.name }))}
          value={settings.paper}
          onChange={(value) => change({ paper: value })}
          testID="labels-paper"
        />
        {racks.length > 0 ? (
          <FilterChips
            label="Rack"
            choices={racks.map((r) => ({ value: r, label: r }))}
            value={rack}
            onChange={(value) => {
              setRack(value);
              setBatch(0);
            }}
            testID="labels-rack"
          />
        ) : null}
        <QueryStatus query={schedule} what="The cable schedule" testID="labels-error" />
        {rows ? (
          <Text variant="small" color="inkMuted" testID="labels-count">
            {`${labels.length} labels, ${fit.perPage} to a page (${fit.across} across, ${fit.down} down)`}
            {batches > 1 ? ` · showing ${shownBatch * batchSize + 1}–${shownBatch * batchSize + shown.length}` : ''}
          </Text>
        ) : null}
        {batches > 1 ? (
          <View style={styles.links}>
            <Button label="Previous labels" variant="secondary" size="compact" disabled={shownBatch === 0} onPress={() => setBatch(shownBatch - 1)} testID="labels-previous" />
            <Button label="Next labels" variant="secondary" size="compact" disabled={shownBatch >= batches - 1} onPress={() => setBatch(shownBatch + 1)} testID="labels-next" />
          </View>
        ) : null}
        {rows && labels.length === 0 ? (
          <Banner tone="info" title="No labels" testID="labels-empty">
            This version has no cables to label.
          </Banner>
        ) : null}
      </View>
      <View style={[styles.sheet, { maxWidth: printable, gap: mmToPx(LABEL_GAP_MM) }]} testID="labels-sheet">
        {shown.map((label) => (
          <CableLabel key={`${label.cableId}\u0000${label.end}`} label={label} stock={stock} />
        ))}
      </View>
    </Screen>
  );
}

const CableLabel = memo(function CableLabel({ label, stock }: { label: CableEndLabel; stock: LabelStock }) {
  const padding = mmToPx(1.5);
  return (
    <View
      {...printKeepTogether()}
      style={[styles.label, { width: mmToPx(stock.widthMm), height: mmToPx(stock.heightMm), padding, gap: padding }]}
      testID={`label-${label.cableId}-${label.end}`}
      aria-label={`Label ${label.label}, ${label.end === 'a' ? 'near' : 'far'} end: ${label.here} to ${label.there}`}
    >
      <LabelQr text={label.url} sizePx={mmToPx(Math.min(stock.qrMm, stock.heightMm - 3))} testID={`label-${label.cableId}-${label.end}-qr`} />
      <View style={styles.labelText}>
        <Text style={[styles.strong, { fontSize: ptToPx(stock.labelPt), lineHeight: ptToPx(stock.labelPt) * 1.15 }]} numberOfLines={1}>
          {label.label}
        </Text>
        <Text style={[styles.plain, { fontSize: ptToPx(stock.detailPt), lineHeight: ptToPx(stock.detailPt) * 1.2 }]} numberOfLines={2}>
          {`${label.here} → ${label.there}`}
        </Text>
        <Text style={[styles.plain, { fontSize: ptToPx(stock.detailPt), lineHeight: ptToPx(stock.detailPt) * 1.2 }]} numberOfLines={1}>
          {`${label.mediaName} · ${label.lengthText}`}
        </Text>
      </View>
    </View>
  );
});

const styles = StyleSheet.create({
  controls: { gap: space.md },
  links: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  sheet: { flexDirection: 'row', flexWrap: 'wrap', width: '100%', alignSelf: 'flex-start' },
  // A thin dashed outline to cut along; black on white prints on any printer.
  label: { flexDirection: 'row', alignItems: 'center', overflow: 'hidden', backgroundColor: '#ffffff', borderWidth: 1, borderColor: '#000000', borderStyle: 'dashed' },
  labelText: { flex: 1, minWidth: 0, gap: 1 },
  strong: { color: '#000000', fontFamily: fonts.bold },
  plain: { color: '#000000' },
});
