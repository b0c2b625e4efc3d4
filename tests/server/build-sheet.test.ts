import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import request from 'supertest';
import { cableSchedule } from '@/shared/schedule';
import { addressTable, cableTable, materialsTable, type Table } from '@/shared/schedule/tables';
import type { Topology } from '@/shared/topology/schema';
import { makeTestApp, signInAs, type Agent, type DemoWho, type TestApp } from './helpers/app';
import { designId, harborV2, saveOnTop } from './helpers/designs';

/**
 * The build sheet routes (docs/api.md): cables JSON, cables.csv, addresses.csv, cables.xlsx. The seeded
 * demo: Harbor Road v1 (changes asked) and v2 (approved), Tidewater's; Sam is on another team.
 */
let t: TestApp;
let id: number;
const agents = new Map<DemoWho, Agent>();
beforeAll(async () => {
  t = await makeTestApp();
  id = await designId(t);
  for (const who of ['admin', 'designer', 'reviewer', 'installer', 'otherTeam'] as const) agents.set(who, await signInAs(t.app, who));
});
afterAll(() => t.close());

const ravi = () => agents.get('designer')!;
const ROUTES = ['cables', 'cables.csv', 'addresses.csv', 'cables.xlsx'];

/** What a cell reads as once written to CSV and parsed back: text, numbers as their digits, nothing as empty. */
const asCsv = (table: Table) => table.rows.map((row) => row.map((cell) => (cell === null ? '' : String(cell))));

function parseCsv(text: string): { header: string[]; rows: string[][] } {
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  const [header, ...rows] = parsed.data;
  return { header, rows };
}

function binary(res: request.Response, done: (error: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}

describe('who may read the build sheet', () => {
  it.each(ROUTES)('%s: the team reads every version, installers approved ones only, others get 401 or 404', async (route) => {
    const anonymous = await request(t.app).get(`/api/designs/${id}/versions/2/${route}`);
    expect(anonymous.status).toBe(401);
    for (const who of ['admin', 'designer', 'reviewer'] as const) {
      expect((await agents.get(who)!.get(`/api/designs/${id}/versions/1/${route}`)).status).toBe(200);
    }
    const ines = agents.get('installer')!;
    expect((await ines.get(`/api/designs/${id}/versions/2/${route}`)).status).toBe(200);
    const draft = await ines.get(`/api/designs/${id}/versions/1/${route}`);
    expect(draft.status).toBe(404);
    expect(draft.body).toEqual({ error: 'This design has no version 1.' });
    const sam = await agents.get('otherTeam')!.get(`/api/designs/${id}/versions/2/${route}`);
    expect(sam.status).toBe(404);
    expect(sam.body.error).toBeDefined();
    expect((await ravi().get(`/api/designs/${id}/versions/99/${route}`)).status).toBe(404);
    const bad = await ravi().get(`/api/designs/${id}/versions/two/${route}`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path)).toEqual(['params.n']);
  });
});

describe('the cable schedule route', () => {
  it('answers the shared schedule of the stored document', async () => {
    const res = await ravi().get(`/api/designs/${id}/versions/2/cables`).expect(200);
    expect(res.body).toEqual(cableSchedule(harborV2()));
    expect(res.body.cables[0]).toEqual({
      id: 'cable-a-01',
      label: 'HR-A-01',
      identifier: 'A01-40:1/A01-12:ctl-a.1',
      a: { deviceId: 'fab-a', device: 'fab-a', part: null, port: 'p1', rack: 'A01', ru: 40 },
      b: { deviceId: 'vault-1', device: 'vault-1', part: 'ctl-a', port: 'p1', rack: 'A01', ru: 12 },
      media: 'cat6a',
      lengthM: 3,
      // EIA-310: 1U = 44.45 mm. U40 (middle 39.5U) to U12–13 (middle 12U): 27.5U = 1.222 m, + 0.5 m slack.
      estimatedLengthM: 1.73,
      stockLengthM: 3,
      network: 'fabric A',
      vlan: 110,
    });
  });
});

describe('CSV exports', () => {
  it('cables.csv: the docs/api.md header, one row per cable, and parsed back it equals the rows', async () => {
    const res = await ravi().get(`/api/designs/${id}/versions/2/cables.csv`).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?harbor-road-storage-v2-cables\.csv"?$/);
    expect(res.text.split('\r\n')[0]).toBe('label,from_device,from_part,from_port,from_rack,from_ru,to_device,to_part,to_port,to_rack,to_ru,media,length_m,estimated_m,network,vlan');
    const { header, rows } = parseCsv(res.text);
    expect(header).toHaveLength(16);
    expect(rows).toEqual(asCsv(cableTable(cableSchedule(harborV2()))));
    expect(rows).toHaveLength(28);
  });

  it('addresses.csv: one row per host and controller port in use, with its network', async () => {
    const res = await ravi().get(`/api/designs/${id}/versions/2/addresses.csv`).expect(200);
    expect(res.text.split('\r\n')[0]).toBe('device,part,port,role,network,cidr,vlan,mtu,address,gateway');
    const { rows } = parseCsv(res.text);
    expect(rows).toEqual(asCsv(addressTable(harborV2())));
    // 2 controllers × 5 ports, 6 hosts × (2 storage ports + 1 onboard management port); the spare p2 of each card is left out.
    expect(rows).toHaveLength(28);
    expect(rows.filter((r) => r[0] === 'wms-db-1').map((r) => `${r[1]} ${r[2]}`)).toEqual(['card-1 p1', 'card-2 p1', 'onboard mgmt']);
    expect(rows).toContainEqual(['vault-1', 'ctl-a', 'p1', 'data', 'fabric A', '198.51.100.0/24', '110', '9000', '198.51.100.1', '']); // RFC 5737 §3
    expect(rows).toContainEqual(['vault-1', 'ctl-b', 'mgmt', 'management', 'management', '192.0.2.0/24', '10', '1500', '192.0.2.3', '192.0.2.1']); // RFC 5737 §3
  });

  it('guard every cell that a spreadsheet would run as a formula, and quote what needs quoting', async () => {
    const doc = harborV2();
    const rename = (deviceId: string, name: string) => (doc.devices.find((d) => d.id === deviceId)!.name = name);
    rename('wms-db-1', '=HYPERLINK("http://example.invalid","x")');
    rename('wms-db-2', '+1+1');
    rename('wms-app-1', '-2+3');
    rename('wms-app-2', '@SUM(A1)');
    rename('cam-rec-1', '\t=TAB'); // names are shown trimmed: this one reads "=TAB"
    rename('cam-rec-2', 'ok, "quoted"\n=second line');
    doc.networks[0].name = '\r=CR';
    const created = await ravi().post('/api/designs').send({ name: 'Guarded names', document: doc }).expect(201);
    const newId = created.body.design.id;
    const cables = parseCsv((await ravi().get(`/api/designs/${newId}/versions/1/cables.csv`).expect(200)).text).rows;
    const addresses = parseCsv((await ravi().get(`/api/designs/${newId}/versions/1/addresses.csv`).expect(200)).text).rows;
    const cells = new Set([...cables, ...addresses].flat());
    // OWASP "CSV Injection": cells starting =, +, -, @, tab or CR are prefixed with '.
    for (const name of ['=HYPERLINK("http://example.invalid","x")', '+1+1', '-2+3', '@SUM(A1)', '=TAB', '=CR']) {
      expect([name, cells.has(`'${name}`)]).toEqual([name, true]);
      expect(cells.has(name)).toBe(false);
    }
    // A saved name has its line breaks turned into spaces (shared/text/clean.ts), so this cell holds a
    // comma and quotes: RFC 4180 quotes it and doubles the quotes, and it reads back whole.
    expect(cells.has('ok, "quoted" =second line')).toBe(true);
    for (const cell of cells) expect(/^[=+\-@\t\r]/.test(cell)).toBe(false);
    // Parsed back, the file is exactly the schedule's rows with the guarded cells prefixed.
    const stored: Topology = (await ravi().get(`/api/designs/${newId}/versions/1`).expect(200)).body.version.document;
    const guarded = asCsv(cableTable(cableSchedule(stored))).map((row) => row.map((c) => (/^[=+\-@\t\r]/.test(c) ? `'${c}` : c)));
    expect(cables).toEqual(guarded);
  });
});

describe('the workbook', () => {
  it('cables.xlsx: sheets Cables, Addresses and Materials with every row, a frozen header and an autofilter', async () => {
    const res = await ravi().get(`/api/designs/${id}/versions/2/cables.xlsx`).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?harbor-road-storage-v2-cables\.xlsx"?$/);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(new Uint8Array(res.body as Buffer).buffer as ArrayBuffer);
    expect(workbook.worksheets.map((s) => s.name)).toEqual(['Cables', 'Addresses', 'Materials']);
    const doc: Topology = harborV2();
    const schedule = cableSchedule(doc);
    const tables = [cableTable(schedule), addressTable(doc), materialsTable(schedule)];
    workbook.worksheets.forEach((sheet, s) => {
      const table = tables[s];
      expect(sheet.rowCount).toBe(table.rows.length + 1);
      const values = (n: number) => table.header.map((_, c) => sheet.getRow(n).getCell(c + 1).value ?? null);
      expect(values(1)).toEqual([...table.header]);
      for (let r = 0; r < table.rows.length; r += 1) expect(values(r + 2)).toEqual(table.rows[r]);
      expect(sheet.views[0]).toMatchObject({ state: 'frozen', ySplit: 1 });
      expect(sheet.autoFilter).toBeTruthy();
      expect(sheet.getRow(1).font?.bold).toBe(true);
      // exceljs writes no width for a column of its default width, 9, and reads that back as undefined.
      const widths = table.header.map((_, c) => sheet.getColumn(c + 1).width ?? 9);
      expect(widths.every((w) => w >= 6 && w <= 48)).toBe(true);
      table.header.forEach((header, c) => expect(widths[c]).toBeGreaterThanOrEqual(header.length));
    });
    expect(tables[2].rows.reduce((n, row) => n + Number(row[2]), 0)).toBe(28);
  });
});

describe('a version saved after the seed', () => {
  it('exports what was saved, labels included', async () => {
    const doc = harborV2();
    doc.cables[0].lengthM = 1; // shorter than the 1.73 m estimate
    expect((await saveOnTop(ravi(), id, doc)).status).toBe(201);
    const res = await ravi().get(`/api/designs/${id}/versions/3/cables`).expect(200);
    expect(res.body.cables.find((c: { id: string }) => c.id === doc.cables[0].id)).toMatchObject({ lengthM: 1, estimatedLengthM: 1.73, stockLengthM: 1 });
  });
});
