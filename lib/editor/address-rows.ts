import type { Finding } from '@/shared/analysis/types';
import type { Port, Topology } from '@/shared/topology/schema';
import { iteratePorts } from '@/shared/topology/index';
import { addressFindings, type CanvasMarks } from '@/lib/editor/marks';

/**
 * The address table's rows: every host and controller port (switch ports have no address), in
 * document order, with the analysis's address findings about each. Conflicts are the report's —
 * duplicates, addresses outside their network, reserved addresses — never re-derived here.
 */
export type AddressRow = {
  portId: string;
  deviceId: string;
  device: string;
  /** "card-1 p1", "ctl-a mgmt". */
  port: string;
  role: Port['role'];
  networkId: string | null;
  network: string | null;
  address: string;
  problems: Finding[];
};

export type AddressFilter = 'all' | 'problems' | 'unaddressed';

/** A few words for each rule, shown with its icon; the full sentence goes beside it. */
export const PROBLEM_WORDS: ReadonlyMap<string, string> = new Map([
  ['address-duplicate', 'Duplicate'],
  ['address-outside-network', 'Outside its network'],
  ['address-reserved', 'Reserved address'],
  ['port-unaddressed', 'No address'],
  ['management-data-same-subnet', 'Wrong kind of network'],
  ['target-address-dhcp', 'Target on DHCP'],
]);

export function addressRows(doc: Topology, marks: CanvasMarks, filter: AddressFilter = 'all', query = ''): AddressRow[] {
  const q = query.trim().toLowerCase();
  const names = new Map(doc.networks.map((n) => [n.id, n.name || n.id]));
  const rows: AddressRow[] = [];
  for (const ref of iteratePorts(doc)) {
    if (ref.device.kind === 'switch') continue;
    const group = ref.controller ?? ref.adapter;
    const port = `${group ? `${group.name} ` : ''}${ref.port.name}`;
    const address = ref.port.address ? (ref.port.address.mode === 'dhcp' ? 'DHCP' : ref.port.address.ip) : '';
    const row: AddressRow = {
      portId: ref.port.id,
      deviceId: ref.device.id,
      device: ref.device.name,
      port,
      role: ref.port.role,
      networkId: ref.port.networkId ?? null,
      network: ref.port.networkId ? (names.get(ref.port.networkId) ?? ref.port.networkId) : null,
      address,
      problems: addressFindings(marks, ref.port.id),
    };
    if (filter === 'problems' && row.problems.length === 0) continue;
    if (filter === 'unaddressed' && row.address !== '') continue;
    if (q && !`${row.device} ${row.port} ${row.address} ${row.network ?? ''}`.toLowerCase().includes(q)) continue;
    rows.push(row);
  }
  return rows;
}
