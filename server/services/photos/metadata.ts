import piexif from 'piexifjs';

/**
 * Metadata that can tell where a photo was taken, removed before a photo is stored.
 *
 * JPEG (ITU-T T.81 markers; EXIF in APP1 per CIPA DC-008): every APP1 EXIF segment is dropped and
 * replaced by a new EXIF segment that holds only the orientation (tag 274), so the picture still
 * shows the right way up; XMP (APP1 `http://ns.adobe.com/xap/1.0/` and its extension) and APP13
 * (Photoshop/IPTC, which holds place names) are dropped. Segments after the first scan are walked
 * too, so nothing hides behind the image data.
 * PNG (ISO/IEC 15948 chunks): eXIf and the text chunks (tEXt, zTXt, iTXt — where XMP lives) go.
 * WebP (RIFF): the EXIF and XMP chunks go and the VP8X flags saying they exist are cleared.
 *
 * A file whose structure cannot be walked is refused rather than stored as it came.
 */
export class DamagedImageError extends Error {}

const damaged = (what: string) => new DamagedImageError(`The ${what} file is damaged or cut short.`);

const EXIF_HEADER = Buffer.from('Exif\0\0', 'latin1');
const XMP_HEADERS = [Buffer.from('http://ns.adobe.com/xap/1.0/\0', 'latin1'), Buffer.from('http://ns.adobe.com/xmp/extension/\0', 'latin1')];
const ORIENTATION_TAG = 274;

const startsWith = (body: Buffer, prefix: Buffer) => body.length >= prefix.length && body.subarray(0, prefix.length).equals(prefix);

/** The EXIF orientation (1–8) of an APP1 EXIF body, or null when it has none or cannot be read. */
function readOrientation(body: Buffer): number | null {
  try {
    const value = piexif.load(body.toString('latin1'))['0th'][ORIENTATION_TAG];
    return typeof value === 'number' && Number.isInteger(value) && value >= 1 && value <= 8 ? value : null;
  } catch {
    return null;
  }
}

function orientationSegment(orientation: number): Buffer {
  const exif = Buffer.from(piexif.dump({ '0th': { [ORIENTATION_TAG]: orientation } }), 'latin1');
  const head = Buffer.from([0xff, 0xe1, 0, 0]);
  head.writeUInt16BE(exif.length + 2, 2);
  return Buffer.concat([head, exif]);
}

/** A marker with no length field: TEM, RST0–RST7 (T.81 §B.1.1.3). */
const standalone = (marker: number) => marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7);

/** Where the entropy-coded data after a scan header ends: the next marker that is not a stuffed 0xFF00 or a restart. */
function scanEnd(jpeg: Buffer, from: number): number {
  for (let i = from; i < jpeg.length - 1; i += 1) {
    if (jpeg[i] !== 0xff) continue;
    const next = jpeg[i + 1];
    if (next !== 0x00 && next !== 0xff && !(next >= 0xd0 && next <= 0xd7)) return i;
  }
  return jpeg.length;
}

function dropSegment(marker: number, body: Buffer): 'exif' | boolean {
  if (marker === 0xe1 && startsWith(body, EXIF_HEADER)) return 'exif';
  if (marker === 0xe1 && XMP_HEADERS.some((h) => startsWith(body, h))) return true;
  return marker === 0xed;
}

export function stripJpegLocation(jpeg: Buffer): Buffer {
  if (jpeg.length < 4 || jpeg[0] !== 0xff || jpeg[1] !== 0xd8) throw damaged('JPEG');
  const kept: Buffer[] = [];
  let orientation: number | null = null;
  let afterApp0 = 0;
  let pos = 2;
  while (pos < jpeg.length) {
    if (jpeg[pos] !== 0xff) throw damaged('JPEG');
    while (jpeg[pos + 1] === 0xff) pos += 1; // fill bytes before a marker
    const marker = jpeg[pos + 1];
    if (marker === undefined) throw damaged('JPEG');
    if (marker === 0xd9) {
      kept.push(jpeg.subarray(pos, pos + 2));
      pos += 2;
      break;
    }
    if (standalone(marker)) {
      kept.push(jpeg.subarray(pos, pos + 2));
      pos += 2;
      continue;
    }
    if (pos + 4 > jpeg.length) throw damaged('JPEG');
    const length = jpeg.readUInt16BE(pos + 2);
    const end = pos + 2 + length;
    if (length < 2 || end > jpeg.length) throw damaged('JPEG');
    const body = jpeg.subarray(pos + 4, end);
    const drop = dropSegment(marker, body);
    if (drop === 'exif') orientation ??= readOrientation(body);
    if (!drop) {
      kept.push(jpeg.subarray(pos, end));
      if (marker === 0xe0 && kept.length === 1) afterApp0 = 1;
    }
    pos = end;
    if (marker === 0xda) {
      const data = scanEnd(jpeg, pos);
      kept.push(jpeg.subarray(pos, data));
      pos = data;
    }
  }
  // Anything after the end-of-image marker is not part of the picture and is not kept.
  if (orientation !== null) kept.splice(afterApp0, 0, orientationSegment(orientation));
  return Buffer.concat([jpeg.subarray(0, 2), ...kept]);
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const PNG_DROPPED = new Set(['eXIf', 'tEXt', 'zTXt', 'iTXt']);

export function stripPngMetadata(png: Buffer): Buffer {
  if (!startsWith(png, PNG_SIGNATURE)) throw damaged('PNG');
  const kept: Buffer[] = [PNG_SIGNATURE];
  let pos = PNG_SIGNATURE.length;
  while (pos < png.length) {
    if (pos + 12 > png.length) throw damaged('PNG');
    const length = png.readUInt32BE(pos);
    const type = png.toString('latin1', pos + 4, pos + 8);
    const end = pos + 12 + length;
    if (end > png.length) throw damaged('PNG');
    if (!PNG_DROPPED.has(type)) kept.push(png.subarray(pos, end));
    pos = end;
    if (type === 'IEND') break;
  }
  return Buffer.concat(kept);
}

const VP8X_EXIF = 0x08;
const VP8X_XMP = 0x04;

export function stripWebpMetadata(webp: Buffer): Buffer {
  if (webp.length < 12 || webp.toString('latin1', 0, 4) !== 'RIFF' || webp.toString('latin1', 8, 12) !== 'WEBP') throw damaged('WebP');
  const kept: Buffer[] = [];
  let pos = 12;
  while (pos < webp.length) {
    if (pos + 8 > webp.length) throw damaged('WebP');
    const fourcc = webp.toString('latin1', pos, pos + 4);
    const size = webp.readUInt32LE(pos + 4);
    const end = pos + 8 + size + (size % 2);
    if (pos + 8 + size > webp.length) throw damaged('WebP');
    if (fourcc !== 'EXIF' && fourcc !== 'XMP ') {
      const chunk = Buffer.from(webp.subarray(pos, Math.min(end, webp.length)));
      if (fourcc === 'VP8X' && size > 0) chunk[8] &= ~(VP8X_EXIF | VP8X_XMP);
      kept.push(chunk);
    }
    pos = end;
  }
  const body = Buffer.concat(kept);
  const header = Buffer.from('RIFF\0\0\0\0WEBP', 'latin1');
  header.writeUInt32LE(body.length + 4, 4);
  return Buffer.concat([header, body]);
}
