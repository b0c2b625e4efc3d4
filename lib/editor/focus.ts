import type { Finding } from '@/shared/analysis/types';
import { boundsOf } from '@/lib/editor/positions';
import type { Rect } from '@/lib/editor/shape';
import { boxOf, type Snapshot } from '@/lib/editor/snapshot';
import { centreOn, fitToBounds, type Size, type Viewport } from '@/lib/editor/viewport';

/**
 * Tapping a finding: the subjects the canvas can show (devices, controllers, cards, ports,
 * cables) become the selection, and the view moves so all of them are on screen — centred at the
 * current zoom when they fit, else zoomed out just enough.
 */
export type Focus = { selection: string[]; viewport: Viewport | null };

export function subjectRect(snapshot: Snapshot, id: string): Rect | undefined {
  const box = boxOf(snapshot, id);
  if (box) return box;
  const line = snapshot.cables.get(id);
  if (!line) return undefined;
  return { x: Math.min(line.a.x, line.b.x), y: Math.min(line.a.y, line.b.y), width: Math.abs(line.a.x - line.b.x), height: Math.abs(line.a.y - line.b.y) };
}

export function focusOn(snapshot: Snapshot, ids: readonly string[], viewport: Viewport, screen: Size, padding = 60): Focus {
  const rects: { rect: Rect }[] = [];
  const selection: string[] = [];
  for (const id of ids) {
    const rect = subjectRect(snapshot, id);
    if (!rect) continue;
    selection.push(id);
    rects.push({ rect });
  }
  const union = boundsOf(rects);
  if (!union || screen.width <= 0) return { selection, viewport: null };
  const fits = union.width * viewport.zoom <= screen.width - 2 * padding && union.height * viewport.zoom <= screen.height - 2 * padding;
  const next = fits ? centreOn(viewport, { x: union.x + union.width / 2, y: union.y + union.height / 2 }, screen) : fitToBounds(union, screen, padding, viewport.zoom);
  return { selection, viewport: next };
}

export function focusFinding(snapshot: Snapshot, finding: Finding, viewport: Viewport, screen: Size): Focus {
  return focusOn(snapshot, finding.subjects, viewport, screen);
}
