import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';

/**
 * Where photo files live: one folder (config.photosDir — PHOTOS_DIR, or `photos/` beside the
 * database file; a temporary folder for an in-memory database), never under the web root (the
 * config refuses that). Each file gets a random name of our own, so nothing the client sent —
 * its file name with `../` or a path in it — ever reaches the file system. Files are written once,
 * never overwritten, readable by the server's user only.
 */
export type PhotoStore = {
  /** The folder, made on first use. */
  folder(): Promise<string>;
  /** Write new bytes under a fresh random name; answers the name. */
  write(bytes: Uint8Array, extension: string): Promise<string>;
  read(storedName: string): Promise<Buffer>;
  /** Only to undo a write whose database row could not be stored. */
  discard(storedName: string): Promise<void>;
};

const STORED_NAME = /^[0-9a-f]{32}\.(jpg|png|webp)$/;

export function isStoredName(name: string): boolean {
  return STORED_NAME.test(name);
}

/** The photos of an in-memory database go with it: the folder is removed when the process exits. */
async function temporaryFolder(): Promise<string> {
  const folder = await mkdtemp(path.join(tmpdir(), 'cablewright-photos-'));
  process.once('exit', () => rmSync(folder, { recursive: true, force: true }));
  return folder;
}

export function createPhotoStore(configured: string | null): PhotoStore {
  let ready: Promise<string> | null = null;
  const folder = () => {
    ready ??= configured ? mkdir(configured, { recursive: true, mode: 0o700 }).then(() => configured) : temporaryFolder();
    return ready;
  };
  const pathOf = async (storedName: string) => {
    if (!isStoredName(storedName)) throw new Error(`not a stored photo name: ${JSON.stringify(storedName)}`);
    const dir = await folder();
    const full = path.join(dir, storedName);
    if (path.dirname(full) !== path.resolve(dir)) throw new Error('a stored photo name left the photo folder');
    return full;
  };
  return {
    folder,
    async write(bytes, extension) {
      const storedName = `${randomBytes(16).toString('hex')}.${extension}`;
      await writeFile(await pathOf(storedName), bytes, { flag: 'wx', mode: 0o600 });
      return storedName;
    },
    async read(storedName) {
      return readFile(await pathOf(storedName));
    },
    async discard(storedName) {
      await rm(await pathOf(storedName), { force: true });
    },
  };
}
