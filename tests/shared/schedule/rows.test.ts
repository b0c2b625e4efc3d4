import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { directAttach, dualFabric, dualFabricWithManagement } from '@/shared/patterns';
import { cableSchedule, endIdentifier, type ScheduleEnd, type ScheduleRow } from '@/shared/schedule';
import { displayName, indexTopology } from '@/shared/topology';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { Draft } from '../helpers/draft';
import { mulberry32 } from '../helpers/random-design';

/** ANSI/TIA-606 style: `cabinet-RU:port` at each end, near end first, `/` between (docs/trade-values.md). */
const PLACED_END = /^[^/:]+-\d{2,}:[^/]+$/;

/** Each row's ends are the cable's two ports, by device, part and port name; the rack as placed. */
function checkRows(doc: Topology): ScheduleRow[] {
  const { cables } = cableSchedule(doc);
  const index = indexTopology(doc);
  expect(cables.map((r) => r.id).sort()).toEqual(doc.cables.map((c) => c.id).sort());
  const racks = new Map((doc.racks ?? []).map((r) => [r.id, r]));
  for (const row of cables) {
    const cable = index.cables.get(row.id)!;
    const expected = (portId: string): ScheduleEnd => {
      const ref = index.ports.get(portId)!;
      const part = ref.adapter ?? ref.controller;
      const rack = ref.device.placement ? racks.get(ref.device.placement.rackId) : undefined;
      return {
        deviceId: ref.device.id,
        device: displayName(ref.device),
        part: part ? displayName(part) : null,
        port: displayName(ref.port),
        rack: rack ? displayName(rack) : null,
        ru: ref.device.placement?.ru ?? null,
      };
    };
    expect([row.a, row.b]).toEqual(expect.arrayContaining([expected(cable.a), expected(cable.b)]));
    expect(row.a).not.toEqual(row.b);
    const [near, far] = row.identifier.split('/');
    for (const [text, end] of [[near, row.a], [far, row.b]] as const) {
      if (end.rack !== null) expect(text).toMatch(PLACED_END);
      else expect(text).toBe([end.device, end.part, end.port].filter((x) => x !== null).join('.'));
      expect(endIdentifier(end)).toBe(text);
    }
    expect(row.media).toBe(cable.media);
    expect(row.lengthM).toBe(cable.lengthM ?? null);
  }
  return cables;
}

/** Scatters a pattern's devices over three racks (some left out), at random units. */
function placed(doc: Topology, seed: number): Topology {
  const rnd = mulberry32(seed);
  doc.racks = [
    { id: 'rk-1', name: 'C01', row: 'C', position: 1 },
    { id: 'rk-2', name: 'C02', row: 'C', position: 2 },
    { id: 'rk-3', name: 'D07', row: 'D', position: 7 },
  ];
  for (const device of doc.devices) {
    if (rnd() < 0.2) continue;
    device.placement = { rackId: doc.racks[Math.floor(rnd() * 3)].id, ru: 1 + Math.floor(rnd() * 42) };
  }
  return doc;
}

describe('the cable schedule', () => {
  it('has one row per cable of the demo with both ends right and TIA-606 identifiers', () => {
    const rows = checkRows(harborRoadV2());
    expect(rows).toHaveLength(28); // 8 controller + 12 host data cables, 2 + 6 management cables
    const first = rows[0];
    // Rack A01 first, its lowest switch first (fab-a, U40), port by port.
    expect(first).toMatchObject({
      label: 'HR-A-01',
      identifier: 'A01-40:1/A01-12:ctl-a.1',
      a: { deviceId: 'fab-a', device: 'fab-a', part: null, port: 'p1', rack: 'A01', ru: 40 },
      b: { deviceId: 'vault-1', device: 'vault-1', part: 'ctl-a', port: 'p1', rack: 'A01', ru: 12 },
      media: 'cat6a',
      lengthM: 3,
      network: 'fabric A',
      vlan: 110, // the demo's fabric A VLAN (docs/demo.md)
    });
  });

  it('sorts by near end rack, unit, device and port, the network side near', () => {
    const rows = cableSchedule(harborRoadV2()).cables;
    const order = rows.map((r) => `${r.a.rack}-${r.a.ru}-${r.a.device}`);
    const runs = order.filter((key, i) => key !== order[i - 1]);
    expect(runs).toEqual(['A01-40-fab-a', 'A01-42-oob-1', 'A02-40-fab-b']);
    const fabA = rows.filter((r) => r.a.device === 'fab-a').map((r) => r.a.port);
    expect(fabA).toEqual(['p1', 'p2', 'p3', 'p4', 'p5', 'p6', 'p7', 'p8', 'p9', 'p10']); // p10 after p9, not after p1
    expect(rows.every((r) => r.a.device.startsWith('fab-') || r.a.device === 'oob-1')).toBe(true);
  });

  it('totals the cords by media and stock length', () => {
    const { cables, totals } = cableSchedule(harborRoadV2());
    // Hand count: cat6a — 8 controller cables of 3 m and 12 host cables of 3, 5, 7, 3, 5, 7 m (two per host);
    // cat6 — 2 controller management cables of 3 m and 6 host ones of 3, 5, 7, 3, 5, 7 m.
    expect(totals).toEqual([
      { media: 'cat6', stockLengthM: 3, count: 4 },
      { media: 'cat6', stockLengthM: 5, count: 2 },
      { media: 'cat6', stockLengthM: 7, count: 2 },
      { media: 'cat6a', stockLengthM: 3, count: 12 },
      { media: 'cat6a', stockLengthM: 5, count: 4 },
      { media: 'cat6a', stockLengthM: 7, count: 4 },
    ]);
    expect(totals.reduce((n, t) => n + t.count, 0)).toBe(cables.length);
  });

  it('is right on generated designs with devices scattered over racks, some unplaced', () => {
    const builders = [directAttach, dualFabric, dualFabricWithManagement];
    let unplaced = 0;
    for (let seed = 1; seed <= 30; seed += 1) {
      const doc = placed(builders[seed % 3]({ hosts: 1 + (seed % 7), controllers: 1 + (seed % 4), connector: seed % 2 ? 'sfp' : 'rj45' }), seed);
      expect(validateTopology(doc).ok).toBe(true);
      const rows = checkRows(doc);
      unplaced += rows.filter((r) => r.a.rack === null || r.b.rack === null).length;
      for (const row of rows) if (row.a.rack === null || row.b.rack === null) expect(row.estimatedLengthM).toBeNull();
    }
    expect(unplaced).toBeGreaterThan(10); // the fallback is really exercised
  });

  it('falls back to device.part.port for unplaced ends, and to the cable id for an unlabelled cable', () => {
    const doc = new Draft().switch('sw', 'data', 12).host('h', { 'card-1': 1 }).rack('A01', { row: 'A', position: 1 }).place('sw', 'A01', 40).link('h.card-1.1', 'sw').build();
    const [row] = cableSchedule(doc).cables;
    expect(row.identifier).toBe('A01-40:1/h.card-1.1');
    expect(row.label).toBe('k1');
    expect(row.network).toBeNull();
  });
});
