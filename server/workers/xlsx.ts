import { toXlsx, type Sheet } from '@/server/services/build-sheet/xlsx';

/** Worker entry (piscina): one workbook from plain tables, off the request thread. */
export default async function buildWorkbook(task: { sheets: Sheet[]; title: string }): Promise<Uint8Array> {
  return new Uint8Array(await toXlsx(task.sheets, { title: task.title }));
}
