import { tupleKey } from '@/shared/keys/tuple';
import { naturalCompare } from '@/shared/schedule/order';
import { displayName } from '@/shared/topology/index';
import type { Device } from '@/shared/topology/schema';
import type { StepContext, StepKind } from './types';

/** Small functions the step builders share. */
export function stepId(kind: StepKind, ...ids: string[]): string {
  return tupleKey([kind, ...ids]);
}

/** Devices in natural order of their names, ids breaking ties. */
export function byName<T extends { id: string; name?: string }>(items: readonly T[]): T[] {
  return [...items].sort((a, b) => naturalCompare(displayName(a), displayName(b)) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** The rack a device is placed in, when that rack exists in the document. */
export function rackOf(ctx: StepContext, device: Device): string | null {
  const id = device.placement?.rackId;
  return id !== undefined && ctx.racks.has(id) ? id : null;
}

