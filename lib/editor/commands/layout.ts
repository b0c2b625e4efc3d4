import { z } from 'zod';
import { ownRecordSchema } from '@/shared/keys/record-schema';
import { positionOf, withPositions } from '@/shared/topology/layout';
import type { Position, Topology } from '@/shared/topology/schema';
import { computeArrangement } from '@/lib/editor/arrange';
import { command } from '@/lib/editor/commands/define';
import { deviceById } from '@/lib/editor/commands/doc';
import { CommandError } from '@/lib/editor/errors';
import { deviceShape } from '@/lib/editor/shape';
import { resolvePositions } from '@/lib/editor/snapshot';
import { GRID_SIZE, snapToGrid } from '@/lib/editor/viewport';

/**
 * Canvas positions. They live in the document's `layout`, so a saved version opens as it was
 * drawn; they never affect the analysis. Snapping is the caller's choice (`snapToGrid`), so a
 * drag can follow the pointer smoothly and snap once it settles, or snap all along. Positions are
 * keyed by device id, so they are read and written through shared/topology/layout.ts and checked
 * by a record schema that keeps every key (`__proto__` included).
 */
const point = z.object({ x: z.number().finite(), y: z.number().finite() }).strict();

export type MoveDeviceArgs = { id: string; x: number; y: number };
export type MoveDevicesArgs = { positions: Record<string, Position> };
export type AutoArrangeArgs = { origin?: Position };

export function moveDevices(doc: Topology, args: MoveDevicesArgs): Topology {
  const entries = Object.entries(args.positions);
  if (entries.length === 0) return doc;
  const moves: [string, Position][] = [];
  for (const [id, p] of entries) {
    deviceById(doc, id);
    if (!Number.isFinite(p.x) || !Number.isFinite(p.y)) throw new CommandError('bad-args', 'A position needs finite x and y.', `positions.${id}`);
    const old = positionOf(doc, id);
    if (old && old.x === p.x && old.y === p.y) continue;
    moves.push([id, { x: p.x, y: p.y }]);
  }
  return moves.length > 0 ? { ...doc, layout: withPositions(doc.layout, moves) } : doc;
}

export function moveDevice(doc: Topology, args: MoveDeviceArgs): Topology {
  return moveDevices(doc, { positions: withPositions(undefined, [[args.id, { x: args.x, y: args.y }]]) });
}

/** Replaces every device's position with the layered arrangement; nothing else changes. */
export function autoArrange(doc: Topology, args: AutoArrangeArgs = {}): Topology {
  return { ...doc, layout: computeArrangement(doc, { origin: args.origin }) };
}

/**
 * Where a new device goes when the palette gives no position: right of everything drawn, level
 * with the top of the drawing, on the grid.
 */
export function freeSpot(doc: Topology): Position {
  const positions = resolvePositions(doc);
  let right = -Infinity;
  let top = Infinity;
  for (const device of doc.devices) {
    const p = positions.get(device.id)!;
    right = Math.max(right, p.x + deviceShape(device).width);
    top = Math.min(top, p.y);
  }
  if (!Number.isFinite(right)) return { x: 0, y: 0 };
  return snapToGrid({ x: right + 2 * GRID_SIZE, y: top });
}

export const layoutCommands = [
  command('moveDevice', 'Move a device on the canvas', z.object({ id: z.string().min(1), x: z.number().finite(), y: z.number().finite() }).strict(), moveDevice),
  command('moveDevices', 'Move several devices at once', z.object({ positions: ownRecordSchema(point) }).strict(), moveDevices),
  command('autoArrange', 'Arrange hosts, switches and arrays in bands', z.object({ origin: point.optional() }).strict(), autoArrange),
];
