import { deviceShape } from '@/shared/layout/shape';
import { emptyRecord, type IdRecord } from '@/shared/keys/record';
import type { Device, Position } from '@/shared/topology/schema';

/** Space between boxes in a band and between bands, on the canvas's 20 px grid. */
export const BAND_GAP_X = 40;
export const BAND_GAP_Y = 120;
const GRID = 20;
/** A band wider than this wraps onto further rows, as the canvas's auto-arrange does. */
export const MAX_BAND_WIDTH = 3200;

const snap = (value: number) => Math.round(value / GRID) * GRID;

/**
 * Positions for devices in horizontal bands, top band first (hosts, then switches, then arrays in the
 * patterns, as the canvas's auto-arrange does). Each box is placed by its drawn size, so none overlap,
 * and every band is centred under the widest one; a band wider than MAX_BAND_WIDTH wraps onto more rows.
 */
export function layoutBands(bands: Device[][], origin: Position = { x: 40, y: 40 }): IdRecord<Position> {
  const sized = bands.flatMap((band) => wrap(band.map((device) => ({ device, shape: deviceShape(device) }))));
  const widthOf = (band: typeof sized[number]) =>
    band.reduce((sum, { shape }) => sum + shape.width, 0) + BAND_GAP_X * Math.max(0, band.length - 1);
  const widest = Math.max(0, ...sized.map(widthOf));
  const layout = emptyRecord<Position>();
  let y = origin.y;
  for (const band of sized) {
    if (band.length === 0) continue;
    let x = origin.x + snap((widest - widthOf(band)) / 2);
    for (const { device, shape } of band) {
      layout[device.id] = { x, y };
      x += snap(shape.width + BAND_GAP_X);
    }
    y += snap(Math.max(...band.map(({ shape }) => shape.height)) + BAND_GAP_Y);
  }
  return layout;
}

function wrap<T extends { shape: { width: number } }>(band: T[]): T[][] {
  const rows: T[][] = [[]];
  let width = 0;
  for (const item of band) {
    const row = rows[rows.length - 1];
    if (row.length > 0 && width + BAND_GAP_X + item.shape.width > MAX_BAND_WIDTH) {
      rows.push([item]);
      width = item.shape.width;
    } else {
      width += (row.length > 0 ? BAND_GAP_X : 0) + item.shape.width;
      row.push(item);
    }
  }
  return rows;
}
