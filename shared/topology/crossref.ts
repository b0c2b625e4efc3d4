import type { Issue } from '@/shared/api/common';
import type { Port, Topology } from '@/shared/topology/schema';

/**
 * The checks zod cannot make one value at a time: ids unique across the whole document (racks,
 * power feeds and PSUs included), cable ends that are existing and different ports, network
 * references that resolve to networks, placements naming racks and PSUs naming feeds, switch ports
 * without networkId or address (a switch carries every network), and layout keys naming devices.
 */
type Kind = 'device' | 'controller' | 'card' | 'port' | 'cable' | 'network' | 'rack' | 'power feed' | 'PSU';

/**
 * The first holder of each id, and every other kind that claimed it: when an id is used twice, the
 * duplicate is the one problem reported, and a reference that fits any of its holders is not
 * reported again as pointing at the wrong kind. A 20,000-host document has some 170,000 ids and, as
 * a rule, no issue, so a holder is a slot in typed arrays (its kind, and the indices that make its
 * path: `d` the device's, `g` the controller's or card's, `i` its own), written out as a path only
 * for an issue; the map from id to slot holds small integers, which the collector never walks.
 */
const KINDS: readonly Kind[] = ['device', 'controller', 'card', 'port', 'cable', 'network', 'rack', 'power feed', 'PSU'];
const KIND_NUMBER = new Map(KINDS.map((k, n) => [k, n]));

class Owners {
  private readonly slots = new Map<string, number>();
  private readonly kinds: Uint8Array;
  private readonly d: Int32Array;
  private readonly g: Int32Array;
  private readonly i: Int32Array;
  /** Further kinds of an id claimed more than once, by slot. */
  private readonly others = new Map<number, Set<Kind>>();
  private size = 0;

  constructor(
    private readonly doc: Topology,
    capacity: number,
  ) {
    this.kinds = new Uint8Array(capacity);
    this.d = new Int32Array(capacity);
    this.g = new Int32Array(capacity);
    this.i = new Int32Array(capacity);
  }

  /** Claim `id` for a thing; answers the slot of its earlier holder when it already had one, or -1. */
  claim(id: string, kind: Kind, d: number, g: number, i: number): number {
    const first = this.slots.get(id);
    if (first !== undefined) {
      if (KINDS[this.kinds[first]] !== kind) {
        const set = this.others.get(first) ?? new Set<Kind>();
        set.add(kind);
        this.others.set(first, set);
      }
      return first;
    }
    const slot = this.size++;
    this.kinds[slot] = KIND_NUMBER.get(kind)!;
    this.d[slot] = d;
    this.g[slot] = g;
    this.i[slot] = i;
    this.slots.set(id, slot);
    return -1;
  }

  /** The slot holding `id`, or undefined. */
  find(id: string): number | undefined {
    return this.slots.get(id);
  }

  kindOf(slot: number): Kind {
    return KINDS[this.kinds[slot]];
  }

  holds(slot: number, kind: Kind): boolean {
    return KINDS[this.kinds[slot]] === kind || (this.others.get(slot)?.has(kind) ?? false);
  }

  pathOf(slot: number): string {
    return pathOf(this.doc, this.kindOf(slot), this.d[slot], this.g[slot], this.i[slot]);
  }
}

function pathOf(doc: Topology, kind: Kind, d: number, g: number, i: number): string {
  switch (kind) {
    case 'rack':
      return `racks.${i}`;
    case 'power feed':
      return `powerFeeds.${i}`;
    case 'device':
      return `devices.${i}`;
    case 'PSU':
      return `devices.${d}.psus.${i}`;
    case 'controller':
      return `devices.${d}.controllers.${i}`;
    case 'card':
      return `devices.${d}.adapters.${i}`;
    case 'port': {
      const device = doc.devices[d];
      if (device.kind === 'array') return `devices.${d}.controllers.${g}.ports.${i}`;
      if (device.kind === 'host') return `devices.${d}.adapters.${g}.ports.${i}`;
      return `devices.${d}.ports.${i}`;
    }
    case 'cable':
      return `cables.${i}`;
    case 'network':
      return `networks.${i}`;
  }
}

function countIds(doc: Topology): number {
  let n = (doc.racks?.length ?? 0) + (doc.powerFeeds?.length ?? 0) + doc.devices.length + doc.cables.length + doc.networks.length;
  for (const device of doc.devices) {
    n += device.psus?.length ?? 0;
    if (device.kind === 'switch') n += device.ports.length;
    else {
      const groups = device.kind === 'array' ? device.controllers : device.adapters;
      n += groups.length;
      for (const group of groups) n += group.ports.length;
    }
  }
  return n;
}

function collectIds(doc: Topology, issues: Issue[]): Owners {
  const owners = new Owners(doc, countIds(doc));
  const claim = (value: string, kind: Kind, d: number, g: number, i: number) => {
    const first = owners.claim(value, kind, d, g, i);
    if (first < 0) return;
    issues.push({
      path: `${pathOf(doc, kind, d, g, i)}.id`,
      message: `The id "${value}" is already used by the ${owners.kindOf(first)} at ${owners.pathOf(first)}; every id must be unique in the document.`,
    });
  };
  const { racks, powerFeeds, devices, cables, networks } = doc;
  if (racks) for (let i = 0; i < racks.length; i += 1) claim(racks[i].id, 'rack', -1, -1, i);
  if (powerFeeds) for (let i = 0; i < powerFeeds.length; i += 1) claim(powerFeeds[i].id, 'power feed', -1, -1, i);
  for (let d = 0; d < devices.length; d += 1) {
    const device = devices[d];
    claim(device.id, 'device', d, -1, d);
    const psus = device.psus;
    if (psus) for (let i = 0; i < psus.length; i += 1) claim(psus[i].id, 'PSU', d, -1, i);
    if (device.kind === 'array') for (let i = 0; i < device.controllers.length; i += 1) claim(device.controllers[i].id, 'controller', d, -1, i);
    else if (device.kind === 'host') for (let i = 0; i < device.adapters.length; i += 1) claim(device.adapters[i].id, 'card', d, -1, i);
  }
  // Ports after every device, cables and networks after every port: the order issues are reported in.
  for (let d = 0; d < devices.length; d += 1) {
    const device = devices[d];
    if (device.kind === 'switch') {
      for (let i = 0; i < device.ports.length; i += 1) claim(device.ports[i].id, 'port', d, -1, i);
      continue;
    }
    const groups = device.kind === 'array' ? device.controllers : device.adapters;
    for (let g = 0; g < groups.length; g += 1) {
      const ports = groups[g].ports;
      for (let i = 0; i < ports.length; i += 1) claim(ports[i].id, 'port', d, g, i);
    }
  }
  for (let i = 0; i < cables.length; i += 1) claim(cables[i].id, 'cable', -1, -1, i);
  for (let i = 0; i < networks.length; i += 1) claim(networks[i].id, 'network', -1, -1, i);
  return owners;
}

function checkCables(doc: Topology, owners: Owners, issues: Issue[]): void {
  const { cables } = doc;
  for (let i = 0; i < cables.length; i += 1) {
    const cable = cables[i];
    for (const end of ['a', 'b'] as const) {
      const target = owners.find(cable[end]);
      if (target === undefined) {
        issues.push({ path: `cables.${i}.${end}`, message: `No port has the id "${cable[end]}".` });
      } else if (!owners.holds(target, 'port')) {
        issues.push({
          path: `cables.${i}.${end}`,
          message: `"${cable[end]}" is a ${owners.kindOf(target)}, not a port; a cable end must name a port.`,
        });
      }
    }
    if (cable.a === cable.b) {
      issues.push({ path: `cables.${i}.b`, message: 'A cable cannot join a port to itself; its two ends must differ.' });
    }
  }
}

function checkPort(port: Port, path: () => string, owners: Owners, issues: Issue[]): void {
  if (port.networkId === undefined) return;
  const target = owners.find(port.networkId);
  if (target === undefined) {
    issues.push({ path: `${path()}.networkId`, message: `No network has the id "${port.networkId}".` });
  } else if (!owners.holds(target, 'network')) {
    issues.push({
      path: `${path()}.networkId`,
      message: `"${port.networkId}" is a ${owners.kindOf(target)}, not a network.`,
    });
  }
}

function checkPorts(doc: Topology, owners: Owners, issues: Issue[]): void {
  const { devices } = doc;
  for (let d = 0; d < devices.length; d += 1) {
    const device = devices[d];
    if (device.kind === 'switch') {
      for (let i = 0; i < device.ports.length; i += 1) {
        const port = device.ports[i];
        if (port.networkId !== undefined) {
          issues.push({
            path: `devices.${d}.ports.${i}.networkId`,
            message: 'A switch port carries every network; remove its network reference.',
          });
        }
        if (port.address !== undefined) {
          issues.push({ path: `devices.${d}.ports.${i}.address`, message: 'A switch port has no address of its own; remove it.' });
        }
      }
      continue;
    }
    const kind = device.kind === 'array' ? 'controllers' : 'adapters';
    const groups = device.kind === 'array' ? device.controllers : device.adapters;
    for (let g = 0; g < groups.length; g += 1) {
      const ports = groups[g].ports;
      for (let i = 0; i < ports.length; i += 1) checkPort(ports[i], () => `devices.${d}.${kind}.${g}.ports.${i}`, owners, issues);
    }
  }
}

/** A reference that must name a thing of one kind: missing, or of another kind, is one issue. */
function checkReference(owners: Owners, value: string, kind: Kind, path: string, issues: Issue[]): void {
  const target = owners.find(value);
  if (target === undefined) issues.push({ path, message: `No ${kind} has the id "${value}".` });
  else if (!owners.holds(target, kind)) issues.push({ path, message: `"${value}" is a ${owners.kindOf(target)}, not a ${kind}.` });
}

function checkPlacementsAndPower(doc: Topology, owners: Owners, issues: Issue[]): void {
  doc.devices.forEach((device, d) => {
    if (device.placement) checkReference(owners, device.placement.rackId, 'rack', `devices.${d}.placement.rackId`, issues);
    device.psus?.forEach((psu, i) => {
      if (psu.feedId !== undefined) checkReference(owners, psu.feedId, 'power feed', `devices.${d}.psus.${i}.feedId`, issues);
    });
  });
}

function checkLayout(doc: Topology, owners: Owners, issues: Issue[]): void {
  for (const key of Object.keys(doc.layout ?? {})) {
    const owner = owners.find(key);
    if (owner === undefined || !owners.holds(owner, 'device')) {
      issues.push({ path: `layout.${key}`, message: `The layout names "${key}", which is not a device of this document.` });
    }
  }
}

export function crossReferenceIssues(doc: Topology): Issue[] {
  const issues: Issue[] = [];
  const owners = collectIds(doc, issues);
  checkCables(doc, owners, issues);
  checkPorts(doc, owners, issues);
  checkPlacementsAndPower(doc, owners, issues);
  checkLayout(doc, owners, issues);
  return issues;
}
