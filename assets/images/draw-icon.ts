/**
 * Draws Cablewright's icon (two ports joined by two separate cables, on deep teal) as PNG files with
 * nothing but zlib, so the icon is ours and needs no download. Run: npx tsx assets/images/draw-icon.ts
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';

type RGB = [number, number, number];
const TEAL: RGB = [0x0f, 0x3d, 0x3e];
const PAPER: RGB = [0xf6, 0xf5, 0xf1];
const COPPER: RGB = [0xd0, 0x8a, 0x5a];

/** Points along a quadratic Bézier curve, for distance tests. */
function curve(p0: number[], p1: number[], p2: number[], steps = 48): number[][] {
  return Array.from({ length: steps + 1 }, (_, i) => {
    const t = i / steps;
    const a = (1 - t) ** 2, b = 2 * (1 - t) * t, c = t ** 2;
    return [a * p0[0] + b * p1[0] + c * p2[0], a * p0[1] + b * p1[1] + c * p2[1]];
  });
}
const cables = [curve([0.2, 0.33], [0.5, 0.12], [0.8, 0.33]), curve([0.2, 0.67], [0.5, 0.88], [0.8, 0.67])];

function nearCurve(x: number, y: number, points: number[][], half: number): boolean {
  return points.some(([px, py]) => (px - x) ** 2 + (py - y) ** 2 <= half * half);
}

/** Colour at a point of the unit square, or null outside the rounded background. */
function shade(x: number, y: number): RGB | null {
  const r = 0.2, cx = Math.min(Math.max(x, r), 1 - r), cy = Math.min(Math.max(y, r), 1 - r);
  if ((x - cx) ** 2 + (y - cy) ** 2 > r * r) return null;
  for (const [px, py] of [[0.2, 0.5], [0.8, 0.5]]) if ((x - px) ** 2 + (y - py) ** 2 <= 0.11 ** 2) return COPPER;
  if (cables.some((c) => nearCurve(x, y, c, 0.045))) return PAPER;
  if ((Math.abs(x - 0.2) <= 0.04 || Math.abs(x - 0.8) <= 0.04) && y > 0.33 && y < 0.67) return PAPER;
  return TEAL;
}

function render(size: number): Buffer {
  const ss = 4; // 4×4 supersampling smooths the edges
  const rows: Buffer[] = [];
  for (let py = 0; py < size; py++) {
    const row = Buffer.alloc(1 + size * 4);
    for (let px = 0; px < size; px++) {
      let r = 0, g = 0, b = 0, a = 0;
      for (let sy = 0; sy < ss; sy++) for (let sx = 0; sx < ss; sx++) {
        const c = shade((px + (sx + 0.5) / ss) / size, (py + (sy + 0.5) / ss) / size);
        if (c) { r += c[0]; g += c[1]; b += c[2]; a++; }
      }
      const o = 1 + px * 4;
      if (a) { row[o] = r / a; row[o + 1] = g / a; row[o + 2] = b / a; }
      row[o + 3] = Math.round((a / (ss * ss)) * 255);
    }
    rows.push(row);
  }
  return png(size, size, Buffer.concat(rows));
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(buf: Buffer): number {
  let c = 0xffffffff;
  for (const byte of buf) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4); len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4); crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}
/** PNG: signature, IHDR (8-bit RGBA), IDAT (filter byte 0 per row, deflated), IEND (ISO/IEC 15948). */
function png(width: number, height: number, raw: Buffer): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0); ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; ihdr[9] = 6; ihdr[10] = 0; ihdr[11] = 0; ihdr[12] = 0;
  const sig = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([sig, chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

for (const [name, size] of [['favicon.png', 64], ['icon.png', 512]] as const) {
  writeFileSync(join(__dirname, name), render(size));
  console.log(`wrote assets/images/${name} (${size}×${size})`);
}
