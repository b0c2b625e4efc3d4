import path from 'node:path';
import Piscina from 'piscina';
import type { HandoverTask } from '@/server/workers/handover';

/**
 * Handover packs are written off the request thread, always: even the demo design makes a dozen
 * pages with an embedded drawing, and a 5,000-host design hundreds. One worker thread at a time,
 * with a heap cap and a time limit (the pattern of the workbook pool, build-sheet/xlsx-pool.ts).
 */
export const HANDOVER_TIMEOUT_MS = 60_000;
const HEAP_MB = 768;

let pool: Piscina | null = null;

function handoverPool(): Piscina {
  pool ??= new Piscina({
    filename: path.join(__dirname, '..', '..', 'workers', 'handover.ts'),
    execArgv: ['--import', 'tsx'],
    minThreads: 0,
    maxThreads: 1,
    idleTimeout: 30_000,
    resourceLimits: { maxOldGenerationSizeMb: HEAP_MB },
  });
  return pool;
}

export class HandoverTooSlowError extends Error {}

export async function buildHandoverPdf(task: HandoverTask, timeoutMs = HANDOVER_TIMEOUT_MS): Promise<Buffer> {
  try {
    const bytes: Uint8Array = await handoverPool().run(task, { signal: AbortSignal.timeout(timeoutMs) });
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  } catch (error) {
    if ((error as Error).name === 'AbortError' || (error as Error).name === 'TimeoutError') throw new HandoverTooSlowError('The handover pack took too long to write.');
    throw error;
  }
}

/** Stop the worker thread (server shutdown, tests). */
export async function closeHandoverPool(): Promise<void> {
  const current = pool;
  pool = null;
  await current?.destroy();
}
