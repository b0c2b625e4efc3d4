import { createCanvasUiStore } from '@/lib/editor/canvas-ui';
import { connectChoices, devicePorts } from '@/lib/editor/connect';
import { createGestures } from '@/lib/editor/gestures';
import { buildSnapshot, portBox, worldToScreen } from '@/lib/editor/geometry';
import { MIN_TAP_TARGET, portTargetOnScreen, portsTooSmallToTap } from '@/lib/editor/hit-test';
import { cableNow, openNoticedCable, undoNoticedCable } from '@/lib/editor/quick-cable';
import { createEditorStore } from '@/lib/editor/store';
import { harborRoadV1 } from '@/shared/fixtures/harbor-road';
import { Draft } from '@/tests/shared/helpers/draft';

/** The demo's version 1 in an editor store of its own, with a canvas 390 px wide (a phone). */
function phone(zoom: number) {
  const store = createEditorStore();
  store.getState().load(harborRoadV1(), { designId: 1, baseVersion: 1 });
  store.getState().setViewport({ x: 0, y: 0, zoom });
  const ui = createCanvasUiStore();
  ui.setState({ screen: { width: 390, height: 700 } });
  const gestures = createGestures({ store, ui, directCable: () => true });
  const at = (portId: string) => worldToScreen(store.getState().viewport, portBox(buildSnapshot(store.getState().doc), portId)!.anchor);
  const touch = (portId: string) => {
    const point = at(portId);
    gestures.down({ id: 1, kind: 'touch', point });
    gestures.up({ id: 1, kind: 'touch', point });
  };
  return { store, ui, touch };
}

describe('Connect to…', () => {
  it('puts the switch that carries the port’s network first, and says what is wrong with the rest', () => {
    const groups = connectChoices(harborRoadV1(), 'cam-rec-2.card-2.p1');
    expect(groups[0].deviceId).toBe('fab-b'); // fabric B: the port's own network (common practice: one subnet per fabric)
    expect(groups[0].ports.map((p) => [p.label, p.notes])).toEqual([['p11', []], ['p12', []]]);
    const fabA = groups.find((g) => g.deviceId === 'fab-a')!;
    expect(fabA.ports[0].notes).toEqual(['not on this network']);
    // A data port to the management switch: kept apart (common practice), another network, and slower (1G).
    const oob = groups.find((g) => g.deviceId === 'oob-1')!;
    expect(oob.ports[0].mismatches).toEqual(['role', 'network', 'speed']);
    // Another host's port carries no storage path; it comes after the switches.
    const order = groups.map((g) => g.deviceId);
    expect(order.indexOf('wms-db-1')).toBeGreaterThan(order.indexOf('oob-1'));
    // Ports already cabled and the port's own device are never offered.
    expect(groups.flatMap((g) => g.ports.map((p) => p.portId))).not.toContain('fab-a.p10');
    expect(order).not.toContain('cam-rec-2');
  });

  it('ranks a connector mismatch below everything else', () => {
    const d = new Draft().switch('fa').switch('fs').host('h1', { c1: 1 });
    for (const port of (d.device('fs') as { ports: { connector: string }[] }).ports) port.connector = 'sfp';
    const groups = connectChoices(d.build(), 'h1.c1.1');
    expect(groups.map((g) => g.deviceId)).toEqual(['fa', 'fs']);
    expect(groups[1].ports[0].notes).toEqual(['SFP, not RJ45']);
  });

  it('finds ports by device, card, port and network, every word', () => {
    const found = connectChoices(harborRoadV1(), 'cam-rec-2.card-2.p1', 'fab-b p12');
    expect(found.flatMap((g) => g.ports.map((p) => p.portId))).toEqual(['fab-b.p12']);
    expect(connectChoices(harborRoadV1(), 'cam-rec-2.card-2.p1', 'no such port')).toEqual([]);
  });

  it('lists a device’s ports with where each is cabled', () => {
    const ports = devicePorts(harborRoadV1(), 'cam-rec-2');
    expect(ports.map((p) => [p.label, p.cabledTo])).toEqual([
      ['card-1 p1', 'fab-a p10'],
      ['card-1 p2', null],
      ['card-2 p1', null],
      ['card-2 p2', null],
      ['onboard mgmt', 'oob-1 p8'],
    ]);
  });
});

describe('touch targets on the canvas', () => {
  it('measures a port target on screen and calls it too small below 44 px', () => {
    expect(portTargetOnScreen(1)).toBe(MIN_TAP_TARGET); // WCAG 2.1 SC 2.5.5: 44 × 44 CSS px
    expect(portsTooSmallToTap(1)).toBe(false);
    expect(portsTooSmallToTap(0.99)).toBe(true);
  });

  it('selects the device and opens its port list for a touch on a port too small to aim at, and guesses nothing', () => {
    const { store, ui, touch } = phone(0.3);
    touch('cam-rec-2.card-2.p1');
    expect(ui.getState().portList).toEqual({ deviceId: 'cam-rec-2' });
    expect(store.getState().pendingCableStart).toBeNull();
    expect(store.getState().selection).toEqual(['cam-rec-2']); // the device, not a guessed port
  });

  it('starts a cable from a port a finger can hit, and makes it at the second, with a notice', () => {
    const { store, ui, touch } = phone(1);
    touch('cam-rec-2.card-2.p1');
    expect(store.getState().pendingCableStart).toBe('cam-rec-2.card-2.p1');
    const before = store.getState().doc;
    store.getState().setViewport({ x: 600, y: 200, zoom: 1 });
    touch('fab-b.p11');
    const doc = store.getState().doc;
    expect(doc.cables.length).toBe(before.cables.length + 1);
    expect(ui.getState().chooser).toBeNull();
    expect(ui.getState().notice?.text).toMatch(/^Cable C\d+ made: cam-rec-2 card-2 p1 → fab-b p11 \(Cat 6A copper, 3 m\)\.$/);
    expect(store.getState().selection).toEqual([]); // no settings sheet unless asked
  });
});

describe('the notice of a cable just made', () => {
  function made() {
    const store = createEditorStore();
    store.getState().load(harborRoadV1(), { designId: 1, baseVersion: 1 });
    const ui = createCanvasUiStore();
    store.getState().startCable('cam-rec-2.card-2.p1');
    expect(cableNow('fab-b.p11', { store, ui })).toBeNull();
    return { store, ui, cableId: ui.getState().notice!.cableId };
  }

  it('undoes the cable in one step when nothing changed since', () => {
    const { store, ui } = made();
    const original = harborRoadV1();
    undoNoticedCable({ store, ui });
    expect(store.getState().doc.cables).toEqual(original.cables);
    expect(ui.getState().notice).toBeNull();
  });

  it('removes only the cable when something was edited after it', () => {
    const { store, ui, cableId } = made();
    store.getState().run('renameDevice', { id: 'fab-b', name: 'fabric-b' });
    undoNoticedCable({ store, ui });
    const doc = store.getState().doc;
    expect(doc.cables.some((c) => c.id === cableId)).toBe(false);
    expect(doc.devices.find((d) => d.id === 'fab-b')!.name).toBe('fabric-b');
  });

  it('selects the cable when its settings are asked for', () => {
    const { store, ui, cableId } = made();
    openNoticedCable({ store, ui });
    expect(store.getState().selection).toEqual([cableId]);
  });
});
