import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { addressRows } from '@/lib/editor/address-rows';
import { runCommand } from '@/lib/editor/commands';
import { focusOn } from '@/lib/editor/focus';
import { buildSnapshot, overlappingDevices, rectsIntersect } from '@/lib/editor/geometry';
import { computeMarks, EMPTY_MARKS } from '@/lib/editor/marks';
import { placeInView } from '@/lib/editor/placement';
import { segmentMeetsRect } from '@/lib/editor/hit-test';
import { actionFor } from '@/lib/editor/shortcuts';
import { withTidyLayout } from '@/lib/editor/tidy';
import { revealAbove } from '@/lib/editor/reveal';
import { cull, cullRect } from '@/lib/editor/culling';
import { MAX_ROW_WIDTH } from '@/lib/editor/arrange';
import { fitToBounds } from '@/lib/editor/viewport';
import { bigDesign } from '@/tests/lib/editor/helpers/big-design';
import { apply, smallDesign } from '@/tests/lib/editor/helpers/editor';

const key = (key: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

describe('placing a palette device', () => {
  it('puts it in the middle of the view when that is free, and beside what is there when not', () => {
    const doc = smallDesign();
    const snapshot = buildSnapshot(doc);
    const empty = placeInView(doc, snapshot, { template: 'host' }, { x: 2000, y: 2000, width: 800, height: 600 })!;
    expect(empty.x).toBeGreaterThan(2000);
    expect(empty.y).toBeGreaterThan(2000);
    const crowded = placeInView(doc, snapshot, { template: 'host' }, { x: 0, y: 0, width: 900, height: 700 })!;
    const next = runCommand(doc, 'addDevice', { template: 'host', position: crowded });
    expect(overlappingDevices(buildSnapshot(next))).toEqual([]);
  });

  it('keeps a new device off the cables in view, so it does not look cabled to them', () => {
    // The demo with its hosts raised 1200 px: a wide gap that only cables cross, and the view on it.
    const tidy = withTidyLayout(harborRoadV2()).doc;
    const hosts = new Set(tidy.devices.filter((d) => d.kind === 'host').map((d) => d.id));
    const layout = Object.fromEntries(Object.entries(tidy.layout!).map(([id, p]) => [id, hosts.has(id) ? { x: p.x, y: p.y - 1200 } : p]));
    const doc = { ...tidy, layout };
    const snapshot = buildSnapshot(doc);
    const rects = [...snapshot.devices.values()];
    const hostsBottom = Math.max(...rects.filter((b) => hosts.has(b.id)).map((b) => b.rect.y + b.rect.height));
    const othersTop = Math.min(...rects.filter((b) => !hosts.has(b.id)).map((b) => b.rect.y));
    const view = { x: 0, y: hostsBottom, width: 1400, height: othersTop - hostsBottom };
    const position = placeInView(doc, snapshot, { template: 'host' }, view)!;
    const next = buildSnapshot(runCommand(doc, 'addDevice', { template: 'host', position }));
    const added = [...next.devices.values()].find((b) => !snapshot.devices.has(b.id))!;
    expect(overlappingDevices(next)).toEqual([]);
    expect([...next.cables.values()].filter((line) => segmentMeetsRect(line.a, line.b, added.rect)).map((l) => l.id)).toEqual([]);
  });
});

describe('a segment against a rectangle', () => {
  const rect = { x: 0, y: 0, width: 10, height: 10 };
  it('meets it when crossing, ending inside or lying inside, and not when passing by', () => {
    expect(segmentMeetsRect({ x: -5, y: 5 }, { x: 15, y: 5 }, rect)).toBe(true);
    expect(segmentMeetsRect({ x: -5, y: -5 }, { x: 5, y: 5 }, rect)).toBe(true);
    expect(segmentMeetsRect({ x: 2, y: 2 }, { x: 3, y: 3 }, rect)).toBe(true);
    expect(segmentMeetsRect({ x: -5, y: 12 }, { x: 15, y: 12 }, rect)).toBe(false);
    // Diagonal passing beyond the corner (10, 10): the line x + y = 22 stays outside.
    expect(segmentMeetsRect({ x: 22, y: 0 }, { x: 0, y: 22 }, rect)).toBe(false);
    expect(segmentMeetsRect({ x: 20, y: 0 }, { x: 0, y: 20 }, rect)).toBe(true);
  });
});

describe('opening a layout that overlaps on this canvas', () => {
  it('re-arranges a layout whose boxes overlap and leaves a tidy one alone', () => {
    // A hand-edited file with every device stacked on one spot.
    const demo = { ...harborRoadV2(), layout: Object.fromEntries(harborRoadV2().devices.map((d) => [d.id, { x: 100, y: 100 }])) };
    expect(overlappingDevices(buildSnapshot(demo)).length).toBeGreaterThan(0);
    const tidy = withTidyLayout(demo);
    expect([tidy.fixed, overlappingDevices(buildSnapshot(tidy.doc))]).toEqual([true, []]);
    expect(tidy.doc.devices).toBe(demo.devices);
    const again = withTidyLayout(tidy.doc);
    expect([again.fixed, again.doc]).toEqual([false, tidy.doc]);
  });
});

describe('focusing a finding', () => {
  it('selects the subjects the canvas shows and brings them all on screen', () => {
    const doc = withTidyLayout(harborRoadV1()).doc;
    const report = analyze(doc);
    const spof = report.findings.find((f) => f.rule === 'single-point-of-failure')!;
    const snapshot = buildSnapshot(doc);
    const screen = { width: 800, height: 600 };
    const focus = focusOn(snapshot, [...spof.subjects, 'net-unknown'], { x: 5000, y: 5000, zoom: 1 }, screen);
    expect(focus.selection).toEqual(spof.subjects);
    const v = focus.viewport!;
    const view = { x: v.x, y: v.y, width: screen.width / v.zoom, height: screen.height / v.zoom };
    for (const id of ['cam-rec-2', 'fab-a']) expect(rectsIntersect(snapshot.devices.get(id)!.rect, view)).toBe(true);
  });
});

describe('keyboard shortcuts', () => {
  it('maps the keys the help sheet lists', () => {
    expect([
      actionFor(key('z', { ctrlKey: true })),
      actionFor(key('Z', { ctrlKey: true, shiftKey: true })),
      actionFor(key('y', { metaKey: true })),
      actionFor(key('Delete')),
      actionFor(key('Backspace')),
      actionFor(key('A', { shiftKey: true })),
      actionFor(key('a')),
      actionFor(key('f')),
      actionFor(key('+')),
      actionFor(key('-')),
      actionFor(key('Escape')),
      actionFor(key('s', { ctrlKey: true })),
      actionFor(key('f', { altKey: true })),
    ]).toEqual(['undo', 'redo', 'redo', 'delete', 'delete', 'arrange', null, 'fit', 'zoomIn', 'zoomOut', 'escape', 'save', null]);
  });
});

describe('the address table', () => {
  it('lists host and controller ports only, with the report’s conflicts', () => {
    let doc = harborRoadV2();
    const first = addressRows(doc, EMPTY_MARKS);
    expect(first.every((r) => !r.deviceId.startsWith('fab-') && r.deviceId !== 'oob-1')).toBe(true);
    // Two ports on one address: the analysis's address-duplicate names both.
    const [a, b] = first.filter((r) => r.address !== '' && r.network === 'fabric A');
    doc = apply(doc, 'setPort', { id: b.portId, address: { mode: 'static', ip: a.address } });
    const rows = addressRows(doc, computeMarks(doc, analyze(doc)), 'problems');
    expect(rows.map((r) => [r.portId, r.problems.map((f) => f.rule)])).toEqual([
      [a.portId, ['address-duplicate']],
      [b.portId, ['address-duplicate']],
    ]);
    expect(addressRows(doc, EMPTY_MARKS, 'all', 'cam-rec-2').every((r) => r.device === 'cam-rec-2')).toBe(true);
  });
});

describe('putting ports on a network in one step', () => {
  it('moves every given port and drops static addresses that do not fit', () => {
    const doc = harborRoadV2();
    const mgmt = doc.networks.find((n) => n.purpose === 'management')!;
    const ports = addressRows(doc, EMPTY_MARKS).filter((r) => r.network === 'fabric A').slice(0, 2);
    const next = apply(doc, 'assignNetwork', { portIds: ports.map((p) => p.portId), networkId: mgmt.id });
    const after = addressRows(next, EMPTY_MARKS).filter((r) => ports.some((p) => p.portId === r.portId));
    // 198.51.100.x is outside 192.0.2.0/24 (RFC 5737 ranges), so those addresses go.
    expect(after.map((r) => [r.network, r.address])).toEqual([
      ['management', ''],
      ['management', ''],
    ]);
  });
});

describe('revealing a tapped thing above the phone’s sheet', () => {
  it('zooms to a readable size and centres it in the part left uncovered', () => {
    const target = { x: 1000, y: 500, width: 276, height: 86 };
    const v = revealAbove({ x: 0, y: 0, zoom: 0.2 }, target, { width: 390, height: 700 }, 392);
    expect(v.zoom).toBe(0.8);
    expect([(1138 - v.x) * v.zoom, (543 - v.y) * v.zoom]).toEqual([195, 196]);
  });

  it('leaves the view alone when the thing is readable and uncovered', () => {
    const v = { x: 900, y: 400, zoom: 1 };
    expect(revealAbove(v, { x: 950, y: 450, width: 200, height: 80 }, { width: 390, height: 700 }, 392)).toBe(v);
  });
});

describe('drawing only what is on screen', () => {
  it('keeps every device of a fitted design and only the nearby ones when zoomed in', () => {
    const doc = bigDesign();
    const snapshot = buildSnapshot(doc);
    const screen = { width: 1000, height: 800 };
    const all = cull(snapshot, cullRect(fitToBounds(snapshot.bounds, screen, 40, 1), screen));
    expect([all.devices.size, all.cables.size]).toEqual([300, 600]);
    const box = snapshot.devices.get('switch-20')!;
    const near = cull(snapshot, cullRect({ x: box.position.x - 200, y: box.position.y - 300, zoom: 1 }, screen));
    expect(near.devices.has('switch-20')).toBe(true);
    // A 1000 × 800 view widened by half a screen each way and snapped to 512 px tiles: a fraction of the 300.
    expect(near.devices.size).toBeLessThan(60);
    // Every cable of a drawn device is drawn, so no line stops short at the edge of the drawn set.
    for (const id of snapshot.cablesByDevice.get('switch-20')!) expect(near.cables.has(id)).toBe(true);
  });
});

describe('arranging a large design', () => {
  it('wraps a wide band onto more rows, in order, with no overlaps', () => {
    const doc = apply(bigDesign(), 'autoArrange', {});
    const snapshot = buildSnapshot(doc);
    expect(overlappingDevices(snapshot)).toEqual([]);
    // 250 hosts of 276 px no longer make one 79,000 px line.
    expect(snapshot.bounds!.width).toBeLessThanOrEqual(MAX_ROW_WIDTH);
    const hostRows = new Set(doc.devices.filter((d) => d.kind === 'host').map((d) => doc.layout![d.id].y));
    expect(hostRows.size).toBeGreaterThan(1);
    // Every host row still sits above every switch row, and switches above arrays.
    const ys = (kind: string) => doc.devices.filter((d) => d.kind === kind).map((d) => doc.layout![d.id].y);
    expect(Math.max(...ys('host'))).toBeLessThan(Math.min(...ys('switch')));
    expect(Math.max(...ys('switch'))).toBeLessThan(Math.min(...ys('array')));
  });
});
