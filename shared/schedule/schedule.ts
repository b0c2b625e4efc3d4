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

/**
 * What the schedule needs of a device, worked out once per device rather than once per cable end:
 * its names, rack and unit, and its rank in the order — the rack's and the device's place in
 * natural order of their names (unplaced after every rack).
 */
type DeviceInfo = { device: string; rack: string | null; ru: number | null; rackRank: number; deviceRank: number };
type EndKey = { info: DeviceInfo; d: number; g: number; p: number };
type Keyed = { row: ScheduleRow; near: EndKey; far: EndKey };

function deviceInfos(doc: Topology): Map<string, DeviceInfo> {
  const racks = new Map<string, Rack>((doc.racks ?? []).map((rack) => [rack.id, rack]));
  const rankOf = (names: Iterable<string>) => new Map([...new Set(names)].sort(naturalCompare).map((name, i) => [name, i]));
  const rackRank = rankOf([...racks.values()].map((rack) => displayName(rack)));
  const deviceRank = rankOf(doc.devices.map((device) => displayName(device)));
  const infos = new Map<string, DeviceInfo>();
  for (const device of doc.devices) {
    const rack = device.placement ? racks.get(device.placement.rackId) : undefined;
    const rackName = rack ? displayName(rack) : null;
    const name = displayName(device);
    infos.set(device.id, {
      device: name,
      rack: rackName,
      ru: rack ? device.placement!.ru : null,
      rackRank: rackName === null ? Number.MAX_SAFE_INTEGER : rackRank.get(rackName)!,
      deviceRank: deviceRank.get(name)!,
    });
  }
  return infos;
}

export function cableSchedule(doc: Topology, index: TopologyIndex = indexTopology(doc)): CableSchedule {
  const infos = deviceInfos(doc);
  const estimate = lengthEstimator(doc);
  const keyed: Keyed[] = [];
  for (const cable of doc.cables) {
    const x = index.ports.get(cable.a);
    const y = index.ports.get(cable.b);
    // A valid document has both ends; a draft being edited may not, and gets no row for that cable.
    if (!x || !y) continue;
    const kx: EndKey = { info: infos.get(x.device.id)!, d: x.deviceIndex, g: x.groupIndex, p: x.portIndex };
    const ky: EndKey = { info: infos.get(y.device.id)!, d: y.deviceIndex, g: y.groupIndex, p: y.portIndex };
    const xNear = KIND_RANK[x.device.kind] < KIND_RANK[y.device.kind] || (x.device.kind === y.device.kind && compareKeys(kx, ky) <= 0);
    const [near, far, nearKey, farKey] = xNear ? [x, y, kx, ky] : [y, x, ky, kx];
    keyed.push({ row: scheduleRow(cable, near, far, nearKey, farKey, index, estimate), near: nearKey, far: farKey });
  }
  keyed.sort((p, q) => compareKeys(p.near, q.near) || compareKeys(p.far, q.far) || (p.row.id < q.row.id ? -1 : p.row.id > q.row.id ? 1 : 0));
  const cables = keyed.map((k) => k.row);
  return { cables, totals: materialTotals(cables) };
}

function scheduleRow(cable: Cable, near: PortRef, far: PortRef, nearKey: EndKey, farKey: EndKey, index: TopologyIndex, estimate: ReturnType<typeof lengthEstimator>): ScheduleRow {
  const a = scheduleEnd(near, nearKey.info);
  const b = scheduleEnd(far, farKey.info);
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

function scheduleEnd(ref: PortRef, info: DeviceInfo): ScheduleEnd {
  const part = ref.adapter ?? ref.controller;
  return { deviceId: ref.device.id, device: info.device, part: part ? displayName(part) : null, port: displayName(ref.port), rack: info.rack, ru: info.ru };
}

function compareKeys(x: EndKey, y: EndKey): number {
  const a = x.info;
  const b = y.info;
  if (a.rackRank !== b.rackRank) return a.rackRank - b.rackRank;
  if (a.ru !== b.ru) return a.ru === null ? 1 : b.ru === null ? -1 : a.ru - b.ru;
  return a.deviceRank - b.deviceRank || x.d - y.d || x.g - y.g || x.p - y.p;
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
