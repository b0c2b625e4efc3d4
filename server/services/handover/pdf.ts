import path from 'node:path';
import PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import { NOT_APPROVED, paperDate, type HandoverPack, type PackTable, type RackElevation } from '@/shared/handover/pack';

/**
 * The handover pack as a PDF (pdfkit), drawn from the shared pack (shared/handover/pack.ts) and the
 * canvas's SVG picture (svg-to-pdfkit). A4 portrait, the picture on a landscape page. The app's own
 * Inter faces (assets/fonts, SIL Open Font License) are embedded, so the paper looks like the screen
 * and every character of a name prints. Each page carries the design, the version and its page
 * number; a version that is not approved says so at the top and foot of every page.
 *
 * Runs on a worker thread (server/workers/handover.ts): a large design makes hundreds of pages.
 */
export const FONT_DIR = path.join(__dirname, '..', '..', '..', 'assets', 'fonts');
const REGULAR = 'Inter';
const SEMIBOLD = 'Inter-SemiBold';
const BOLD = 'Inter-Bold';

const INK = '#1b2530';
const MUTED = '#55606b';
const LINE = '#c9d0d6';
const DANGER = '#a3261f';
const DANGER_SOFT = '#fbe7e5';
const HEAD_FILL = '#eef1f4';

const MARGIN = { top: 58, bottom: 52, left: 40, right: 40 };

export type PdfInput = { pack: HandoverPack; svg: string };

type Doc = PDFKit.PDFDocument;

function fontFor(family: string, bold: boolean): string {
  if (/600|semibold/i.test(family)) return SEMIBOLD;
  if (bold || /700|bold/i.test(family)) return BOLD;
  return REGULAR;
}

function contentWidth(doc: Doc): number {
  return doc.page.width - doc.page.margins.left - doc.page.margins.right;
}

function bottomLimit(doc: Doc): number {
  return doc.page.height - doc.page.margins.bottom;
}

function ensureRoom(doc: Doc, height: number): void {
  if (doc.y + height > bottomLimit(doc)) doc.addPage();
}

function heading(doc: Doc, title: string, newPage = true): void {
  if (newPage) doc.addPage();
  else ensureRoom(doc, 60);
  doc.font(BOLD).fontSize(16).fillColor(INK).text(title, doc.page.margins.left, doc.y);
  doc.moveDown(0.4);
}

function paragraph(doc: Doc, body: string, options: { size?: number; color?: string; font?: string } = {}): void {
  doc.font(options.font ?? REGULAR).fontSize(options.size ?? 10).fillColor(options.color ?? INK);
  doc.text(body, doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.5);
}

/** A table with its header repeated on each page; cells wrap, rows never split across pages. */
function table(doc: Doc, data: PackTable, weights: readonly number[], size = 7.5): void {
  const left = doc.page.margins.left;
  const total = weights.reduce((a, b) => a + b, 0);
  const widths = weights.map((w) => (w / total) * contentWidth(doc));
  const pad = 2.5;
  const rowHeight = (cells: readonly string[], font: string) => {
    doc.font(font).fontSize(size);
    return Math.max(...cells.map((c, i) => doc.heightOfString(c || ' ', { width: widths[i] - 2 * pad }))) + 2 * pad;
  };
  const drawRow = (cells: readonly string[], font: string, fill: string | null, height: number) => {
    const y = doc.y;
    if (fill) doc.rect(left, y, contentWidth(doc), height).fill(fill);
    doc.font(font).fontSize(size).fillColor(INK);
    let x = left;
    cells.forEach((c, i) => {
      doc.text(c, x + pad, y + pad, { width: widths[i] - 2 * pad, lineBreak: true });
      x += widths[i];
    });
    doc.moveTo(left, y + height).lineTo(left + contentWidth(doc), y + height).lineWidth(0.4).strokeColor(LINE).stroke();
    doc.x = left;
    doc.y = y + height;
  };
  const headHeight = rowHeight(data.header, SEMIBOLD);
  const header = () => drawRow(data.header, SEMIBOLD, HEAD_FILL, headHeight);
  ensureRoom(doc, headHeight * 2);
  header();
  if (data.rows.length === 0) {
    paragraph(doc, 'None.', { size, color: MUTED });
    return;
  }
  for (const row of data.rows) {
    const h = rowHeight(row, REGULAR);
    if (doc.y + h > bottomLimit(doc)) {
      doc.addPage();
      header();
    }
    drawRow(row, REGULAR, null, h);
  }
  doc.moveDown(0.6);
}

function cover(doc: Doc, pack: HandoverPack): void {
  const { meta } = pack;
  const left = doc.page.margins.left;
  const width = contentWidth(doc);
  doc.font(SEMIBOLD).fontSize(11).fillColor(MUTED).text('Handover pack', left, 110);
  doc.font(BOLD).fontSize(26).fillColor(INK).text(meta.design, left, doc.y + 4, { width });
  if (meta.site) doc.font(REGULAR).fontSize(13).fillColor(MUTED).text(`Site: ${meta.site}`, { width });
  doc.moveDown(1.2);
  const field = (label: string, value: string) => {
    doc.font(SEMIBOLD).fontSize(10).fillColor(MUTED).text(label, left, doc.y, { width });
    doc.font(REGULAR).fontSize(12).fillColor(INK).text(value, left, doc.y, { width });
    doc.moveDown(0.6);
  };
  field('Version', `${meta.version}${meta.message ? ` \u2014 ${meta.message}` : ''}`);
  field('Author', `${meta.author}, saved ${paperDate(meta.savedAt)}`);
  if (meta.approval) {
    field('Approved by', meta.approval.by);
    field('Approval date', paperDate(meta.approval.at));
    field('Approval comment', meta.approval.comment ?? '(none)');
    if (meta.approval.override) {
      paragraph(doc, 'Approved although the analysis reported errors; the comment above gives the reason. The open findings are listed at the end of this pack.', { color: DANGER, size: 10 });
    }
  } else {
    doc.moveDown(0.4);
    const y = doc.y;
    doc.rect(left, y, width, 64).fillAndStroke(DANGER_SOFT, DANGER);
    doc.font(BOLD).fontSize(16).fillColor(DANGER).text(`This version is ${NOT_APPROVED}`, left + 12, y + 12, { width: width - 24 });
    doc.font(REGULAR).fontSize(10).text('It has no reviewer\u2019s approval. Do not build from it; ask for the approved version.', left + 12, doc.y + 2, { width: width - 24 });
    doc.y = y + 76;
  }
  doc.moveDown(1);
  paragraph(doc, 'Contents: topology, rack elevations, address worksheet, cable schedule, login plan, CHAP, safety cautions, bring-up order, open findings.', { size: 9, color: MUTED });
}

function picture(doc: Doc, svg: string): void {
  doc.addPage({ layout: 'landscape', margins: MARGIN });
  doc.font(BOLD).fontSize(16).fillColor(INK).text('Topology', doc.page.margins.left, doc.y);
  const top = doc.y + 6;
  const width = contentWidth(doc);
  const height = bottomLimit(doc) - top;
  SVGtoPDF(doc, svg, doc.page.margins.left, top, {
    width,
    height,
    preserveAspectRatio: 'xMidYMid meet',
    fontCallback: (family, bold) => fontFor(family, bold),
    warningCallback: () => undefined,
  });
}

function racks(doc: Doc, elevations: readonly RackElevation[]): void {
  doc.addPage({ layout: 'portrait', margins: MARGIN });
  doc.font(BOLD).fontSize(16).fillColor(INK).text('Rack elevations', doc.page.margins.left, doc.y);
  doc.moveDown(0.4);
  if (elevations.length === 0) {
    paragraph(doc, 'The design places no devices in racks.', { color: MUTED });
    return;
  }
  const perRow = 3;
  const colWidth = contentWidth(doc) / perRow;
  const boxWidth = colWidth - 24;
  let rowTop = doc.y;
  let rowBottom = rowTop;
  elevations.forEach((rack, i) => {
    const col = i % perRow;
    const unit = Math.max(4, Math.min(9, 380 / rack.heightU));
    const height = unit * rack.heightU;
    if (col === 0) {
      rowTop = rowBottom === rowTop ? rowTop : rowBottom + 16;
      if (rowTop + height + 30 > bottomLimit(doc)) {
        doc.addPage();
        rowTop = doc.y;
      }
    }
    const x = doc.page.margins.left + col * colWidth;
    doc.font(SEMIBOLD).fontSize(10).fillColor(INK).text(`${rack.rack}${rack.row ? ` (row ${rack.row})` : ''} \u00b7 ${rack.heightU}U`, x, rowTop, { width: colWidth - 8 });
    const top = rowTop + 16;
    doc.rect(x, top, boxWidth, height).lineWidth(0.8).strokeColor(INK).stroke();
    for (const slot of rack.units) {
      const match = /^U(\d+)(?:\u2013U(\d+))?$/.exec(slot.units);
      if (!match) continue;
      const bottomU = Number(match[1]);
      const topU = Number(match[2] ?? match[1]);
      if (topU > rack.heightU) continue;
      const y = top + (rack.heightU - topU) * unit;
      const h = (topU - bottomU + 1) * unit;
      doc.rect(x + 1, y + 0.5, boxWidth - 2, h - 1).fillAndStroke(HEAD_FILL, MUTED);
      doc.font(REGULAR).fontSize(Math.min(7, h - 1.5)).fillColor(INK).text(`${slot.units} ${slot.device}`, x + 4, y + Math.max(0.5, (h - 7) / 2), { width: boxWidth - 8, height: h, lineBreak: false, ellipsis: true });
    }
    rowBottom = Math.max(rowBottom, top + height);
    if (col === perRow - 1 || i === elevations.length - 1) doc.y = rowBottom + 8;
  });
  doc.x = doc.page.margins.left;
  // The same units as a list, so every placement reads as text too.
  heading(doc, 'Rack units', false);
  table(doc, { header: ['Rack', 'Units', 'Device'], rows: elevations.flatMap((r) => r.units.map((u) => [r.rack, u.units, u.device])) }, [1, 1, 3]);
}

function stampPages(doc: Doc, pack: HandoverPack): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const { width, height, margins } = doc.page;
    const saved = margins.bottom;
    doc.page.margins.bottom = 0;
    const inner = width - margins.left - margins.right;
    doc.font(REGULAR).fontSize(8).fillColor(MUTED).text(`${pack.meta.design} \u00b7 handover pack`, margins.left, 24, { width: inner, lineBreak: false });
    if (!pack.approved) {
      doc.font(BOLD).fontSize(9).fillColor(DANGER).text(`${NOT_APPROVED.toUpperCase()} \u2014 this version is ${NOT_APPROVED}`, margins.left, 24, { width: inner, align: 'right', lineBreak: false });
    }
    doc.moveTo(margins.left, 38).lineTo(width - margins.right, 38).lineWidth(0.4).strokeColor(LINE).stroke();
    doc.font(REGULAR).fontSize(8).fillColor(MUTED).text(pack.stamp, margins.left, height - 34, { width: inner, lineBreak: false });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, margins.left, height - 34, { width: inner, align: 'right', lineBreak: false });
    doc.page.margins.bottom = saved;
  }
}

export function renderHandoverPdf({ pack, svg }: PdfInput): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margins: MARGIN,
    bufferPages: true,
    autoFirstPage: true,
    info: {
      Title: `${pack.meta.design}, version ${pack.meta.version}: handover pack`,
      Author: pack.meta.author,
      Subject: pack.stamp,
      CreationDate: new Date(pack.meta.approval?.at ?? pack.meta.savedAt),
    },
  });
  doc.registerFont(REGULAR, path.join(FONT_DIR, 'Inter_400Regular.ttf'));
  doc.registerFont(SEMIBOLD, path.join(FONT_DIR, 'Inter_600SemiBold.ttf'));
  doc.registerFont(BOLD, path.join(FONT_DIR, 'Inter_700Bold.ttf'));
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  cover(doc, pack);
  picture(doc, svg);
  racks(doc, pack.racks);

  heading(doc, 'Address worksheet');
  paragraph(doc, 'Every host and controller port with its network, subnet, VLAN, MTU and address (dhcp: the port takes its address from DHCP).', { size: 9, color: MUTED });
  table(doc, pack.addresses, [2.2, 1.3, 1, 1.6, 1.6, 0.7, 0.7, 1.5, 1.3]);

  heading(doc, 'Cable schedule');
  paragraph(doc, 'Every cable by its label, near end first (the network side), with rack and unit.', { size: 9, color: MUTED });
  table(doc, pack.cables, [1.2, 3, 3, 0.9, 0.8, 1.6]);

  heading(doc, 'Login plan');
  paragraph(doc, 'For each host: every data port with its address and network, and the target portals (address:3260, RFC 7143) and target names it logs in to.', { size: 9, color: MUTED });
  for (const host of pack.loginPlan.hosts) {
    ensureRoom(doc, 70);
    paragraph(doc, `${host.name} \u00b7 ${host.initiator ?? 'no initiator name yet'} \u00b7 ${host.expectedSessions} sessions expected`, { font: SEMIBOLD, size: 10.5 });
    table(doc, {
      header: ['Port', 'Address', 'Network', 'Portal', 'Target name'],
      rows: host.ports.flatMap((p) => (p.targets.length === 0 ? [[`${p.cardName} ${p.portName}`, p.address ?? '', p.networkName ?? '', 'none reachable', '']] : p.targets.map((t) => [`${p.cardName} ${p.portName}`, p.address ?? '', p.networkName ?? '', t.portal ?? `${t.controllerName} ${t.portName}: no address`, t.iqn ?? '(no target name)']))),
    }, [1.4, 1.3, 1.3, 1.6, 3]);
  }

  heading(doc, 'CHAP');
  paragraph(doc, pack.chap.text);

  heading(doc, 'Safety cautions');
  for (const caution of pack.cautions) {
    ensureRoom(doc, 50);
    paragraph(doc, caution.title, { font: SEMIBOLD, size: 11 });
    paragraph(doc, `${caution.detail} (${caution.source})`, { size: 9.5 });
  }

  heading(doc, 'Bring-up order');
  paragraph(doc, 'Once the cables are in and the safety cautions are read, in this order:', { size: 9, color: MUTED });
  pack.steps.forEach((step, i) => {
    ensureRoom(doc, 30);
    paragraph(doc, `${i + 1}. ${step.title}`, { font: SEMIBOLD, size: 9.5 });
    doc.moveUp(0.35);
    paragraph(doc, step.detail, { size: 8.5, color: MUTED });
  });

  heading(doc, 'Open findings');
  if (pack.meta.approval?.override) {
    paragraph(doc, `Approved over errors by ${pack.meta.approval.by} on ${paperDate(pack.meta.approval.at)}: ${pack.meta.approval.comment ?? ''}`, { color: DANGER });
  }
  if (pack.findings.length === 0) paragraph(doc, 'The analysis reports no errors or warnings.', { color: MUTED });
  else table(doc, { header: ['Severity', 'Rule', 'Finding'], rows: pack.findings.map((f) => [f.severity, f.rule, f.message]) }, [0.8, 1.6, 5]);

  stampPages(doc, pack);
  doc.end();
  return done;
}
