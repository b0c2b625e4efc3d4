import { indexTopology, displayName } from '@/shared/topology/index';
import type { Topology } from '@/shared/topology/schema';
import type { CableSchedule, ScheduleRow } from '@/shared/schedule/types';

/**
 * The build sheet as tables — a header and rows of plain cells — for the CSV and spreadsheet
 * exports (docs/api.md fixes the CSV headers). Absent values are empty cells (null).
 */
export type Cell = string | number | null;
export type Table = { header: readonly string[]; rows: Cell[][] };

export const CABLE_COLUMNS = [
  'label', 'from_device', 'from_part', 'from_port', 'from_rack', 'from_ru',
  'to_device', 'to_part', 'to_port', 'to_rack', 'to_ru', 'media', 'length_m', 'estimated_m', 'network', 'vlan',
] as const;

export const ADDRESS_COLUMNS = ['device', 'part', 'port', 'role', 'network', 'cidr', 'vlan', 'mtu', 'address', 'gateway'] as const;

export const MATERIAL_COLUMNS = ['media', 'stock_length_m', 'count'] as const;

function cableCells(row: ScheduleRow): Cell[] {
  const { a, b } = row;
  return [row.label, a.device, a.part, a.port, a.rack, a.ru, b.device, b.part, b.port, b.rack, b.ru, row.media, row.lengthM, row.estimatedLengthM, row.network, row.vlan];
}

export function cableTable(schedule: CableSchedule): Table {
  return { header: CABLE_COLUMNS, rows: schedule.cables.map(cableCells) };
}

export function materialsTable(schedule: CableSchedule): Table {
  return { header: MATERIAL_COLUMNS, rows: schedule.totals.map((t) => [t.media, t.stockLengthM, t.count]) };
}

/**
 * The address worksheet: one row per host and controller port that takes part — data and
 * management ports on a network, with an address, or cabled — with its network's subnet, VLAN, MTU
 * and gateway and the port's address (`dhcp` for a DHCP port). A spare port with none of these has
 * nothing to configure and is left out; switch ports have no address.
 */
export function addressTable(doc: Topology): Table {
  const index = indexTopology(doc);
  const rows: Cell[][] = [];
  for (const ref of index.ports.values()) {
    const part = ref.adapter ?? ref.controller;
    if (!part) continue;
    const network = ref.port.networkId === undefined ? undefined : index.networks.get(ref.port.networkId);
    const address = ref.port.address;
    if (!network && !address && !index.cablesByPort.has(ref.port.id)) continue;
    rows.push([
      displayName(ref.device),
      displayName(part),
      displayName(ref.port),
      ref.port.role,
      network ? displayName(network) : null,
      network?.cidr ?? null,
      network?.vlan ?? null,
      network?.mtu ?? null,
      address ? (address.mode === 'static' ? address.ip : 'dhcp') : null,
      network?.gateway ?? null,
    ]);
  }
  return { header: ADDRESS_COLUMNS, rows };
}

/**
 * A cell a spreadsheet program would run as a formula — text starting with `=`, `+`, `-`, `@`, a
 * tab or a carriage return (OWASP, "CSV Injection") — gets a leading `'`, so it is shown as text.
 * Numbers are left alone: they are ours, never a person's text. Checked on the whole text, not
 * line by line, so a newline inside the cell cannot hide a formula.
 */
export function guardFormula(cell: Cell): Cell {
  return typeof cell === 'string' && /^[=+\-@\t\r]/.test(cell) ? `'${cell}` : cell;
}

/** "Harbor Road storage", 2, "cables", "csv" → "harbor-road-storage-v2-cables.csv". */
export function exportFileName(designName: string, version: number, what: string, extension: string): string {
  const slug = designName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80);
  return `${slug || 'design'}-v${version}-${what}.${extension}`;
}
