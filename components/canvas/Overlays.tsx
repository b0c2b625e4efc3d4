import { useStore } from 'zustand';
import { Line, Rect } from 'react-native-svg';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { normalizeRect } from '@/lib/editor/hit-test';
import { portBox, type Snapshot } from '@/lib/editor/snapshot';
import { INK } from '@/lib/editor/drawing';

/** The cable being drawn, from its first port to the pointer (mouse only: a finger has no hover). */
export function RubberBand({ snapshot, pendingPort, zoom }: { snapshot: Snapshot; pendingPort: string | null; zoom: number }) {
  const pointer = useStore(canvasUiStore, (s) => s.pointer);
  const start = pendingPort ? portBox(snapshot, pendingPort) : undefined;
  if (!start || !pointer) return null;
  return <Line x1={start.anchor.x} y1={start.anchor.y} x2={pointer.x} y2={pointer.y} stroke={INK.copper} strokeWidth={2 / zoom} strokeDasharray={`${6 / zoom} ${4 / zoom}`} pointerEvents="none" />;
}

export function Marquee({ zoom }: { zoom: number }) {
  const marquee = useStore(canvasUiStore, (s) => s.marquee);
  if (!marquee) return null;
  const r = normalizeRect(marquee);
  return <Rect testID="canvas-marquee" x={r.x} y={r.y} width={r.width} height={r.height} fill={INK.copperSoft} fillOpacity={0.25} stroke={INK.copper} strokeWidth={1.5 / zoom} strokeDasharray={`${5 / zoom} ${3 / zoom}`} pointerEvents="none" />;
}
