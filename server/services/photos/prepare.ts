import { PHOTO_TYPES, type PhotoType } from '@/shared/api/build';
import { DamagedImageError, stripJpegLocation, stripPngMetadata, stripWebpMetadata } from './metadata';

/**
 * One upload judged by its content (the `file-type` package reads the magic numbers; the client's
 * file name and declared type are ignored) and, when it is a JPEG, PNG or WebP, stripped of its
 * location metadata (metadata.ts). `file-type` is an ES module only, so it is loaded with a dynamic
 * import(): this runs on the photo worker thread (photo-pool.ts), which loads TypeScript through tsx
 * and so can import ES modules under `npm start`, `npm run dev` and jest alike.
 */
export type PreparedPhoto =
  | { ok: true; contentType: PhotoType; extension: string; bytes: Uint8Array }
  | { ok: false; reason: 'type'; detected: string | null }
  | { ok: false; reason: 'damaged'; message: string };

const EXTENSIONS: Record<PhotoType, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };
const STRIP: Record<PhotoType, (bytes: Buffer) => Buffer> = {
  'image/jpeg': stripJpegLocation,
  'image/png': stripPngMetadata,
  'image/webp': stripWebpMetadata,
};

const isPhotoType = (mime: string | undefined): mime is PhotoType => (PHOTO_TYPES as readonly string[]).includes(mime ?? '');

export async function preparePhoto(bytes: Buffer): Promise<PreparedPhoto> {
  const { fileTypeFromBuffer } = await import('file-type');
  const detected = await fileTypeFromBuffer(bytes);
  if (!isPhotoType(detected?.mime)) return { ok: false, reason: 'type', detected: detected?.mime ?? null };
  try {
    const clean = STRIP[detected.mime](bytes);
    return { ok: true, contentType: detected.mime, extension: EXTENSIONS[detected.mime], bytes: new Uint8Array(clean) };
  } catch (error) {
    if (error instanceof DamagedImageError) return { ok: false, reason: 'damaged', message: error.message };
    throw error;
  }
}
