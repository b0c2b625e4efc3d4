import ExcelJS from 'exceljs';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { cableSchedule } from '@/shared/schedule';
import { addressTable, cableTable, materialsTable } from '@/shared/schedule/tables';
import { buildWorkbook, closeWorkbookPool, INLINE_ROWS } from '@/server/services/build-sheet/xlsx-pool';

/** The workbook of a large design is written on a worker thread; it must be the same workbook. */
afterAll(() => closeWorkbookPool());

async function sheetValues(bytes: Buffer) {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(new Uint8Array(bytes).buffer as ArrayBuffer);
  return workbook.worksheets.map((sheet) => ({ name: sheet.name, rows: sheet.getSheetValues().filter(Boolean).map((row) => (row as unknown[]).slice(1)) }));
}

describe('the workbook worker', () => {
  it('writes the same sheets on the worker thread as inline', async () => {
    const doc = harborRoadV2();
    const schedule = cableSchedule(doc);
    const sheets = [
      { name: 'Cables', table: cableTable(schedule) },
      { name: 'Addresses', table: addressTable(doc) },
      { name: 'Materials', table: materialsTable(schedule) },
    ];
    const inline = await buildWorkbook(sheets, 'Harbor Road', true);
    const worker = await buildWorkbook(sheets, 'Harbor Road', false);
    const [a, b] = await Promise.all([sheetValues(inline), sheetValues(worker)]);
    expect(b).toEqual(a);
    expect(b.map((s) => s.rows.length)).toEqual(sheets.map((s) => s.table.rows.length + 1));
    expect(INLINE_ROWS).toBeGreaterThan(sheets.reduce((n, s) => n + s.table.rows.length, 0)); // the demo stays inline in the routes
  }, 60_000);
});
