import type { User } from '@/shared/api/auth';
import { loginPlan, type LoginPlan } from '@/shared/handover/login-plan';
import { cableSchedule, type CableSchedule } from '@/shared/schedule';
import { addressTable, cableTable, exportFileName, materialsTable } from '@/shared/schedule/tables';
import type { Models } from '@/server/models';
import { fail, ok, type Result } from '@/server/services/result';
import { toCsv } from './csv';
import { openVersionDocument } from './read';
import { buildWorkbook, WorkbookTooSlowError } from './xlsx-pool';

/**
 * The build sheet of a version (docs/api.md): the cable schedule as JSON, the cable list and the address
 * worksheet as CSV, and all three tables (Cables, Addresses, Materials) as a workbook. Everyone who
 * may read the version may read these.
 *
 * Speed (npm run bench, 5,000 hosts in 125 racks, 10,240 cables): the schedule about 0.1 s and
 * the CSV 0.2 s, so they run on the request thread (a document is at most 10 MB, which bounds
 * them); the workbook takes over a second of CPU and goes to a worker thread (xlsx-pool.ts).
 */
export type Download = { fileName: string; contentType: string; body: string | Buffer };

export const CSV_TYPE = 'text/csv; charset=utf-8';
export const XLSX_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export function createBuildSheetService({ models }: { models: Models }) {
  async function schedule(viewer: User, id: number, n: number) {
    const opened = await openVersionDocument(models, viewer, id, n);
    if (!opened.ok) return opened;
    return ok({ ...opened.value, schedule: cableSchedule(opened.value.doc) });
  }

  return {
    async cables(viewer: User, id: number, n: number): Promise<Result<CableSchedule>> {
      const found = await schedule(viewer, id, n);
      return found.ok ? ok(found.value.schedule) : found;
    },

    async cablesCsv(viewer: User, id: number, n: number): Promise<Result<Download>> {
      const found = await schedule(viewer, id, n);
      if (!found.ok) return found;
      const { designName, number } = found.value;
      return ok({ fileName: exportFileName(designName, number, 'cables', 'csv'), contentType: CSV_TYPE, body: toCsv(cableTable(found.value.schedule)) });
    },

    async addressesCsv(viewer: User, id: number, n: number): Promise<Result<Download>> {
      const opened = await openVersionDocument(models, viewer, id, n);
      if (!opened.ok) return opened;
      const { doc, designName, number } = opened.value;
      return ok({ fileName: exportFileName(designName, number, 'addresses', 'csv'), contentType: CSV_TYPE, body: toCsv(addressTable(doc)) });
    },

    /** The login plan (shared/handover/login-plan.ts): per host, the portals and target names to log in to. */
    async loginPlan(viewer: User, id: number, n: number): Promise<Result<LoginPlan>> {
      const opened = await openVersionDocument(models, viewer, id, n);
      return opened.ok ? ok(loginPlan(opened.value.doc)) : opened;
    },

    async cablesXlsx(viewer: User, id: number, n: number): Promise<Result<Download>> {
      const found = await schedule(viewer, id, n);
      if (!found.ok) return found;
      const { doc, designName, number, schedule: rows } = found.value;
      const sheets = [
        { name: 'Cables', table: cableTable(rows) },
        { name: 'Addresses', table: addressTable(doc) },
        { name: 'Materials', table: materialsTable(rows) },
      ];
      try {
        const body = await buildWorkbook(sheets, `${designName}, version ${number}: build sheet`);
        return ok({ fileName: exportFileName(designName, number, 'cables', 'xlsx'), contentType: XLSX_TYPE, body });
      } catch (error) {
        if (!(error instanceof WorkbookTooSlowError)) throw error;
        return fail('unavailable', 'The spreadsheet took too long to write; try again in a minute, or use cables.csv.');
      }
    },
  };
}

export type BuildSheetService = ReturnType<typeof createBuildSheetService>;
