import type { Topology } from '@/shared/topology/schema';
import { iteratePorts } from '@/shared/topology/index';

/**
 * Readable, deterministic ids for what the editor adds: `host-3`, `host-3-card-2-p1`, `cable-17`.
 * The same document and the same command always give the same ids, so tests, undo and two tabs
 * agree; uniqueness is checked against every id in the document (the format requires it).
 */
export function collectIds(doc: Topology): Set<string> {
  const ids = new Set<string>();
  for (const rack of doc.racks ?? []) ids.add(rack.id);
  for (const feed of doc.powerFeeds ?? []) ids.add(feed.id);
  for (const device of doc.devices) {
    ids.add(device.id);
    for (const psu of device.psus ?? []) ids.add(psu.id);
    if (device.kind === 'array') for (const c of device.controllers) ids.add(c.id);
    if (device.kind === 'host') for (const a of device.adapters) ids.add(a.id);
  }
  for (const ref of iteratePorts(doc)) ids.add(ref.port.id);
  for (const cable of doc.cables) ids.add(cable.id);
  for (const network of doc.networks) ids.add(network.id);
  return ids;
}

/** `base` when free, else `base-2`, `base-3`, …; the result is added to `taken`. */
export function claimId(taken: Set<string>, base: string): string {
  let id = base;
  for (let n = 2; taken.has(id); n += 1) id = `${base}-${n}`;
  taken.add(id);
  return id;
}

/**
 * The lowest n ≥ 1 for which `${prefix}-${n}` is neither an id nor a device name in the document:
 * the palette numbers hosts `host-1`, `host-2`, … and fills the gap a deleted one left.
 */
export function nextNumberedName(doc: Topology, prefix: string, taken: Set<string> = collectIds(doc)): string {
  const names = new Set(doc.devices.map((d) => d.name));
  for (let n = 1; ; n += 1) {
    const candidate = `${prefix}-${n}`;
    if (!taken.has(candidate) && !names.has(candidate)) return candidate;
  }
}

/**
 * The next cable number: one above the highest `cable-N` id or `C<N>` label in the document.
 * A label may already be printed and stuck on a cable in the room, so a number must not come back
 * for another cable: the document alone cannot remember a deleted newest cable, so the store keeps
 * a floor across the session and the saved version (cablePorts' `numberFloor`).
 */
export function nextCableNumber(doc: Topology): number {
  let highest = 0;
  for (const cable of doc.cables) {
    const fromId = /^cable-(\d+)$/.exec(cable.id);
    const fromLabel = cable.label ? /^C(\d+)$/.exec(cable.label) : null;
    for (const match of [fromId, fromLabel]) if (match) highest = Math.max(highest, Number(match[1]));
  }
  return highest + 1;
}

/** Our printed cable label: `C` and the number, at least three digits (`C007`, `C117`, `C1024`). */
export function cableLabel(n: number): string {
  return `C${String(n).padStart(3, '0')}`;
}

/** `fabric C` → `fabric-c`: the readable part of a network id. */
export function slug(text: string): string {
  const cleaned = text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return cleaned.slice(0, 40);
}
