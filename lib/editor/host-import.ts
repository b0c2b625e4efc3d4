import Papa from 'papaparse';
import { checkIscsiName } from '@/shared/rules/iqn';
import { CONNECTORS, PORT_SPEEDS, type Connector } from '@/shared/topology/schema';

/**
 * Host inventory import: a CSV with the columns `name, initiator name, cards, ports per card,
 * speed, connector, rack, unit` (header names matched without case or spacing; rack and unit may be
 * empty). `previewHostImport` reads it and reports one error per bad cell — the row number as a
 * spreadsheet shows it (the header is row 1) and the column — and nothing is added to the design:
 * the designer confirms, then `importHosts` adds every good host in one command (one undo step).
 */
export const IMPORT_COLUMNS = ['name', 'initiator name', 'cards', 'ports per card', 'speed', 'connector', 'rack', 'unit'] as const;
export type ImportColumn = (typeof IMPORT_COLUMNS)[number];

export type ImportedHost = {
  name: string;
  iqn: string | null;
  cards: number;
  portsPerCard: number;
  speedGbps: (typeof PORT_SPEEDS)[number];
  connector: Connector;
  rack: string | null;
  ru: number | null;
};

export type ImportError = { row: number; column: ImportColumn | null; message: string };
export type ImportPreview = { hosts: ImportedHost[]; errors: ImportError[]; rows: number };

export const MAX_IMPORT_ROWS = 10_000;

export const SAMPLE_CSV = [
  'name,initiator name,cards,ports per card,speed,connector,rack,unit',
  'wms-db-3,iqn.2026-11.example.tidewater:wms-db-3,2,2,25,sfp,A01,20',
  'wms-app-3,iqn.2026-11.example.tidewater:wms-app-3,2,2,10,sfp,A01,22',
  'cam-rec-3,iqn.2026-11.example.tidewater:cam-rec-3,1,2,10,rj45,,',
  '',
].join('\n');

const normal = (text: string) => text.trim().toLowerCase().replace(/[\s_-]+/g, ' ');

function integer(text: string, min: number, max: number): number | null {
  if (!/^\d+$/.test(text)) return null;
  const n = Number(text);
  return n >= min && n <= max ? n : null;
}

export function previewHostImport(csv: string): ImportPreview {
  const parsed = Papa.parse<string[]>(csv, { header: false, skipEmptyLines: 'greedy' });
  const [header, ...body] = parsed.data;
  const errors: ImportError[] = [];
  if (!header) return { hosts: [], errors: [{ row: 1, column: null, message: 'The file is empty; start from the sample CSV.' }], rows: 0 };
  const at = new Map<ImportColumn, number>();
  header.forEach((cell, i) => {
    const col = IMPORT_COLUMNS.find((c) => c === normal(cell));
    if (col && !at.has(col)) at.set(col, i);
  });
  for (const col of IMPORT_COLUMNS) if (!at.has(col) && col !== 'rack' && col !== 'unit') errors.push({ row: 1, column: col, message: `The header has no "${col}" column.` });
  if (errors.length > 0) return { hosts: [], errors, rows: body.length };
  if (body.length > MAX_IMPORT_ROWS) return { hosts: [], errors: [{ row: 1, column: null, message: `At most ${MAX_IMPORT_ROWS} hosts at a time; this file has ${body.length}.` }], rows: body.length };
  const hosts: ImportedHost[] = [];
  const seen = new Map<string, number>();
  body.forEach((cells, i) => {
    const row = i + 2;
    const get = (col: ImportColumn) => (cells[at.get(col) ?? -1] ?? '').trim();
    const bad = (column: ImportColumn, message: string) => errors.push({ row, column, message });
    const before = errors.length;
    const name = get('name');
    if (name === '') bad('name', 'A host needs a name.');
    else if (name.length > 200) bad('name', 'Use at most 200 characters.');
    else if (seen.has(name.toLowerCase())) bad('name', `The same name as row ${seen.get(name.toLowerCase())}.`);
    const initiator = get('initiator name');
    if (initiator !== '') {
      const check = checkIscsiName(initiator);
      if (!check.ok) bad('initiator name', check.reason);
    }
    const cards = integer(get('cards'), 1, 8);
    if (cards === null) bad('cards', 'A whole number from 1 to 8.');
    const perCard = integer(get('ports per card'), 1, 8);
    if (perCard === null) bad('ports per card', 'A whole number from 1 to 8.');
    const speed = PORT_SPEEDS.find((s) => String(s) === get('speed').replace(/\s*(g|gb|gbe|gbps|gbit\/s)$/i, ''));
    if (speed === undefined) bad('speed', `One of ${PORT_SPEEDS.join(', ')} (Gbit/s).`);
    const connector = CONNECTORS.find((c) => c === get('connector').toLowerCase());
    if (connector === undefined) bad('connector', `One of ${CONNECTORS.join(', ')}.`);
    const rack = get('rack');
    const unitText = get('unit');
    const ru = unitText === '' ? null : integer(unitText, 1, 100);
    if (unitText !== '' && ru === null) bad('unit', 'A whole rack unit from 1 to 100, counted from the bottom.');
    if (ru !== null && rack === '') bad('rack', 'A unit needs its rack.');
    if (rack.length > 100) bad('rack', 'Use at most 100 characters.');
    if (name !== '' && !seen.has(name.toLowerCase())) seen.set(name.toLowerCase(), row);
    if (errors.length > before) return;
    hosts.push({ name, iqn: initiator === '' ? null : initiator, cards: cards!, portsPerCard: perCard!, speedGbps: speed!, connector: connector!, rack: rack === '' ? null : rack, ru });
  });
  return { hosts, errors, rows: body.length };
}
