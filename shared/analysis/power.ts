import type { Device, PowerFeed, Psu, Topology } from '@/shared/topology/schema';

/**
 * Power as failure units (docs/topology-format.md, format 2): every PSU and every power feed is a unit.
 * A device is down when every one of its PSUs is down — the PSU failed, or the feed it is on failed.
 * A device without PSUs is never taken down by power. A controller is powered by its array's PSUs,
 * a card by its host's.
 *
 * A device that is down takes its data-path units with it: a switch is itself a unit, an array takes
 * all its controllers and a host all its cards. `unitsOfDevice` names them, so the rest of the
 * analysis sees a power failure as the failure of those units and needs no rule of its own.
 */
export type PowerModel = {
  /** PSU id → the PSU and the device it powers. */
  psus: Map<string, { psu: Psu; device: Device }>;
  feeds: Map<string, PowerFeed>;
  /** Devices with at least one PSU, in document order. */
  powered: Device[];
  /** Feed id → the devices with at least one PSU on it, in document order, each once. */
  devicesOnFeed: Map<string, Device[]>;
};

export function powerModel(doc: Topology): PowerModel {
  const psus = new Map<string, { psu: Psu; device: Device }>();
  const feeds = new Map<string, PowerFeed>();
  const powered: Device[] = [];
  const devicesOnFeed = new Map<string, Device[]>();
  for (const feed of doc.powerFeeds ?? []) {
    feeds.set(feed.id, feed);
    devicesOnFeed.set(feed.id, []);
  }
  for (const device of doc.devices) {
    const list = device.psus ?? [];
    if (list.length === 0) continue;
    powered.push(device);
    for (const psu of list) {
      psus.set(psu.id, { psu, device });
      if (psu.feedId === undefined) continue;
      const onFeed = devicesOnFeed.get(psu.feedId);
      if (onFeed && onFeed[onFeed.length - 1] !== device) onFeed.push(device);
    }
  }
  return { psus, feeds, powered, devicesOnFeed };
}

export function hasPower(model: PowerModel): boolean {
  return model.psus.size > 0 || model.feeds.size > 0;
}

/** Whether one PSU is delivering power with these units failed. */
export function psuLive(psu: Psu, failed: ReadonlySet<string>): boolean {
  return !failed.has(psu.id) && (psu.feedId === undefined || !failed.has(psu.feedId));
}

/** Whether a device is down for lack of power with these units failed. */
export function poweredDown(device: Device, failed: ReadonlySet<string>): boolean {
  const list = device.psus ?? [];
  return list.length > 0 && list.every((psu) => !psuLive(psu, failed));
}

/** The data-path failure units a device takes with it when it loses power. */
export function unitsOfDevice(device: Device): string[] {
  if (device.kind === 'switch') return [device.id];
  if (device.kind === 'array') return device.controllers.map((c) => c.id);
  return device.adapters.map((a) => a.id);
}

/**
 * The failed set the analysis works with: the units asked for, plus every data-path unit of a
 * device that those failures leave without power. Without power units among the ids it is the same set.
 */
export function withPowerFailures(model: PowerModel, requested: readonly string[]): Set<string> {
  const failed = new Set(requested);
  if (!requested.some((id) => model.psus.has(id) || model.feeds.has(id))) return failed;
  const asked = new Set(requested);
  for (const device of model.powered) {
    if (poweredDown(device, asked)) for (const unit of unitsOfDevice(device)) failed.add(unit);
  }
  return failed;
}

/** A power unit that is still up, and the devices that go down when it fails as well. */
export type PowerCut = { unit: string; devices: Device[] };

/**
 * For every PSU and feed still up with `failed` down: the devices still up that it alone would take
 * down. Units that would take nothing down are left out. In document order: feeds, then PSUs.
 */
export function powerCuts(model: PowerModel, failed: ReadonlySet<string>): PowerCut[] {
  const out: PowerCut[] = [];
  const lastLive = (device: Device): Psu | null => {
    let live: Psu | null = null;
    for (const psu of device.psus ?? []) {
      if (!psuLive(psu, failed)) continue;
      if (live) return null;
      live = psu;
    }
    return live;
  };
  for (const [feedId, devices] of model.devicesOnFeed) {
    if (failed.has(feedId)) continue;
    const down = devices.filter((device) => {
      const live = (device.psus ?? []).filter((psu) => psuLive(psu, failed));
      return live.length > 0 && live.every((psu) => psu.feedId === feedId);
    });
    if (down.length > 0) out.push({ unit: feedId, devices: down });
  }
  for (const device of model.powered) {
    const live = lastLive(device);
    if (live) out.push({ unit: live.id, devices: [device] });
  }
  return out;
}

/**
 * powerCuts with one more unit failed, from the cuts before it: a unit that is not power leaves them
 * as they are, a PSU changes only its own device's, and a feed is worked out again.
 */
export function powerCutsAfter(model: PowerModel, before: PowerCut[], failed: ReadonlySet<string>, unit: string): PowerCut[] {
  if (model.feeds.has(unit)) return powerCuts(model, failed);
  const owner = model.psus.get(unit)?.device;
  if (!owner) return before;
  const out: PowerCut[] = [];
  for (const cut of before) {
    if (!cut.devices.includes(owner)) {
      out.push(cut);
      continue;
    }
    const devices = cut.devices.filter((d) => d !== owner);
    if (devices.length > 0) out.push({ unit: cut.unit, devices });
  }
  const live = (owner.psus ?? []).filter((psu) => psuLive(psu, failed));
  if (live.length === 0) return out;
  const feedId = live[0].feedId;
  if (feedId !== undefined && live.every((psu) => psu.feedId === feedId)) {
    // The cuts before are shared by every unit's answer: a changed one is a new object.
    const at = out.findIndex((c) => c.unit === feedId);
    if (at >= 0) out[at] = { unit: feedId, devices: [...out[at].devices, owner] };
    else out.push({ unit: feedId, devices: [owner] });
  }
  if (live.length === 1) out.push({ unit: live[0].id, devices: [owner] });
  return out;
}
