import type { FieldChange } from '@/shared/diff/types';
import { positionOf } from '@/shared/topology/layout';
import type { Topology } from '@/shared/topology/schema';

/**
 * The document's own fields, and the layout count. `format` is not compared: both documents have
 * been read as format 1 before they get here (older formats are migrated on import).
 */
export function documentChanges(before: Topology, after: Topology): FieldChange[] {
  const changes: FieldChange[] = [];
  if (before.name !== after.name) changes.push({ field: 'name', before: before.name, after: after.name });
  // The format page: `security` is optional and reads as CHAP "none" when absent.
  const chapBefore = before.security?.chap ?? 'none';
  const chapAfter = after.security?.chap ?? 'none';
  if (chapBefore !== chapAfter) changes.push({ field: 'security.chap', before: chapBefore, after: chapAfter });
  return changes;
}

/**
 * Devices present in both versions whose canvas position differs, including one that gained or lost
 * a position. Positions of removed or added devices, and stale layout keys that name no device, are
 * not counted: they are already covered by the device entries or are no design at all.
 */
export function countLayoutMoved(before: Topology, after: Topology): number {
  const afterIds = new Set(after.devices.map((d) => d.id));
  let moved = 0;
  for (const device of before.devices) {
    if (!afterIds.has(device.id)) continue;
    const b = positionOf(before, device.id);
    const a = positionOf(after, device.id);
    if (!b && !a) continue;
    if (!b || !a || b.x !== a.x || b.y !== a.y) moved += 1;
  }
  return moved;
}
