import jsQR from 'jsqr';
import QRCode from 'qrcode';
import { qrPath } from '@/lib/labels/qr-path';
import { labelsPerPage, LABEL_STOCKS, mmToPx, PAPERS, readLabelSettings, writeLabelSettings, DEFAULT_LABEL_SETTINGS } from '@/lib/labels/stock';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { cableDetailUrl, labelSheet } from '@/shared/labels';
import { cableSchedule } from '@/shared/schedule';

/**
 * The QR code a printed label carries decodes, with a general-purpose decoder (jsQR), to the app
 * address of that cable's detail. The test reads back the very path the label sheet draws.
 */
function rasterise(path: string, size: number, scale = 4): { data: Uint8ClampedArray; width: number; height: number } {
  const width = size * scale;
  const data = new Uint8ClampedArray(width * width * 4).fill(255);
  for (const [, xs, ys] of path.matchAll(/M(\d+) (\d+)h1v1h-1z/g)) {
    const x0 = Number(xs) * scale;
    const y0 = Number(ys) * scale;
    for (let y = y0; y < y0 + scale; y += 1) {
      for (let x = x0; x < x0 + scale; x += 1) {
        const i = (y * width + x) * 4;
        data[i] = data[i + 1] = data[i + 2] = 0;
      }
    }
  }
  return { data, width, height: width };
}

const where = { appUrl: 'https://cablewright.example/', designId: 7, version: 3 };

describe('label QR codes', () => {
  const schedule = cableSchedule(harborRoadV2());
  const labels = labelSheet(schedule.cables, where);

  it('decode to the cable detail address of the cable on the label, on every label of the demo', () => {
    expect(labels).toHaveLength(2 * schedule.cables.length);
    for (const label of labels) {
      const { path, size } = qrPath(label.url);
      const image = rasterise(path, size);
      const decoded = jsQR(image.data, image.width, image.height);
      expect(decoded?.data).toBe(`https://cablewright.example/designs/7/versions/3/cables/${encodeURIComponent(label.cableId)}`);
    }
  });

  it('decode an id that needs percent-encoding (RFC 3986 §2.1) back to the same address', () => {
    const url = cableDetailUrl(where, 'fab a/__proto__?#');
    const { path, size } = qrPath(url);
    const image = rasterise(path, size);
    expect(jsQR(image.data, image.width, image.height)?.data).toBe(url);
    expect(new URL(url).pathname.split('/').pop()).toBe('fab%20a%2F__proto__%3F%23');
  });

  it('draws the same modules as the qrcode package itself, with a 4-module quiet zone (ISO/IEC 18004, from memory)', () => {
    const url = labels[0].url;
    const { path, size } = qrPath(url);
    const modules = QRCode.create(url, { errorCorrectionLevel: 'M' }).modules;
    expect(size).toBe(modules.size + 8);
    expect(path.match(/M/g)?.length).toBe(Array.from(modules.data).filter((bit) => bit === 1).length);
  });
});

describe('label stock and paper', () => {
  it('turns millimetres into CSS px at 96 px to the inch (CSS Values 4 §6.2)', () => {
    expect(mmToPx(25.4)).toBeCloseTo(96, 10);
  });

  it('fits labels inside the printable area of A4 (ISO 216, 210 × 297 mm) and US Letter (8.5 × 11 in)', () => {
    for (const stock of LABEL_STOCKS) {
      for (const page of PAPERS) {
        const { across, down } = labelsPerPage(stock, page.id);
        expect(across * stock.widthMm + (across - 1) * 2).toBeLessThanOrEqual(page.widthMm - 20);
        expect((across + 1) * stock.widthMm + across * 2).toBeGreaterThan(page.widthMm - 20);
        expect(down * stock.heightMm + (down - 1) * 2).toBeLessThanOrEqual(page.heightMm - 20);
      }
    }
    // Letter is 215.9 mm wide (ANSI/ASME Y14.1): wider than A4, and shorter.
    expect(PAPERS.find((p) => p.id === 'letter')?.widthMm).toBeCloseTo(8.5 * 25.4, 6);
  });

  it('keeps the chosen stock and paper, and falls back on anything it does not know', () => {
    const store = new Map<string, string>();
    const storage = { getItem: (k: string) => store.get(k) ?? null, setItem: (k: string, v: string) => void store.set(k, v) };
    expect(readLabelSettings(storage)).toEqual(DEFAULT_LABEL_SETTINGS);
    writeLabelSettings({ stock: 'flag', paper: 'letter' }, storage);
    expect(readLabelSettings(storage)).toEqual({ stock: 'flag', paper: 'letter' });
    store.set('cablewright.label-settings', '{"stock":"__proto__","paper":"tabloid"}');
    expect(readLabelSettings(storage)).toEqual(DEFAULT_LABEL_SETTINGS);
    store.set('cablewright.label-settings', 'not json');
    expect(readLabelSettings(storage)).toEqual(DEFAULT_LABEL_SETTINGS);
  });
});
