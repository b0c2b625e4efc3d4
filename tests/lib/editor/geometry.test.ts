import {
  buildSnapshot,
  centreOn,
  clampZoom,
  devicePorts,
  devicesInRect,
  fitPadding,
  FIT_MAX_ZOOM,
  fitToBounds,
  groupBox,
  hitTest,
  MAX_ZOOM,
  MIN_ZOOM,
  overlappingDevices,
  panBy,
  portBox,
  rectContains,
  rectsIntersect,
  screenToWorld,
  snapToGrid,
  toWorld,
  visibleWorld,
  withMovedDevices,
  worldToScreen,
  zoomAbout,
} from '@/lib/editor/geometry';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { moveDevice } from '@/lib/editor/commands';
import { apply, smallDesign } from '@/tests/lib/editor/helpers/editor';
import { bigDesign } from '@/tests/lib/editor/helpers/big-design';

function cabledSmall() {
  // host-1 card-1 p1 == switch-1 p1; array-1 ctl-a p1 == switch-2 p1
  let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
  doc = apply(doc, 'cablePorts', { a: 'array-1-ctl-a-p1', b: 'switch-2-p1' });
  return doc;
}

describe('device shapes', () => {
  const snapshot = buildSnapshot(cabledSmall());

  it('gives every port a tap target of at least 44 × 44 px at zoom 1', () => {
    // WCAG 2.2 success criterion 2.5.5 (target size, enhanced): 44 × 44 CSS px.
    for (const box of snapshot.devices.values()) {
      for (const port of box.shape.ports) expect([port.target.width >= 44, port.target.height >= 44]).toEqual([true, true]);
    }
  });

  it('keeps ports inside their group and device, groups inside the device, targets apart', () => {
    for (const box of snapshot.devices.values()) {
      const groups = box.shape.groups.map((g) => groupBox(snapshot, g.id)!);
      for (const group of groups) expect(rectContains(box.rect, group.rect) && rectContains(box.rect, { x: group.rect.x + group.rect.width, y: group.rect.y + group.rect.height })).toBe(true);
      const ports = devicePorts(box);
      for (const port of ports) {
        const outer = port.groupId ? groups.find((g) => g.id === port.groupId)!.rect : box.rect;
        expect(rectContains(outer, port.target) && rectContains(outer, { x: port.target.x + port.target.width, y: port.target.y + port.target.height })).toBe(true);
        expect(rectContains(port.target, port.anchor)).toBe(true);
      }
      const targets = ports.map((p) => p.target);
      for (let i = 0; i < targets.length; i += 1) for (let j = i + 1; j < targets.length; j += 1) expect(rectsIntersect(targets[i], targets[j])).toBe(false);
    }
  });

  it('sizes a device from its controllers, cards and ports', () => {
    const host = snapshot.devices.get('host-1')!;
    expect(host.shape.groups.map((g) => g.name)).toEqual(['card-1', 'card-2', 'onboard']);
    const doc = apply(apply(smallDesign(), 'addDevice', { template: 'data-switch', options: { ports: 48 } }), 'addAdapter', { hostId: 'host-1' });
    const bigger = buildSnapshot(doc);
    expect(bigger.devices.get('switch-3')!.rect.height).toBeGreaterThan(snapshot.devices.get('switch-1')!.rect.height);
    expect(bigger.devices.get('host-1')!.rect.width).toBeGreaterThan(host.rect.width);
  });

  it('draws cables between the anchors of their ports', () => {
    const line = snapshot.cables.get('cable-1')!;
    expect([line.a, line.b]).toEqual([portBox(snapshot, 'host-1-card-1-p1')!.anchor, portBox(snapshot, 'switch-1-p1')!.anchor]);
  });

  it('bounds every device box', () => {
    const b = snapshot.bounds!;
    for (const box of snapshot.devices.values()) expect(rectContains(b, box.rect) && rectContains(b, { x: box.rect.x + box.rect.width, y: box.rect.y + box.rect.height })).toBe(true);
    expect(buildSnapshot({ ...cabledSmall(), devices: [], cables: [], layout: {} }).bounds).toBeNull();
  });

  it('places devices the layout lacks in a row under the drawing, without overlaps', () => {
    const doc = { ...cabledSmall(), layout: { 'host-1': { x: 0, y: 0 } } };
    const snap = buildSnapshot(doc);
    expect(overlappingDevices(snap)).toEqual([]);
    expect(snap.devices.get('array-1')!.rect.y).toBeGreaterThan(snap.devices.get('host-1')!.rect.height);
  });
});

describe('incremental snapshots', () => {
  it('reuses every box and line when the document is unchanged', () => {
    const doc = cabledSmall();
    const first = buildSnapshot(doc);
    const again = buildSnapshot({ ...doc }, first);
    for (const [id, box] of first.devices) expect(again.devices.get(id)).toBe(box);
    for (const [id, line] of first.cables) expect(again.cables.get(id)).toBe(line);
  });

  it('keeps a moved device\'s shape, so nothing inside it is redrawn', () => {
    const doc = cabledSmall();
    const first = buildSnapshot(doc);
    const moved = buildSnapshot(moveDevice(doc, { id: 'host-1', x: 300, y: 300 }), first);
    expect(moved.devices.get('host-1')!.shape).toBe(first.devices.get('host-1')!.shape);
    expect(portBox(moved, 'host-1-card-1-p1')!.anchor.x - portBox(first, 'host-1-card-1-p1')!.anchor.x).toBe(300);
  });

  it('recomputes only the moved device and its cables', () => {
    const doc = cabledSmall();
    const first = buildSnapshot(doc);
    const moved = buildSnapshot(moveDevice(doc, { id: 'switch-1', x: 40, y: 400 }), first);
    expect(moved.devices.get('switch-1')).not.toBe(first.devices.get('switch-1'));
    expect(moved.devices.get('switch-1')!.rect).toMatchObject({ x: 40, y: 400 });
    for (const id of ['array-1', 'switch-2', 'host-1', 'host-2']) expect(moved.devices.get(id)).toBe(first.devices.get(id));
    expect(moved.cables.get('cable-1')).not.toBe(first.cables.get('cable-1'));
    expect(moved.cables.get('cable-2')).toBe(first.cables.get('cable-2'));
    expect(moved.cables.get('cable-1')!.b).toEqual(portBox(moved, 'switch-1-p1')!.anchor);
  });

  it('previews a drag without touching the document', () => {
    const doc = cabledSmall();
    const first = buildSnapshot(doc);
    const preview = withMovedDevices(first, { 'host-1': { x: 900, y: 900 } });
    expect(preview.doc).toBe(doc);
    expect(preview.devices.get('host-1')!.rect).toMatchObject({ x: 900, y: 900 });
    expect(preview.cables.get('cable-1')!.a).toEqual(portBox(preview, 'host-1-card-1-p1')!.anchor);
    expect(preview.cables.get('cable-2')).toBe(first.cables.get('cable-2'));
    expect(withMovedDevices(first, { 'host-1': first.devices.get('host-1')!.position })).toBe(first);
  });

  it('rebuilds only the moved device and its cables on a 300-device, 600-cable design', () => {
    // Speed itself is measured by `npm run bench` (tests/bench/editor.bench.ts); here the reuse that
    // makes a drag cheap: untouched devices and cables keep their computed objects.
    const doc = bigDesign();
    expect([doc.devices.length, doc.cables.length]).toEqual([300, 600]);
    const before = buildSnapshot(doc);
    const moved = moveDevice(doc, { id: 'switch-7', x: 5000, y: 900 });
    const after = buildSnapshot(moved, before);
    expect(after.devices.get('switch-7')!.rect).toMatchObject({ x: 5000, y: 900 });
    const touching = new Set(after.cablesByDevice.get('switch-7') ?? []);
    let reusedDevices = 0;
    for (const [id, box] of after.devices) if (id !== 'switch-7' && box === before.devices.get(id)) reusedDevices += 1;
    expect(reusedDevices).toBe(299);
    for (const [id, line] of after.cables) {
      expect([id, line === before.cables.get(id)]).toEqual([id, !touching.has(id)]);
    }
  });
});

describe('hit-testing', () => {
  const snapshot = buildSnapshot(cabledSmall());

  it('finds the port under a point, then the group, then the device', () => {
    const port = portBox(snapshot, 'host-1-card-2-p2')!;
    expect(hitTest(snapshot, port.anchor)).toEqual({ kind: 'port', id: 'host-1-card-2-p2', deviceId: 'host-1' });
    const group = groupBox(snapshot, 'host-1-card-2')!;
    expect(hitTest(snapshot, { x: group.rect.x + 2, y: group.rect.y + 2 })).toEqual({ kind: 'group', id: 'host-1-card-2', deviceId: 'host-1' });
    const header = toWorld(snapshot.devices.get('host-1')!, snapshot.devices.get('host-1')!.shape.header);
    expect(hitTest(snapshot, { x: header.x + 5, y: header.y + 5 })).toEqual({ kind: 'device', id: 'host-1' });
  });

  it('finds a cable only where no device is, within the tolerance', () => {
    const line = snapshot.cables.get('cable-1')!;
    // A point halfway along the cable, between host-1 (top band) and switch-1 (middle band).
    const mid = { x: (line.a.x + line.b.x) / 2, y: (line.a.y + line.b.y) / 2 };
    expect(hitTest(snapshot, mid)).toEqual({ kind: 'cable', id: 'cable-1' });
    expect(hitTest(snapshot, { x: mid.x + 6, y: mid.y })).toEqual({ kind: 'cable', id: 'cable-1' });
    expect(hitTest(snapshot, { x: mid.x + 30, y: mid.y }, { cableTolerance: 8 })).toBeNull();
    expect(hitTest(snapshot, { x: -5000, y: -5000 })).toBeNull();
  });

  it('lets the device drawn last win where two overlap', () => {
    const doc = apply(cabledSmall(), 'moveDevice', { id: 'host-2', x: 10, y: 10 });
    const snap = buildSnapshot(doc);
    expect(hitTest(snap, { x: 20, y: 15 })).toEqual({ kind: 'device', id: 'host-2' });
    expect(overlappingDevices(snap)).toEqual([['host-1', 'host-2']]);
  });

  it('selects the devices a marquee touches, dragged either way', () => {
    const host = snapshot.devices.get('host-1')!.rect;
    expect(devicesInRect(snapshot, { x: host.x + 10, y: host.y + 10, width: 20, height: 20 })).toEqual(['host-1']);
    expect(devicesInRect(snapshot, { x: host.x + 30, y: host.y + 30, width: -20, height: -20 })).toEqual(['host-1']);
  });
});

describe('viewport math', () => {
  const v = { x: 100, y: 50, zoom: 2 };

  it('converts between screen and world both ways', () => {
    const world = { x: 130, y: 70 };
    expect(worldToScreen(v, world)).toEqual({ x: 60, y: 40 });
    expect(screenToWorld(v, worldToScreen(v, world))).toEqual(world);
  });

  it('zooms about a point that stays put on screen, within limits', () => {
    const screenPoint = { x: 300, y: 200 };
    const world = screenToWorld(v, screenPoint);
    const zoomed = zoomAbout(v, screenPoint, 3);
    expect(worldToScreen(zoomed, world).x).toBeCloseTo(screenPoint.x, 9);
    expect(worldToScreen(zoomed, world).y).toBeCloseTo(screenPoint.y, 9);
    expect([clampZoom(100), clampZoom(0), clampZoom(Number.NaN)]).toEqual([MAX_ZOOM, MIN_ZOOM, 1]);
  });

  it('pans by a screen distance', () => {
    expect(panBy(v, 20, -10)).toEqual({ x: 90, y: 55, zoom: 2 });
  });

  it('fits the drawing to the screen, centred and not zoomed past 1', () => {
    const bounds = { x: 0, y: 0, width: 2000, height: 1000 };
    const screen = { width: 1000, height: 800 };
    const fit = fitToBounds(bounds, screen, 40);
    const seen = visibleWorld(fit, screen);
    expect(rectContains(seen, { x: 0, y: 0 }) && rectContains(seen, { x: 2000, y: 1000 })).toBe(true);
    expect(fit.zoom).toBeCloseTo(920 / 2000, 9);
    expect(fitToBounds({ x: 0, y: 0, width: 10, height: 10 }, screen).zoom).toBe(1);
    expect(centreOn(fit, { x: 1000, y: 500 }, screen)).toEqual(fit);
  });

  it('fills a phone with the demo drawing and enlarges a small drawing, as the canvas fits them', () => {
    const demo = buildSnapshot(harborRoadV2()).bounds!;
    const phone = { width: 390, height: 700 };
    const fit = fitToBounds(demo, phone, fitPadding(phone), FIT_MAX_ZOOM);
    expect((demo.width * fit.zoom) / phone.width).toBeGreaterThan(0.9);
    const wide = { width: 1100, height: 800 };
    expect(fitPadding(wide)).toBe(40);
    expect(fitToBounds({ x: 0, y: 0, width: 300, height: 200 }, wide, fitPadding(wide), FIT_MAX_ZOOM).zoom).toBe(1.5);
  });

  it('snaps points to the grid', () => {
    expect(snapToGrid({ x: 29, y: -31 })).toEqual({ x: 20, y: -40 });
    expect(snapToGrid({ x: 29, y: 31 }, 0)).toEqual({ x: 29, y: 31 });
  });
});
