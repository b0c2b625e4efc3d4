import type { Connector, Device, PortRole } from '@/shared/topology/schema';

/**
 * The drawn shape of one device in its own coordinates (top-left at 0,0): a header with the name,
 * then its controllers or cards side by side as labelled groups, each holding its ports in rows.
 * A switch has no groups; its ports sit in rows of twelve under the header. Sizes follow only from
 * the device's structure, so a shape is computed once per device object and cached: commands keep
 * an unchanged device's identity, and moving a device never recomputes its shape. Pure geometry, shared by
 * the canvas and the pattern builders, so a pattern lays out boxes that do not overlap when drawn.
 */
export type Point = { x: number; y: number };
export type Rect = { x: number; y: number; width: number; height: number };

/** Every port's tap target is at least 44 × 44 px at zoom 1 (WCAG 2.2 SC 2.5.5 target size). */
export const PORT_PITCH = 44;
/** The drawn port, centred in its tap target. */
export const PORT_SIZE = 30;
export const HEADER_HEIGHT = 32;
export const PADDING = 8;
export const GROUP_LABEL_HEIGHT = 18;
export const GROUP_PADDING = 4;
export const GROUP_GAP = 8;
export const MIN_DEVICE_WIDTH = 140;
export const SWITCH_PORTS_PER_ROW = 12;
export const GROUP_PORTS_PER_ROW = 8;

export type LocalPort = { id: string; name: string; role: PortRole; connector: Connector; groupId?: string; rect: Rect; target: Rect; anchor: Point };
export type LocalGroup = { id: string; name: string; rect: Rect };
export type DeviceShape = { width: number; height: number; header: Rect; groups: LocalGroup[]; ports: LocalPort[] };

type PortLike = { id: string; name: string; role: PortRole; connector: Connector };

function layPorts(ports: PortLike[], left: number, top: number, perRow: number, groupId: string | undefined, out: LocalPort[]): void {
  const inset = (PORT_PITCH - PORT_SIZE) / 2;
  ports.forEach((port, i) => {
    const x = left + (i % perRow) * PORT_PITCH;
    const y = top + Math.floor(i / perRow) * PORT_PITCH;
    out.push({
      id: port.id,
      name: port.name,
      role: port.role,
      connector: port.connector,
      groupId,
      target: { x, y, width: PORT_PITCH, height: PORT_PITCH },
      rect: { x: x + inset, y: y + inset, width: PORT_SIZE, height: PORT_SIZE },
      anchor: { x: x + PORT_PITCH / 2, y: y + PORT_PITCH / 2 },
    });
  });
}

function gridSize(count: number, perRow: number): { columns: number; rows: number } {
  return { columns: Math.max(1, Math.min(count, perRow)), rows: Math.max(1, Math.ceil(count / perRow)) };
}

function switchShape(ports: PortLike[]): DeviceShape {
  const { columns, rows } = gridSize(ports.length, SWITCH_PORTS_PER_ROW);
  const width = Math.max(MIN_DEVICE_WIDTH, columns * PORT_PITCH + 2 * PADDING);
  const height = HEADER_HEIGHT + rows * PORT_PITCH + PADDING;
  const out: LocalPort[] = [];
  // Centre the rows so a small switch does not hang its ports off to the left.
  const left = (width - columns * PORT_PITCH) / 2;
  layPorts(ports, left, HEADER_HEIGHT, SWITCH_PORTS_PER_ROW, undefined, out);
  return { width, height, header: { x: 0, y: 0, width, height: HEADER_HEIGHT }, groups: [], ports: out };
}

function groupedShape(groups: { id: string; name: string; ports: PortLike[] }[]): DeviceShape {
  const localGroups: LocalGroup[] = [];
  const ports: LocalPort[] = [];
  let x = PADDING;
  let tallest = PORT_PITCH;
  for (const group of groups) {
    const { columns, rows } = gridSize(group.ports.length, GROUP_PORTS_PER_ROW);
    const width = columns * PORT_PITCH + 2 * GROUP_PADDING;
    const height = GROUP_LABEL_HEIGHT + rows * PORT_PITCH + GROUP_PADDING;
    localGroups.push({ id: group.id, name: group.name, rect: { x, y: HEADER_HEIGHT, width, height } });
    layPorts(group.ports, x + GROUP_PADDING, HEADER_HEIGHT + GROUP_LABEL_HEIGHT, GROUP_PORTS_PER_ROW, group.id, ports);
    tallest = Math.max(tallest, height);
    x += width + GROUP_GAP;
  }
  const content = groups.length > 0 ? x - GROUP_GAP + PADDING : 0;
  const width = Math.max(MIN_DEVICE_WIDTH, content);
  const height = HEADER_HEIGHT + tallest + PADDING;
  return { width, height, header: { x: 0, y: 0, width, height: HEADER_HEIGHT }, groups: localGroups, ports };
}

const cache = new WeakMap<Device, DeviceShape>();

export function deviceShape(device: Device): DeviceShape {
  const cached = cache.get(device);
  if (cached) return cached;
  let shape: DeviceShape;
  if (device.kind === 'switch') shape = switchShape(device.ports);
  else shape = groupedShape(device.kind === 'array' ? device.controllers : device.adapters);
  cache.set(device, shape);
  return shape;
}
