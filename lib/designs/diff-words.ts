import type { DiffSectionName, DiffValue, FieldChange, SectionCounts, TopologyDiff } from '@/shared/diff';
import { plural } from '@/lib/designs/summary';

/** Field names of the diff (shared/diff/sections.ts) in the words the screens use. */
const FIELD_WORDS: Record<string, string> = {
  name: 'name',
  kind: 'kind',
  role: 'role',
  rack: 'rack',
  ru: 'rack unit',
  heightU: 'height (U)',
  psus: 'power supplies',
  iqn: 'iSCSI name',
  device: 'device',
  group: 'controller or card',
  speedGbps: 'speed (Gb/s)',
  connector: 'connector',
  network: 'network',
  address: 'address',
  a: 'end A',
  b: 'end B',
  media: 'media',
  lengthM: 'length (m)',
  label: 'label',
  purpose: 'purpose',
  cidr: 'subnet',
  vlan: 'VLAN',
  mtu: 'MTU',
  gateway: 'gateway',
  'security.chap': 'CHAP',
  'site.rackPitchMm': 'rack pitch (mm)',
  'site.rowPitchMm': 'row pitch (mm)',
  'site.slackM': 'cable slack (m)',
};

export const SECTION_TITLES: Record<DiffSectionName, string> = {
  devices: 'Devices',
  groups: 'Controllers and cards',
  ports: 'Ports',
  addresses: 'Addresses',
  cables: 'Cables',
  networks: 'Networks',
};

/** Sections in the order a reviewer reads a change: what is there, how it is joined, how it is addressed. */
export const SECTION_ORDER: readonly DiffSectionName[] = ['devices', 'groups', 'ports', 'cables', 'networks', 'addresses'];

export function fieldWord(field: string): string {
  return FIELD_WORDS[field] ?? field;
}

export function valueText(value: DiffValue): string {
  if (value === null) return 'none';
  return String(value);
}

/** "speed (Gb/s): 10 → 25"; an added thing's field reads "speed (Gb/s): 10", a removed one's "was 10". */
export function changeText(change: FieldChange, kind: 'added' | 'removed' | 'changed'): string {
  const field = fieldWord(change.field);
  if (kind === 'added') return `${field}: ${valueText(change.after)}`;
  if (kind === 'removed') return `${field}: was ${valueText(change.before)}`;
  return `${field}: ${valueText(change.before)} → ${valueText(change.after)}`;
}

export function countsText(counts: SectionCounts): string {
  const parts = [
    counts.added ? `${counts.added} added` : null,
    counts.removed ? `${counts.removed} removed` : null,
    counts.changed ? `${counts.changed} changed` : null,
  ].filter(Boolean);
  return parts.length ? parts.join(', ') : 'no changes';
}

/** The one-line verdict over the whole diff, layout moves said apart (they are not design changes). */
export function diffHeadline(diff: TopologyDiff): string {
  const moved = diff.layoutMoved ? ` (${plural(diff.layoutMoved, 'device')} moved on the canvas)` : '';
  if (diff.empty) return `No differences in the design${moved}.`;
  return `${plural(diff.counts.total, 'difference')}${moved}.`;
}
