import { rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import piexif from 'piexifjs';
import { loadConfig } from '@/server/config';
import { DamagedImageError, stripJpegLocation, stripWebpMetadata } from '@/server/services/photos/metadata';
import { createPhotoStore } from '@/server/services/photos/store';
import { TEST_ENV } from './helpers/app';
import { JPEG_8X8, jpegWithLocation, WEBP_1X1 } from './helpers/build';

/** The photo folder's configuration, the store, and the metadata stripping on its own. */
describe('the photo folder', () => {
  it('is PHOTOS_DIR, else photos/ beside the database file, else (in memory) a temporary folder', () => {
    expect(loadConfig({ ...TEST_ENV, DATABASE_PATH: 'data/cablewright.sqlite' }).photosDir).toBe(path.resolve('data/photos'));
    expect(loadConfig({ ...TEST_ENV, PHOTOS_DIR: '/srv/cablewright/photos' }).photosDir).toBe('/srv/cablewright/photos');
    expect(loadConfig({ ...TEST_ENV, DATABASE_PATH: ':memory:' }).photosDir).toBeNull();
  });

  it('is never inside the web app folder', () => {
    expect(() => loadConfig({ ...TEST_ENV, WEB_DIR: '/srv/web', PHOTOS_DIR: '/srv/web/photos' })).toThrow(/PHOTOS_DIR: must not be inside the web app folder/);
    expect(() => loadConfig({ ...TEST_ENV, WEB_DIR: '/srv/web', PHOTOS_DIR: '/srv/web' })).toThrow(/PHOTOS_DIR/);
    expect(loadConfig({ ...TEST_ENV, WEB_DIR: '/srv/web', PHOTOS_DIR: '/srv/web-photos' }).photosDir).toBe('/srv/web-photos');
  });

  it('for an in-memory database is a fresh temporary folder; files get random names and owner-only access', async () => {
    const store = createPhotoStore(null);
    const folder = await store.folder();
    try {
      expect(path.dirname(folder)).toBe(path.resolve(tmpdir()));
      const name = await store.write(new Uint8Array([1, 2, 3]), 'png');
      expect(name).toMatch(/^[0-9a-f]{32}\.png$/);
      expect([...(await store.read(name))]).toEqual([1, 2, 3]);
      expect(statSync(path.join(folder, name)).mode & 0o777).toBe(0o600);
      await expect(store.read('../etc/passwd')).rejects.toThrow(/not a stored photo name/);
      await store.discard(name);
      await expect(store.read(name)).rejects.toMatchObject({ code: 'ENOENT' });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});

describe('removing location metadata', () => {
  it('keeps a JPEG without metadata as it is', () => {
    expect(stripJpegLocation(JPEG_8X8).equals(JPEG_8X8)).toBe(true);
  });

  it('removes an EXIF segment hidden after the image data, too', () => {
    const exif = Buffer.from(piexif.dump({ GPS: { [piexif.GPSIFD.GPSLatitudeRef]: 'N' } }), 'latin1');
    const segment = Buffer.concat([Buffer.from([0xff, 0xe1, (exif.length + 2) >> 8, (exif.length + 2) & 0xff]), exif]);
    const eoi = JPEG_8X8.length - 2;
    const sneaky = Buffer.concat([JPEG_8X8.subarray(0, eoi), segment, JPEG_8X8.subarray(eoi)]);
    expect(stripJpegLocation(sneaky).equals(JPEG_8X8)).toBe(true);
  });

  it('keeps the orientation in a segment of its own right after JFIF', () => {
    const out = stripJpegLocation(jpegWithLocation());
    expect(out.subarray(0, 4).equals(Buffer.from([0xff, 0xd8, 0xff, 0xe0]))).toBe(true);
    const app0Length = out.readUInt16BE(4);
    expect(out.subarray(4 + app0Length, 4 + app0Length + 2).equals(Buffer.from([0xff, 0xe1]))).toBe(true);
    expect(piexif.load(out.toString('latin1'))['0th']).toEqual({ [piexif.ImageIFD.Orientation]: 6 });
  });

  it('refuses a JPEG whose segments run past its end', () => {
    const cut = Buffer.from([0xff, 0xd8, 0xff, 0xe1, 0x10, 0x00, 0x45]);
    expect(() => stripJpegLocation(cut)).toThrow(DamagedImageError);
  });

  it('drops EXIF and XMP chunks from a WebP and clears their VP8X flags', () => {
    const chunk = (fourcc: string, data: Buffer) => {
      const head = Buffer.alloc(8);
      head.write(fourcc, 0, 'latin1');
      head.writeUInt32LE(data.length, 4);
      return Buffer.concat([head, data, data.length % 2 ? Buffer.alloc(1) : Buffer.alloc(0)]);
    };
    // WebP container (RIFF): VP8X with the EXIF (0x08) and XMP (0x04) flags, the image, then the metadata chunks.
    const vp8x = chunk('VP8X', Buffer.from([0x0c, 0, 0, 0, 0, 0, 0, 0, 0, 0]));
    const image = WEBP_1X1.subarray(12);
    const body = Buffer.concat([vp8x, image, chunk('EXIF', Buffer.from('MM\0*GPS', 'latin1')), chunk('XMP ', Buffer.from('<x:xmpmeta/>'))]);
    const riff = Buffer.concat([Buffer.from('RIFF', 'latin1'), Buffer.alloc(4), Buffer.from('WEBP', 'latin1'), body]);
    riff.writeUInt32LE(riff.length - 8, 4);
    const out = stripWebpMetadata(riff);
    expect(out.readUInt32LE(4)).toBe(out.length - 8);
    expect(out.includes(Buffer.from('EXIF'))).toBe(false);
    expect(out.includes(Buffer.from('XMP '))).toBe(false);
    expect(out[20]).toBe(0); // the VP8X flags byte (RIFF header 12 + chunk header 8)
    expect(out.subarray(12 + vp8x.length).equals(image)).toBe(true);
  });
});
