import { unitsText } from '@/shared/racks/geometry';
import { displayName } from '@/shared/topology/index';
import type { Device, Rack } from '@/shared/topology/schema';
import { listText } from './step-text';
import { byName, rackOf, stepId } from './step-kit';
import type { Step, StepContext } from './types';

/**
 * Racks and power: for each rack (natural order of names), stand and stabilise it and mount its
 * equipment from the bottom up; then connect its power with everything left off, so the switches
 * can be powered on first. Devices without a rack come last, as one group.
 */
export function rackSteps(ctx: StepContext): Step[] {
  const inRack = new Map<string | null, Device[]>();
  for (const device of ctx.doc.devices) {
    const key = rackOf(ctx, device);
    const list = inRack.get(key);
    if (list) list.push(device);
    else inRack.set(key, [device]);
  }
  const steps: Step[] = [];
  for (const rack of byName(ctx.doc.racks ?? [])) {
    const devices = bottomUp(inRack.get(rack.id) ?? []);
    steps.push(mountStep(rack, devices), powerStep(ctx, rack, devices));
  }
  const loose = byName(inRack.get(null) ?? []);
  if (loose.length > 0) steps.push(mountStep(null, loose), powerStep(ctx, null, loose));
  return steps;
}

function bottomUp(devices: readonly Device[]): Device[] {
  return byName(devices).sort((a, b) => (a.placement?.ru ?? 0) - (b.placement?.ru ?? 0));
}

function mountStep(rack: Rack | null, devices: readonly Device[]): Step {
  const where = devices.map((d) => (rack ? `${displayName(d)} (${unitsText(d)})` : displayName(d)));
  const detail = rack
    ? devices.length === 0
      ? `Rack ${displayName(rack)} holds no equipment in this design. Stand it level and deploy its stabilisers or anchor it.`
      : `Stand rack ${displayName(rack)} level and deploy its stabilisers or anchor it before anything is mounted. ` +
        `Mount from the bottom up, two people for each heavy item: ${listText(where)}.`
    : `These devices are not placed in a rack in the design: ${listText(where)}. Find their place with the designer, ` +
      'then mount them heaviest lowest, two people for each heavy item.';
  return {
    id: rack ? stepId('rack', rack.id) : stepId('rack'),
    phase: 'racks',
    kind: 'rack',
    title: rack ? `Stand rack ${displayName(rack)} and mount its equipment` : 'Mount the equipment without a rack',
    detail,
    deviceId: null,
    rackId: rack?.id ?? null,
    expectedSessions: null,
    caution: false,
    source: 'common practice',
  };
}

function powerStep(ctx: StepContext, rack: Rack | null, devices: readonly Device[]): Step {
  const feeds = new Map((ctx.doc.powerFeeds ?? []).map((f) => [f.id, f]));
  const cords = devices.map((device) => {
    const psus = device.psus ?? [];
    if (psus.length === 0) return displayName(device);
    const each = psus.map((psu) => {
      const feed = psu.feedId === undefined ? undefined : feeds.get(psu.feedId);
      return feed ? `${displayName(psu)} to ${displayName(feed)}` : `${displayName(psu)} (no feed in the design)`;
    });
    return `${displayName(device)}: ${listText(each)}`;
  });
  const name = rack ? `rack ${displayName(rack)}` : 'the equipment without a rack';
  const detail =
    devices.length === 0
      ? `Nothing in ${name} needs power in this design.`
      : `Connect the power cords in ${name} and leave everything switched off: ${cords.join('; ')}. ` +
        'Keep each circuit within its rating; where a device has two supplies, put them on different circuits when the design gives no feeds.';
  return {
    id: rack ? stepId('power', rack.id) : stepId('power'),
    phase: 'racks',
    kind: 'power',
    title: rack ? `Connect power in rack ${displayName(rack)}` : 'Connect power to the equipment without a rack',
    detail,
    deviceId: null,
    rackId: rack?.id ?? null,
    expectedSessions: null,
    caution: false,
    source: 'local electrical code',
  };
}
