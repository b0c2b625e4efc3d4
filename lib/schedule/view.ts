import { MEDIA_NAMES } from '@/shared/rules/cables';
import { naturalCompare } from '@/shared/schedule/order';
import type { ScheduleRow } from '@/shared/schedule/types';
import type { Media } from '@/shared/topology/schema';

/**
 * The schedule screen's search, filters and sorting, kept out of the components so 10,000 rows are
 * handled by plain loops: every row's searchable text is lowered once, and a keystroke only scans it.
 */
export type SortKey = 'schedule' | 'label' | 'rack' | 'device' | 'media' | 'length' | 'network';
export type SortDirection = 'asc' | 'desc';
export type Sort = { key: SortKey; direction: SortDirection };

/** Filters of the wide table; null means "all". Rack and device match either end. */
export type ScheduleFilters = { rack: string | null; device: string; network: string | null; media: Media | null };

export const NO_FILTERS: ScheduleFilters = { rack: null, device: '', network: null, media: null };
export const SCHEDULE_ORDER: Sort = { key: 'schedule', direction: 'asc' };

/** The value of the network filter for cables that carry no network (between switches). */
export const NO_NETWORK = '\u0000none';

export type IndexedRow = { row: ScheduleRow; order: number; haystack: string; devices: string };

const lower = (text: string | null) => (text ?? '').toLocaleLowerCase();

/** Label, identifier, both ends' device, controller or card and port: what a person searches by. */
export function indexRows(rows: readonly ScheduleRow[]): IndexedRow[] {
  return rows.map((row, order) => {
    const devices = `${lower(row.a.device)}\n${lower(row.b.device)}`;
    const haystack = [row.label, row.identifier, row.a.device, row.a.part, row.a.port, row.b.device, row.b.part, row.b.port].map(lower).join('\n');
    return { row, order, haystack, devices };
  });
}

/** Every word of the query appears somewhere in the row (case-insensitive); an empty query keeps all. */
export function matchesQuery(item: IndexedRow, words: readonly string[]): boolean {
  for (const word of words) if (!item.haystack.includes(word)) return false;
  return true;
}

export function queryWords(query: string): string[] {
  return lower(query).split(/\s+/).filter(Boolean);
}

export function matchesFilters(item: IndexedRow, filters: ScheduleFilters): boolean {
  const { row } = item;
  if (filters.rack !== null && row.a.rack !== filters.rack && row.b.rack !== filters.rack) return false;
  if (filters.media !== null && row.media !== filters.media) return false;
  if (filters.network !== null && (row.network ?? NO_NETWORK) !== filters.network) return false;
  const device = lower(filters.device.trim());
  if (device !== '' && !item.devices.includes(device)) return false;
  return true;
}

function sortValue(row: ScheduleRow, key: SortKey): string | number | null {
  switch (key) {
    case 'label':
      return row.label;
    case 'rack':
      return row.a.rack === null ? null : `${row.a.rack}\u0000${String(row.a.ru ?? 0).padStart(3, '0')}`;
    case 'device':
      return row.a.device;
    case 'media':
      return MEDIA_NAMES[row.media];
    case 'length':
      return row.lengthM ?? row.stockLengthM ?? row.estimatedLengthM;
    case 'network':
      return row.network;
    default:
      return null;
  }
}

/** Natural order ("A02" before "A10", "p2" before "p10"); empty values last whichever way; ties in schedule order. */
export function sortRows(items: readonly IndexedRow[], sort: Sort): IndexedRow[] {
  const sorted = [...items];
  if (sort.key === 'schedule') {
    if (sort.direction === 'desc') sorted.reverse();
    return sorted;
  }
  const sign = sort.direction === 'asc' ? 1 : -1;
  const values = new Map(items.map((item) => [item, sortValue(item.row, sort.key)] as const));
  sorted.sort((x, y) => {
    const a = values.get(x) ?? null;
    const b = values.get(y) ?? null;
    if (a === null || b === null) return a === b ? x.order - y.order : a === null ? 1 : -1;
    const c = typeof a === 'number' && typeof b === 'number' ? a - b : naturalCompare(String(a), String(b));
    return c !== 0 ? sign * c : x.order - y.order;
  });
  return sorted;
}

/** Search, then filters, then order: the rows the screen shows. */
export function visibleRows(items: readonly IndexedRow[], query: string, filters: ScheduleFilters, sort: Sort): IndexedRow[] {
  const words = queryWords(query);
  const kept = items.filter((item) => matchesQuery(item, words) && matchesFilters(item, filters));
  return sortRows(kept, sort);
}

/** The choices of the rack, network and media filters: what the rows hold, in natural order. */
export function filterChoices(rows: readonly ScheduleRow[]): { racks: string[]; networks: string[]; media: Media[] } {
  const racks = new Set<string>();
  const networks = new Set<string>();
  const media = new Set<Media>();
  for (const row of rows) {
    if (row.a.rack !== null) racks.add(row.a.rack);
    if (row.b.rack !== null) racks.add(row.b.rack);
    networks.add(row.network ?? NO_NETWORK);
    media.add(row.media);
  }
  const byName = (a: string, b: string) => naturalCompare(a, b);
  return { racks: [...racks].sort(byName), networks: [...networks].sort(byName), media: [...media].sort(byName) as Media[] };
}

/** "A01-40" or "not placed". */
export function placeText(rack: string | null, ru: number | null): string {
  if (rack === null) return 'not placed';
  return ru === null ? rack : `${rack} U${ru}`;
}

/** "vault-1 · ctl-a · p1" */
export function endText(end: ScheduleRow['a']): string {
  return [end.device, end.part, end.port].filter((part) => part !== null && part !== '').join(' · ');
}
