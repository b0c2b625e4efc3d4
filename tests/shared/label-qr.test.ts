import jsQR from 'jsqr';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { cableDetailUrl, cableEndLabels, labelSheet, qrMatrix, qrSvg, QR_QUIET_ZONE_MODULES } from '@/shared/labels';
import { cableSchedule } from '@/shared/schedule';

/**
 * Label content and QR codes. The decoder (jsqr) is used here only: it reads a bitmap, so the
 * shipped SVG is turned into one by reading its path (the qrcode package draws each run of dark
 * modules as `M x y h n` / `m dx 0 h n` on a one-module grid).
 */
const WHERE = { appUrl: 'https://cablewright.example/', designId: 7, version: 2 };
const SCALE = 4;

function bitmap(size: number, dark: (x: number, y: number) => boolean) {
  const px = size * SCALE;
  const data = new Uint8ClampedArray(px * px * 4);
  for (let y = 0; y < px; y += 1) {
    for (let x = 0; x < px; x += 1) {
      const v = dark(Math.floor(x / SCALE), Math.floor(y / SCALE)) ? 0 : 255;
      data.set([v, v, v, 255], (y * px + x) * 4);
    }
  }
  return { data, width: px, height: px };
}

/** Rasterise the qrcode package's SVG: its viewBox, and the runs of its dark path. */
function rasterSvg(svg: string) {
  const size = Number(/viewBox="0 0 (\d+) \d+"/.exec(svg)![1]);
  const path = /<path[^>]*stroke="#000000"[^>]*d="([^"]+)"/.exec(svg)![1];
  const dark = new Set<string>();
  let x = 0;
  let y = 0;
  for (const [, cmd, a, b] of path.matchAll(/([MmHhVv])(-?[\d.]+)(?:\s(-?[\d.]+))?/g)) {
    if (cmd === 'M') [x, y] = [Number(a), Math.floor(Number(b))];
    else if (cmd === 'm') x += Number(a);
    else if (cmd === 'h') {
      for (let i = 0; i < Number(a); i += 1) dark.add(`${x + i},${y}`);
      x += Number(a);
    } else throw new Error(`unexpected path command ${cmd}`);
  }
  return bitmap(size, (cx, cy) => dark.has(`${cx},${cy}`));
}

describe('cable labels', () => {
  it('carry identifier, label, media, length and the cable’s address, one per end', () => {
    const row = cableSchedule(harborRoadV2()).cables[0];
    const [near, far] = cableEndLabels(row, WHERE);
    expect(near).toEqual({
      cableId: 'cable-a-01',
      end: 'a',
      label: 'HR-A-01',
      identifier: 'A01-40:1/A01-12:ctl-a.1', // ANSI/TIA-606 style: near end / far end
      here: 'A01-40:1',
      there: 'A01-12:ctl-a.1',
      media: 'cat6a',
      mediaName: 'Category 6A',
      lengthM: 3,
      lengthText: '3 m',
      url: 'https://cablewright.example/designs/7/versions/2/cables/cable-a-01',
    });
    expect(far).toMatchObject({ end: 'b', here: 'A01-12:ctl-a.1', there: 'A01-40:1', identifier: near.identifier });
    expect(labelSheet(cableSchedule(harborRoadV2()).cables, WHERE)).toHaveLength(56);
  });

  it('percent-encode ids in the address', () => {
    // RFC 3986 §2.1: reserved characters inside a path segment are percent-encoded.
    expect(cableDetailUrl(WHERE, 'k/1 #?é')).toBe('https://cablewright.example/designs/7/versions/2/cables/k%2F1%20%23%3F%C3%A9');
  });

  it('get a QR code that decodes to the cable’s address, from the SVG and from the module matrix', async () => {
    const row = cableSchedule(harborRoadV2()).cables[5];
    const [label] = cableEndLabels(row, WHERE);
    const svg = await qrSvg(label.url);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    const fromSvg = rasterSvg(svg);
    expect(jsQR(fromSvg.data, fromSvg.width, fromSvg.height)?.data).toBe(label.url);

    const { size, dark } = qrMatrix(label.url);
    const q = QR_QUIET_ZONE_MODULES; // ISO/IEC 18004 quiet zone: 4 modules (from memory)
    const framed = bitmap(size + 2 * q, (x, y) => x >= q && y >= q && x < size + q && y < size + q && dark[(y - q) * size + (x - q)]);
    expect(jsQR(framed.data, framed.width, framed.height)?.data).toBe(label.url);
  });

  it('decode to each cable’s own address, awkward ids included', async () => {
    for (const cableId of ['cable-a-01', 'k/1 #?é']) {
      const url = cableDetailUrl(WHERE, cableId);
      const image = rasterSvg(await qrSvg(url));
      expect(jsQR(image.data, image.width, image.height)?.data).toBe(url);
    }
  });
});
