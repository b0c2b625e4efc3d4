/**
 * Cable label stock and paper for the printable label sheet. The stock names are our own; the sizes
 * are common self-laminating and flag label sizes (common practice). Even the smallest stock keeps
 * the QR code (quiet zone included) above 16 mm, which phone cameras read at a hand's distance
 * (common practice, from memory).
 */
export type LabelStockId = 'pocket' | 'standard' | 'flag';
export type PaperId = 'a4' | 'letter';

export type LabelStock = {
  id: LabelStockId;
  name: string;
  /** One label's face, in millimetres. */
  widthMm: number;
  heightMm: number;
  /** The QR code's side, quiet zone included. */
  qrMm: number;
  /** The label text's size, in points (1 pt = 1/72 in, CSS 2.1 §4.3.2). */
  labelPt: number;
  detailPt: number;
};

export const LABEL_STOCKS: readonly LabelStock[] = [
  { id: 'pocket', name: 'Pocket, 38 × 21 mm', widthMm: 38, heightMm: 21, qrMm: 17, labelPt: 9, detailPt: 5.5 },
  { id: 'standard', name: 'Standard, 50 × 25 mm', widthMm: 50, heightMm: 25, qrMm: 21, labelPt: 11, detailPt: 6.5 },
  { id: 'flag', name: 'Flag, 70 × 36 mm', widthMm: 70, heightMm: 36, qrMm: 30, labelPt: 14, detailPt: 8 },
];

/** ISO 216 A4 is 210 × 297 mm; ANSI/ASME Y14.1 Letter is 8.5 × 11 in (215.9 × 279.4 mm). */
export const PAPERS: readonly { id: PaperId; name: string; widthMm: number; heightMm: number; cssSize: string }[] = [
  { id: 'a4', name: 'A4', widthMm: 210, heightMm: 297, cssSize: 'A4' },
  { id: 'letter', name: 'US Letter', widthMm: 215.9, heightMm: 279.4, cssSize: 'letter' },
];

export const PAGE_MARGIN_MM = 10;
export const LABEL_GAP_MM = 2;

export function labelStock(id: LabelStockId): LabelStock {
  return LABEL_STOCKS.find((stock) => stock.id === id) ?? LABEL_STOCKS[1];
}

export function paper(id: PaperId) {
  return PAPERS.find((p) => p.id === id) ?? PAPERS[0];
}

/** CSS has 96 px to the inch (CSS Values 4 §6.2), so a length in px prints at its size in mm. */
export function mmToPx(mm: number): number {
  return (mm * 96) / 25.4;
}

export function ptToPx(pt: number): number {
  return (pt * 96) / 72;
}

/** How many labels of a stock fit across and down a printed page inside its margins. */
export function labelsPerPage(stock: LabelStock, paperId: PaperId): { across: number; down: number; perPage: number } {
  const page = paper(paperId);
  const fit = (space: number, size: number) => Math.max(1, Math.floor((space - 2 * PAGE_MARGIN_MM + LABEL_GAP_MM) / (size + LABEL_GAP_MM)));
  const across = fit(page.widthMm, stock.widthMm);
  const down = fit(page.heightMm, stock.heightMm);
  return { across, down, perPage: across * down };
}

/** The label sheet's setting, kept in the browser between visits. */
export type LabelSettings = { stock: LabelStockId; paper: PaperId };
export const DEFAULT_LABEL_SETTINGS: LabelSettings = { stock: 'standard', paper: 'a4' };
const STORAGE_KEY = 'cablewright.label-settings';

export function readLabelSettings(storage: Pick<Storage, 'getItem'> | null = browserStorage()): LabelSettings {
  try {
    const raw = storage?.getItem(STORAGE_KEY);
    if (!raw) return DEFAULT_LABEL_SETTINGS;
    const parsed = JSON.parse(raw) as Partial<LabelSettings>;
    const stock = LABEL_STOCKS.some((s) => s.id === parsed.stock) ? (parsed.stock as LabelStockId) : DEFAULT_LABEL_SETTINGS.stock;
    const paperId = PAPERS.some((p) => p.id === parsed.paper) ? (parsed.paper as PaperId) : DEFAULT_LABEL_SETTINGS.paper;
    return { stock, paper: paperId };
  } catch {
    return DEFAULT_LABEL_SETTINGS;
  }
}

export function writeLabelSettings(settings: LabelSettings, storage: Pick<Storage, 'setItem'> | null = browserStorage()): void {
  try {
    storage?.setItem(STORAGE_KEY, JSON.stringify(settings));
  } catch {
    // A full or refused storage only loses the setting.
  }
}

function browserStorage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}
