import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { recordFrom } from '@/shared/keys/record';
import { splitIds } from '@/shared/keys/tuple';
import { positionOf } from '@/shared/topology/layout';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { createCanvasUiStore } from '@/lib/editor/canvas-ui';
import { cull } from '@/lib/editor/culling';
import { exportSvg } from '@/lib/editor/export-svg';
import { computeFabrics } from '@/lib/editor/fabrics';
import { createGestures } from '@/lib/editor/gestures';
import { hitTest, overlappingDevices } from '@/lib/editor/hit-test';
import { computeMarks } from '@/lib/editor/marks';
import { buildSnapshot, resolvePositions, withMovedDevices } from '@/lib/editor/snapshot';
import { createEditorStore, type EditorStore } from '@/lib/editor/store';
import { withTidyLayout } from '@/lib/editor/tidy';
import { worldToScreen } from '@/lib/editor/viewport';
import { memoryStorage, readWorkingCopy, writeWorkingCopy } from '@/lib/editor/working-copy';
import { compareAccess } from '@/lib/report/whatif';
import { hostilePool, idsOf, PROTOTYPE_NAMES, renameIds } from '@/tests/shared/helpers/hostile';
import { expectValid } from '@/tests/lib/editor/helpers/editor';

/**
 * The editor over a hostile document: every device of Harbor Road named after an Object.prototype
 * member (`__proto__` and `constructor` among them), every other id a control character, a
 * bidirectional override or an id that collides with another when joined. Every command, the
 * snapshot, hit-testing, culling, the drag gesture, auto-arrange and the working copy must treat
 * them as ordinary ids.
 */
const DEVICE_IDS = ['__proto__', 'constructor', 'toString', 'valueOf', 'hasOwnProperty', 'isPrototypeOf', 'propertyIsEnumerable', 'toLocaleString', '__defineGetter__', '__lookupGetter__'];

function hostile(doc: Topology): Topology {
  const others = hostilePool().filter((id) => !PROTOTYPE_NAMES.includes(id));
  const map = new Map<string, string>();
  let next = 0;
  doc.devices.forEach((d, i) => map.set(d.id, DEVICE_IDS[i]));
  for (const { id, kind } of idsOf(doc)) if (kind !== 'array' && kind !== 'switch' && kind !== 'host') map.set(id, others[next++]);
  const checked = validateTopology(JSON.parse(JSON.stringify(renameIds(doc, (id) => map.get(id) ?? id))));
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues.slice(0, 3)));
  return checked.doc;
}

function opened(doc: Topology): EditorStore {
  const store = createEditorStore();
  store.getState().load(doc, { designId: 'd1', baseVersion: 1 });
  return store;
}

const doc = hostile(harborRoadV2());

describe('the editor on a hostile document', () => {
  it('places every device where its layout says, by own keys only', () => {
    expect(doc.devices.map((d) => d.id)).toEqual(DEVICE_IDS);
    const positions = resolvePositions(doc);
    for (const device of doc.devices) {
      expect({ id: device.id, at: positions.get(device.id) }).toEqual({ id: device.id, at: doc.layout![device.id] });
    }
    // A device without a layout entry gets a computed place, never Object.prototype's member.
    const without = { ...doc, layout: recordFrom(Object.entries(doc.layout!).filter(([id]) => id !== 'constructor')) };
    const placed = resolvePositions(without).get('constructor')!;
    expect([Number.isFinite(placed.x), Number.isFinite(placed.y)]).toEqual([true, true]);
    expect(withTidyLayout(without).fixed).toBe(true);
    expect(withTidyLayout(doc).fixed).toBe(false);
  });

  it('builds a snapshot, hit-tests and culls with hostile ids', () => {
    const snapshot = buildSnapshot(doc);
    expect([...snapshot.devices.keys()]).toEqual(DEVICE_IDS);
    expect(snapshot.cables.size).toBe(doc.cables.length);
    for (const box of snapshot.devices.values()) {
      const hit = hitTest(snapshot, { x: box.rect.x + 2, y: box.rect.y + 2 });
      expect({ box: box.id, hit: hit && (hit.kind === 'device' || hit.kind === 'group' || hit.kind === 'port' ? (hit.kind === 'device' ? hit.id : hit.deviceId) : null) }).toEqual({ box: box.id, hit: box.id });
    }
    const all = cull(snapshot, { x: -1e6, y: -1e6, width: 2e6, height: 2e6 });
    expect([...all.devices.keys()]).toEqual(DEVICE_IDS);
    const moves = recordFrom([['__proto__', { x: 5000, y: 5000 }] as const]);
    expect(withMovedDevices(snapshot, moves).devices.get('__proto__')!.position).toEqual({ x: 5000, y: 5000 });
  });

  it('moves __proto__ and constructor through the command registry, and undoes it', () => {
    const store = opened(doc);
    // As the canvas sends it after a JSON round trip: own keys named __proto__ and constructor.
    const positions = JSON.parse('{"__proto__": {"x": 1000, "y": 20}, "constructor": {"x": 2000, "y": 40}}');
    const result = store.getState().run('moveDevices', { positions });
    expect(result.ok).toBe(true);
    const layout = store.getState().doc.layout!;
    expect([positionOf(store.getState().doc, '__proto__'), positionOf(store.getState().doc, 'constructor')]).toEqual([{ x: 1000, y: 20 }, { x: 2000, y: 40 }]);
    expect(Object.keys(layout).sort()).toEqual([...DEVICE_IDS].sort());
    expect(JSON.parse(JSON.stringify(store.getState().doc)).layout.__proto__).toEqual({ x: 1000, y: 20 });
    expectValid(store.getState().doc);
    store.getState().undo();
    expect(positionOf(store.getState().doc, '__proto__')).toEqual(doc.layout!['__proto__']);
    expect(store.getState().run('moveDevice', { id: 'toString', x: 3, y: 4 }).ok).toBe(true);
    expect(positionOf(store.getState().doc, 'toString')).toEqual({ x: 3, y: 4 });
  });

  it('drags the device called __proto__ with the pointer', () => {
    const store = opened(doc);
    const ui = createCanvasUiStore();
    const gestures = createGestures({ store, ui, marquee: () => false });
    const box = buildSnapshot(doc).devices.get('__proto__')!;
    const start = worldToScreen(store.getState().viewport, { x: box.rect.x + 3, y: box.rect.y + 3 });
    gestures.down({ id: 1, kind: 'mouse', point: start, button: 0 });
    gestures.move({ id: 1, kind: 'mouse', point: { x: start.x + 200, y: start.y + 100 } });
    expect(Object.keys(ui.getState().drag!.moves)).toEqual(['__proto__']);
    gestures.up({ id: 1, kind: 'mouse', point: { x: start.x + 200, y: start.y + 100 } });
    const moved = positionOf(store.getState().doc, '__proto__')!;
    expect(moved).not.toEqual(box.position);
    expect(moved.x).toBeGreaterThan(box.position.x);
  });

  it('adds, cables, renames and deletes with hostile ids, and the result stays valid', () => {
    const store = opened(doc);
    const run = store.getState().run;
    expect(run('addDevice', { template: 'host', id: '__lookupSetter__', name: 'extra host' }).ok).toBe(true);
    expect(positionOf(store.getState().doc, '__lookupSetter__')).toBeDefined();
    const free = idsOf(store.getState().doc).filter((x) => x.kind === 'port').map((x) => x.id).filter((id) => !store.getState().doc.cables.some((c) => c.a === id || c.b === id));
    expect(run('cablePorts', { a: free[0], b: free[1], media: 'cat6a', lengthM: 2 }).ok).toBe(true);
    expect(run('renamePart', { id: free[0], name: 'renamed' }).ok).toBe(true);
    expect(run('deleteDevices', { ids: ['__proto__'] }).ok).toBe(true);
    const after = expectValid(store.getState().doc);
    expect(Object.hasOwn(after.layout!, '__proto__')).toBe(false);
    expect(Object.keys(after.layout!).sort()).toEqual([...DEVICE_IDS.filter((id) => id !== '__proto__'), '__lookupSetter__'].sort());
    store.getState().undo();
    expect(Object.hasOwn(store.getState().doc.layout!, '__proto__')).toBe(true);
    expect(run('deleteItems', { ids: ['constructor', free[0]] }).ok).toBe(true);
    expectValid(store.getState().doc);
  });

  it('auto-arranges and merges a pattern without losing or overlapping a device', () => {
    const store = opened(doc);
    expect(store.getState().run('autoArrange', {}).ok).toBe(true);
    const arranged = store.getState().doc;
    expect(Object.keys(arranged.layout!).sort()).toEqual([...DEVICE_IDS].sort());
    expect(overlappingDevices(buildSnapshot(arranged))).toEqual([]);
    expect(store.getState().run('applyPattern', { pattern: 'dual-fabric', mode: 'merge', options: { hosts: 2 } }).ok).toBe(true);
    const merged = expectValid(store.getState().doc);
    for (const device of merged.devices) expect({ id: device.id, placed: positionOf(merged, device.id) !== undefined }).toEqual({ id: device.id, placed: true });
  });

  it('marks a card whose id holds line feeds as a single point of failure', () => {
    const v1 = harborRoadV1();
    const at = v1.devices.findIndex((d) => d.id === 'cam-rec-2');
    const base = hostile(v1);
    const host = base.devices[at];
    if (host.kind !== 'host') throw new Error('cam-rec-2 is a host');
    const card = 'card\nof\ncam-rec-2';
    const checked = validateTopology(JSON.parse(JSON.stringify(renameIds(base, (id) => (id === host.adapters[0].id ? card : id)))));
    if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
    const renamed = checked.doc;
    const hostId = host.id;
    const report = analyze(renamed);
    expect(report.failures.map((f) => f.unit)).toContain(card);
    const marks = computeMarks(renamed, report);
    expect(splitIds(marks.devices.get(hostId)!.spofGroups)).toEqual([card]);
    const svg = exportSvg(buildSnapshot(renamed), { marks });
    expect(svg).not.toMatch(/[\u0000-\u0008\u000b\u000c\u000e-\u001f]/);
  });

  it('gives every cable a fabric with hostile network and switch ids', () => {
    const fabrics = computeFabrics(doc);
    expect(fabrics.byCable.size).toBe(doc.cables.length);
    expect([...fabrics.bySwitch.keys()]).toEqual(doc.devices.filter((d) => d.kind === 'switch').map((d) => d.id));
    expect([...fabrics.byNetwork.keys()]).toEqual(doc.networks.map((n) => n.id));
  });

  it('keeps the working copy with every layout key', () => {
    const storage = memoryStorage();
    expect(writeWorkingCopy(storage, 'd1', doc, 1)).toBe(true);
    const copy = readWorkingCopy(storage, 'd1');
    expect(copy).not.toBeNull();
    expect(Object.keys(copy!.doc.layout!)).toEqual(Object.keys(doc.layout!));
    expect(Object.keys(doc.layout!).sort()).toEqual([...DEVICE_IDS].sort());
    expect(copy!.doc).toEqual(doc);
  });
});

describe('the what-if comparison with ids that collide when joined', () => {
  it('keeps each host and array pair apart', () => {
    const pair = (host: string, array: string, sessions: number) => ({ host, array, sessions, controllersReached: ['c'], singlePointsOfFailure: [], redundant: true });
    const baseline = { hosts: [pair('a\u0000', 'b', 2), pair('a', '\u0000b', 2)], failures: [], findings: [] };
    const simulated = { hosts: [pair('a', '\u0000b', 2)], failures: [], findings: [] };
    expect(compareAccess(baseline, simulated).map((i) => i.effect)).toEqual(['lost', 'unchanged']);
  });
});
