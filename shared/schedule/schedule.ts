import { lengthEstimator, stockLength } from '@/shared/schedule/length';
import { cableIdentifier } from '@/shared/schedule/identifier';
import { naturalCompare } from '@/shared/schedule/order';
import type { CableSchedule, ScheduleEnd, ScheduleRow, ScheduleTotal } from '@/shared/schedule/types';
import { displayName, indexTopology, type PortRef, type TopologyIndex } from '@/shared/topology/index';
import { MEDIA, type Cable, type Network, type Rack, type Topology } from '@/shared/topology/schema';

/**
 * The cable schedule of one document: one row per cable with both ends, the TIA-606 style
 * identifier, media, chosen, estimated and stock length, network and VLAN; and the materials
 * totals. Pure and deterministic; linear in the document plus one sort.
 *
 * The near end (`a`) is the network side — a switch, else the array, else the host — so most rows
 * start at a switch port and a rack's rows read port by port down each switch; between two ends of
 * the same kind the one that sorts first is near. Rows are sorted by the near end's rack (natural
 * order of names, unplaced last), unit, device and port (in the device's own order), then the far end.
 */
const KIND_RANK = { switch: 0, array: 1, host: 2 } as const;

type Keyed = { row: ScheduleRow; near: EndKey; far: EndKey };
type EndKey = { rack: string | null; ru: number | null; device: string; d: number; g: number; p: number };

export function cableSchedule(doc: Topology, index: TopologyIndex = indexTopology(doc)): CableSchedule {
  const racks = new Map<string, Rack>((doc.racks ?? []).map((rack) => [rack.id, rack]));
  const estimate = lengthEstimator(doc);
  const keyed: Keyed[] = [];
  for (const cable of doc.cables) {
    const x = index.ports.get(cable.a);
    const y = index.ports.get(cable.b);
    // A valid document has both ends; a draft being edited may not, and gets no row for that cable.
    if (!x || !y) continue;
    const kx = endKey(x, racks);
    const ky = endKey(y, racks);
    const xNear = KIND_RANK[x.device.kind] < KIND_RANK[y.device.kind] || (x.device.kind === y.device.kind && compareKeys(kx, ky) <= 0);
    const [near, far, nearKey, farKey] = xNear ? [x, y, kx, ky] : [y, x, ky, kx];
    keyed.push({ row: scheduleRow(cable, near, far, nearKey, farKey, index, estimate), near: nearKey, far: farKey });
  }
  keyed.sort((p, q) => compareKeys(p.near, q.near) || compareKeys(p.far, q.far) || (p.row.id < q.row.id ? -1 : p.row.id > q.row.id ? 1 : 0));
  const cables = keyed.map((k) => k.row);
  return { cables, totals: materialTotals(cables) };
}

function scheduleRow(cable: Cable, near: PortRef, far: PortRef, nearKey: EndKey, farKey: EndKey, index: TopologyIndex, estimate: ReturnType<typeof lengthEstimator>): ScheduleRow {
  const a = scheduleEnd(near, nearKey);
  const b = scheduleEnd(far, farKey);
  const estimatedLengthM = estimate(near.device, far.device);
  const lengthM = cable.lengthM ?? null;
  const network = cableNetwork(near, far, index);
  return {
    id: cable.id,
    label: cable.label?.trim() || cable.id,
    identifier: cableIdentifier(a, b),
    a,
    b,
    media: cable.media,
    lengthM,
    estimatedLengthM,
    stockLengthM: stockLength(lengthM ?? estimatedLengthM),
    network: network ? displayName(network) : null,
    vlan: network?.vlan ?? null,
  };
}

function endKey(ref: PortRef, racks: Map<string, Rack>): EndKey {
  const placement = ref.device.placement;
  const rack = placement ? racks.get(placement.rackId) : undefined;
  return {
    rack: rack ? displayName(rack) : null,
    ru: rack && placement ? placement.ru : null,
    device: displayName(ref.device),
    d: ref.deviceIndex,
    g: ref.groupIndex,
    p: ref.portIndex,
  };
}

function scheduleEnd(ref: PortRef, key: EndKey): ScheduleEnd {
  const part = ref.adapter ?? ref.controller;
  return { deviceId: ref.device.id, device: key.device, part: part ? displayName(part) : null, port: displayName(ref.port), rack: key.rack, ru: key.ru };
}

function compareKeys(x: EndKey, y: EndKey): number {
  if (x.rack !== y.rack) {
    if (x.rack === null) return 1;
    if (y.rack === null) return -1;
    const byRack = naturalCompare(x.rack, y.rack);
    if (byRack !== 0) return byRack;
  }
  if (x.ru !== y.ru) return x.ru === null ? 1 : y.ru === null ? -1 : x.ru - y.ru;
  return naturalCompare(x.device, y.device) || x.d - y.d || x.g - y.g || x.p - y.p;
}

/** The network a cable carries: that of its host or controller end (near end first); none between switches. */
function cableNetwork(near: PortRef, far: PortRef, index: TopologyIndex): Network | undefined {
  for (const ref of [near, far]) {
    if (ref.device.kind === 'switch' || ref.port.networkId === undefined) continue;
    const network = index.networks.get(ref.port.networkId);
    if (network) return network;
  }
  return undefined;
}

const MEDIA_RANK = new Map<string, number>(MEDIA.map((media, i) => [media, i]));

/** Cords by media (the format's order) and stock length (shortest first, no length last). */
export function materialTotals(rows: readonly ScheduleRow[]): ScheduleTotal[] {
  const counts = new Map<string, ScheduleTotal>();
  for (const row of rows) {
    const key = `${row.media}\u0000${row.stockLengthM}`;
    const total = counts.get(key);
    if (total) total.count += 1;
    else counts.set(key, { media: row.media, stockLengthM: row.stockLengthM, count: 1 });
  }
  return [...counts.values()].sort(
    (x, y) =>
      MEDIA_RANK.get(x.media)! - MEDIA_RANK.get(y.media)! ||
      (x.stockLengthM === y.stockLengthM ? 0 : x.stockLengthM === null ? 1 : y.stockLengthM === null ? -1 : x.stockLengthM - y.stockLengthM),
  );
}
