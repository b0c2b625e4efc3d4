import type { DiffValue, FieldChange } from '@/shared/diff/types';
import { rackHeightU, resolvedSite } from '@/shared/racks/geometry';
import { displayName } from '@/shared/topology/index';
import { positionOf } from '@/shared/topology/layout';
import type { PowerFeed, Rack, Topology } from '@/shared/topology/schema';

/**
 * The document's own fields, and the layout count. `format` is not compared: both documents have
 * been read as format 2 before they get here (format 1 is upgraded on read).
 *
 * The room is part of the document too: the site's pitches and slack (absent reads as the format's
 * defaults, so writing a default out is no change), and each rack and power feed, added, removed
 * or changed, as one field `rack <id>` / `power feed <id>` whose value describes it in words.
 */
export function documentChanges(before: Topology, after: Topology): FieldChange[] {
  const changes: FieldChange[] = [];
  if (before.name !== after.name) changes.push({ field: 'name', before: before.name, after: after.name });
  // The format page: `security` is optional and reads as CHAP "none" when absent.
  const chapBefore = before.security?.chap ?? 'none';
  const chapAfter = after.security?.chap ?? 'none';
  if (chapBefore !== chapAfter) changes.push({ field: 'security.chap', before: chapBefore, after: chapAfter });
  const siteBefore = resolvedSite(before);
  const siteAfter = resolvedSite(after);
  for (const key of ['rackPitchMm', 'rowPitchMm', 'slackM'] as const) {
    if (siteBefore[key] !== siteAfter[key]) changes.push({ field: `site.${key}`, before: siteBefore[key], after: siteAfter[key] });
  }
  listChanges(changes, 'rack', before.racks ?? [], after.racks ?? [], rackText);
  listChanges(changes, 'power feed', before.powerFeeds ?? [], after.powerFeeds ?? [], (feed) => displayName(feed));
  return changes;
}

function rackText(rack: Rack): string {
  const where = [rack.row !== undefined ? `row ${rack.row}` : null, rack.position !== undefined ? `position ${rack.position}` : null].filter(Boolean);
  return `${displayName(rack)}${where.length ? `, ${where.join(', ')}` : ''}, ${rackHeightU(rack)}U`;
}

/** One change per id whose description differs, ids in code-unit order. */
function listChanges<T extends Rack | PowerFeed>(changes: FieldChange[], word: string, before: T[], after: T[], text: (item: T) => string): void {
  const was = new Map<string, DiffValue>(before.map((item) => [item.id, text(item)]));
  const now = new Map<string, DiffValue>(after.map((item) => [item.id, text(item)]));
  const ids = [...new Set([...was.keys(), ...now.keys()])].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  for (const id of ids) {
    const b = was.get(id) ?? null;
    const a = now.get(id) ?? null;
    if (b !== a) changes.push({ field: `${word} ${id}`, before: b, after: a });
  }
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
