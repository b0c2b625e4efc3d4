import { positionOf } from '@/shared/topology/layout';
import type { Topology } from '@/shared/topology/schema';
import { computeArrangement } from '@/lib/editor/arrange';
import { overlappingDevices } from '@/lib/editor/hit-test';
import { buildSnapshot } from '@/lib/editor/snapshot';

/**
 * A document as the editor opens it: when its saved layout lacks a device or has boxes that
 * overlap on this canvas (older patterns placed devices 200 px apart, narrower than a 24-port
 * switch is drawn), every device gets the layered arrangement instead. Nothing else changes.
 */
export function withTidyLayout(doc: Topology): { doc: Topology; fixed: boolean } {
  if (doc.devices.length === 0) return { doc, fixed: false };
  const unplaced = doc.devices.some((d) => !positionOf(doc, d.id));
  if (!unplaced && overlappingDevices(buildSnapshot(doc)).length === 0) return { doc, fixed: false };
  return { doc: { ...doc, layout: computeArrangement(doc) }, fixed: true };
}
