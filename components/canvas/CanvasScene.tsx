import { useMemo } from 'react';
import { useStore } from 'zustand';
import { joinIds } from '@/shared/keys/tuple';
import Svg, { Circle, Defs, G, Line, Pattern, Rect } from 'react-native-svg';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { GRID_SIZE, visibleWorld } from '@/lib/editor/viewport';
import { computeFabrics } from '@/lib/editor/fabrics';
import { HATCH_ID, INK } from '@/lib/editor/drawing';
import { liveAnalysisStore } from '@/lib/editor/live-analysis';
import { useCanvasSnapshot, usePendingCableStart, useSelection, useViewport } from '@/lib/editor/hooks';
import { withMovedDevices, type Snapshot } from '@/lib/editor/snapshot';
import { cull, cullRect, DETAIL_ZOOM } from '@/lib/editor/culling';
import { CableLayer, DeviceLayer } from '@/components/canvas/Layers';
import { Marquee, RubberBand } from '@/components/canvas/Overlays';

/** Ports with a cable, per device, as joinIds text in cable order (compares by value in the layers). */
function cabledByDevice(snapshot: Snapshot): Map<string, string> {
  const lists = new Map<string, string[]>();
  for (const cable of snapshot.doc.cables) {
    for (const portId of [cable.a, cable.b]) {
      const deviceId = snapshot.parts.get(portId)?.deviceId;
      if (!deviceId) continue;
      const list = lists.get(deviceId);
      if (list) list.push(portId);
      else lists.set(deviceId, [portId]);
    }
  }
  return new Map([...lists].map(([id, ports]) => [id, joinIds(ports)]));
}

function partsByDevice(snapshot: Snapshot, selection: string[]): Map<string, string> {
  const lists = new Map<string, string[]>();
  for (const id of selection) {
    const deviceId = snapshot.parts.get(id)?.deviceId;
    if (deviceId) lists.set(deviceId, [...(lists.get(deviceId) ?? []), id]);
  }
  return new Map([...lists].map(([id, parts]) => [id, joinIds(parts)]));
}

/**
 * The drawing: the snapshot (with a drag's preview positions applied) under the viewport's
 * transform. It reads each input through its own selector and derives everything else with memos,
 * so a pointer move during a drag costs one preview snapshot and the few items it touched.
 */
export function CanvasScene({ width, height, label }: { width: number; height: number; label: string }) {
  const snapshot = useCanvasSnapshot();
  const drag = useStore(canvasUiStore, (s) => s.drag);
  const tags = useStore(canvasUiStore, (s) => s.cableTags);
  const viewport = useViewport();
  const selection = useSelection();
  const pending = usePendingCableStart();
  const marks = useStore(liveAnalysisStore, (s) => s.marks);
  const doc = snapshot.doc;

  const shown = useMemo(() => (drag ? withMovedDevices(snapshot, drag.moves) : snapshot), [snapshot, drag]);
  const area = cullRect(viewport, { width, height });
  const drawn = useMemo(() => cull(shown, area), [shown, area.x, area.y, area.width, area.height]); // narrow deps on purpose
  const detail = viewport.zoom >= DETAIL_ZOOM;
  const fabrics = useMemo(() => computeFabrics(doc), [doc.devices, doc.cables, doc.networks]); // narrow deps on purpose
  const cabled = useMemo(() => cabledByDevice(snapshot), [snapshot.doc.cables, snapshot.parts]); // narrow deps on purpose
  const selectionSet = useMemo(() => new Set(selection), [selection]);
  const parts = useMemo(() => partsByDevice(snapshot, selection), [snapshot.parts, selection]); // narrow deps on purpose
  const pendingDevice = pending ? (snapshot.parts.get(pending)?.deviceId ?? null) : null;

  const { zoom } = viewport;
  const world = visibleWorld(viewport, { width, height });
  const transform = `translate(${-viewport.x * zoom} ${-viewport.y * zoom}) scale(${zoom})`;
  return (
    <Svg width={width} height={height} role="img" aria-label={label} testID="canvas-svg">
      <Defs>
        <Pattern id={HATCH_ID} width={8} height={8} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <Rect width={8} height={8} fill={INK.dangerSoft} fillOpacity={0.35} />
          <Line x1={0} y1={0} x2={0} y2={8} stroke={INK.danger} strokeWidth={2} strokeOpacity={0.35} />
        </Pattern>
        <Pattern id="cw-grid" width={GRID_SIZE} height={GRID_SIZE} patternUnits="userSpaceOnUse">
          <Circle cx={1} cy={1} r={1} fill={INK.line} />
        </Pattern>
      </Defs>
      <Rect width={width} height={height} fill={INK.paper} />
      <G transform={transform}>
        {zoom >= 0.4 ? <Rect x={world.x} y={world.y} width={world.width} height={world.height} fill="url(#cw-grid)" /> : null}
        <CableLayer cables={drawn.cables} fabrics={fabrics} selection={selectionSet} marks={marks} detail={detail} tags={tags} />
        <DeviceLayer devices={drawn.devices} detail={detail} fabrics={fabrics} selection={selectionSet} partsByDevice={parts} cabledByDevice={cabled} pendingPort={pending} pendingDevice={pendingDevice} marks={marks} />
        <RubberBand snapshot={shown} pendingPort={pending} zoom={zoom} />
        <Marquee zoom={zoom} />
      </G>
    </Svg>
  );
}
