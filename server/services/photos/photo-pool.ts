import path from 'node:path';
import Piscina from 'piscina';
import type { PreparedPhoto } from './prepare';

/**
 * Uploaded photos are judged and stripped on a worker thread: a 10 MB image is walked and copied
 * a few times, which should not hold up other requests, and `file-type` (an ES module only) loads
 * there through a dynamic import(). Two threads at most, with a heap cap and a time limit.
 */
export const PHOTO_TIMEOUT_MS = 20_000;
const HEAP_MB = 256;

let pool: Piscina | null = null;

function photoPool(): Piscina {
  pool ??= new Piscina({
    filename: path.join(__dirname, '..', '..', 'workers', 'photo.ts'),
    execArgv: ['--import', 'tsx'],
    minThreads: 0,
    maxThreads: 2,
    idleTimeout: 30_000,
    resourceLimits: { maxOldGenerationSizeMb: HEAP_MB },
  });
  return pool;
}

export class PhotoTooSlowError extends Error {}

export async function preparePhotoOffThread(bytes: Buffer): Promise<PreparedPhoto> {
  try {
    return await photoPool().run({ bytes: new Uint8Array(bytes) }, { signal: AbortSignal.timeout(PHOTO_TIMEOUT_MS) });
  } catch (error) {
    const name = (error as Error).name;
    if (name === 'AbortError' || name === 'TimeoutError') throw new PhotoTooSlowError('The photo took too long to check.');
    throw error;
  }
}

/** Stop the worker threads (server shutdown, tests). */
export async function closePhotoPool(): Promise<void> {
  const current = pool;
  pool = null;
  await current?.destroy();
}
