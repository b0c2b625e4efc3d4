import path from 'node:path';
import Piscina from 'piscina';
import { toXlsx, type Sheet } from './xlsx';

/**
 * Workbooks of large designs are written off the request thread: about 1.4 s of CPU for a 5,000-host
 * design (npm run bench), which would stall every other request meanwhile. One worker thread at a
 * time (the machine's other cores serve requests), with a heap cap and a time limit; a small
 * workbook is written inline, where a thread hand-off would cost more than the work.
 *
 * The worker is TypeScript like the rest of the server, loaded through tsx (a dependency, the
 * server's runtime), so it runs the same under `npm start`, `npm run dev` and jest.
 */
export const INLINE_ROWS = 5000;
export const WORKBOOK_TIMEOUT_MS = 30_000;
const HEAP_MB = 512;

let pool: Piscina | null = null;

function workbookPool(): Piscina {
  pool ??= new Piscina({
    filename: path.join(__dirname, '..', '..', 'workers', 'xlsx.ts'),
    execArgv: ['--import', 'tsx'],
    minThreads: 0,
    maxThreads: 1,
    idleTimeout: 30_000,
    resourceLimits: { maxOldGenerationSizeMb: HEAP_MB },
  });
  return pool;
}

export class WorkbookTooSlowError extends Error {}

/** The workbook, inline when small (or `inline` forces a side, for tests), else on the worker. */
export async function buildWorkbook(sheets: Sheet[], title: string, inline?: boolean): Promise<Buffer> {
  const rows = sheets.reduce((n, sheet) => n + sheet.table.rows.length, 0);
  if (inline ?? rows <= INLINE_ROWS) return toXlsx(sheets, { title });
  try {
    const bytes: Uint8Array = await workbookPool().run({ sheets, title }, { signal: AbortSignal.timeout(WORKBOOK_TIMEOUT_MS) });
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  } catch (error) {
    if ((error as Error).name === 'AbortError' || (error as Error).name === 'TimeoutError') throw new WorkbookTooSlowError('The workbook took too long to write.');
    throw error;
  }
}

/** Stop the worker thread (server shutdown, tests). */
export async function closeWorkbookPool(): Promise<void> {
  const current = pool;
  pool = null;
  await current?.destroy();
}
