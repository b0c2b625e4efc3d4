import { z } from 'zod';
import { parseCidr } from '@/shared/address/cidr';
import { PATTERNS, type ManagedFabricOptions } from '@/shared/patterns';
import { withPositions } from '@/shared/topology/layout';
import { CHAP_MODES, CONNECTORS, MEDIA, PORT_SPEEDS, type Cable, type Device, type Network, type Topology } from '@/shared/topology/schema';
import { computeArrangement } from '@/lib/editor/arrange';
import { autoAssignAddresses } from '@/lib/editor/commands/addressing';
import { command } from '@/lib/editor/commands/define';
import { groupsOf, portsOf } from '@/lib/editor/commands/doc';
import { cableLabel, claimId, collectIds, nextCableNumber } from '@/lib/editor/ids';
import { resolvePositions } from '@/lib/editor/snapshot';
import { deviceShape } from '@/lib/editor/shape';

/**
 * Pattern starters on the canvas. `replace` swaps the drawing for the pattern (the design keeps
 * its name); `merge` adds the pattern beside what is there: clashing device names are renumbered
 * (`host-1` becomes the next free `host-N`), a pattern network whose block equals an existing
 * network's joins that network instead of duplicating it, clashing cable labels get our own
 * numbers, and the new ports get addresses that do not collide with the design's. Either way the
 * result is auto-arranged, because the canvas's device sizes are the editor's business, not the
 * pattern's.
 */
export const PATTERN_IDS = ['direct-attach', 'dual-fabric', 'dual-fabric-management'] as const;
export type PatternId = (typeof PATTERN_IDS)[number];
/** Pattern options the canvas can send (everything but the per-host cable-length function). */
export type PatternArgsOptions = Omit<ManagedFabricOptions, 'hostCableLengthM'>;
export type ApplyPatternArgs = { pattern: PatternId; options?: PatternArgsOptions; mode: 'replace' | 'merge' };

function build(pattern: PatternId, options: PatternArgsOptions): Topology {
  const entry = PATTERNS.find((p) => p.id === pattern)!;
  return entry.build(options);
}

function sameBlock(a: string, b: string): boolean {
  const x = parseCidr(a);
  const y = parseCidr(b);
  return !!x && !!y && x.family === y.family && x.prefix === y.prefix && x.network === y.network;
}

/** A free name for a device: `host-2` → the lowest free `host-N`; other names get `-2`, `-3`. */
function freeName(name: string, taken: Set<string>): string {
  const numbered = /^(.*)-(\d+)$/.exec(name);
  if (!taken.has(name)) return name;
  if (numbered) {
    for (let n = 1; ; n += 1) if (!taken.has(`${numbered[1]}-${n}`)) return `${numbered[1]}-${n}`;
  }
  let n = 2;
  while (taken.has(`${name}-${n}`)) n += 1;
  return `${name}-${n}`;
}

type Maps = { ports: Map<string, string>; networks: Map<string, string> };

/** The device under a new id and name, its parts' ids following, its ports on the merged networks. */
function renameDevice(device: Device, newId: string, newName: string, ids: Set<string>, maps: Maps): Device {
  const rename = (old: string) => claimId(ids, old.startsWith(`${device.id}.`) ? `${newId}${old.slice(device.id.length)}` : `${newId}.${old}`);
  const ports = <P extends { id: string; networkId?: string }>(list: P[]): P[] =>
    list.map((p) => {
      const id = rename(p.id);
      maps.ports.set(p.id, id);
      return p.networkId ? { ...p, id, networkId: maps.networks.get(p.networkId) ?? p.networkId } : { ...p, id };
    });
  if (device.kind === 'switch') return { ...device, id: newId, name: newName, ports: ports(device.ports) };
  const groups = groupsOf(device).map((g) => ({ ...g, id: rename(g.id), ports: ports(g.ports) }));
  return device.kind === 'array' ? { ...device, id: newId, name: newName, controllers: groups } : { ...device, id: newId, name: newName, adapters: groups };
}

function mergeNetworks(doc: Topology, part: Topology, ids: Set<string>): { networks: Network[]; map: Map<string, string> } {
  const map = new Map<string, string>();
  const added: Network[] = [];
  for (const network of part.networks) {
    const existing = doc.networks.find((n) => sameBlock(n.cidr, network.cidr));
    if (existing) map.set(network.id, existing.id);
    else {
      const id = claimId(ids, network.id);
      map.set(network.id, id);
      added.push({ ...network, id });
    }
  }
  return { networks: [...doc.networks, ...added], map };
}

function mergeDevices(doc: Topology, part: Topology, ids: Set<string>, maps: Maps): Device[] {
  const names = new Set([...ids, ...doc.devices.map((d) => d.name)]);
  return part.devices.map((device) => {
    const name = freeName(device.name, names);
    names.add(name);
    const id = claimId(ids, name);
    return renameDevice(device, id, name, ids, maps);
  });
}

function mergeCables(doc: Topology, part: Topology, ids: Set<string>, portMap: Map<string, string>): Cable[] {
  const labels = new Set(doc.cables.map((c) => c.label).filter(Boolean));
  let next = nextCableNumber(doc);
  return part.cables.map((cable) => {
    const label = cable.label && !labels.has(cable.label) ? cable.label : cableLabel(next++);
    labels.add(label);
    return { ...cable, id: claimId(ids, cable.id), label, a: portMap.get(cable.a)!, b: portMap.get(cable.b)! };
  });
}

/** Where the merged part goes: under the existing drawing, left-aligned with it. */
function mergeOrigin(doc: Topology): { x: number; y: number } {
  const positions = resolvePositions(doc);
  let left = Infinity;
  let bottom = -Infinity;
  for (const device of doc.devices) {
    const p = positions.get(device.id)!;
    left = Math.min(left, p.x);
    bottom = Math.max(bottom, p.y + deviceShape(device).height);
  }
  return Number.isFinite(left) ? { x: left, y: bottom + 200 } : { x: 0, y: 0 };
}

function merge(doc: Topology, args: ApplyPatternArgs): Topology {
  const part = build(args.pattern, { ...args.options, assignAddresses: false });
  const ids = collectIds(doc);
  const { networks, map } = mergeNetworks(doc, part, ids);
  const maps: Maps = { ports: new Map(), networks: map };
  const devices = mergeDevices(doc, part, ids, maps);
  const cables = mergeCables(doc, part, ids, maps.ports);
  const placed = computeArrangement({ ...part, devices, cables, networks }, { origin: mergeOrigin(doc) });
  let result: Topology = { ...doc, devices: [...doc.devices, ...devices], cables: [...doc.cables, ...cables], networks, layout: withPositions(doc.layout, Object.entries(placed)) };
  if (args.options?.assignAddresses !== false) result = autoAssignAddresses(result, { portIds: devices.flatMap((d) => portsOf(d).map((p) => p.id)) });
  return result;
}

export function applyPattern(doc: Topology, args: ApplyPatternArgs): Topology {
  if (args.mode === 'merge') return merge(doc, args);
  const fresh = build(args.pattern, { ...args.options });
  const security = fresh.security ?? doc.security;
  // The room stays: the drawing is replaced, not the racks, feeds and distances it stands in.
  const patternIds = collectIds(fresh);
  const racks = doc.racks?.filter((r) => !patternIds.has(r.id));
  const powerFeeds = doc.powerFeeds?.filter((f) => !patternIds.has(f.id));
  const room = { ...(doc.site ? { site: doc.site } : {}), ...(racks?.length ? { racks } : {}), ...(powerFeeds?.length ? { powerFeeds } : {}) };
  const result: Topology = { ...fresh, ...room, name: doc.name, layout: computeArrangement(fresh) };
  if (security) result.security = security;
  return result;
}

const speed = z.union(PORT_SPEEDS.map((s) => z.literal(s)));
const plan = z.object({ name: z.string().max(200).optional(), cidr: z.string().min(1).optional(), vlan: z.number().int().optional(), mtu: z.number().int().optional(), gateway: z.string().optional() }).strict();
const deviceName = z.string().min(1).max(60);
const patternOptions = z
  .object({
    name: z.string().max(200).optional(),
    hosts: z.union([z.number().int().min(0).max(128), z.array(deviceName).max(128)]).optional(),
    cardsPerHost: z.number().int().min(1).max(8).optional(),
    portsPerCard: z.number().int().min(1).max(8).optional(),
    speedGbps: speed.optional(),
    connector: z.enum(CONNECTORS).optional(),
    media: z.enum(MEDIA).optional(),
    arrayName: deviceName.optional(),
    controllers: z.number().int().min(1).max(4).optional(),
    controllerPorts: z.number().int().min(1).max(32).optional(),
    iqnPrefix: z.string().max(200).optional(),
    chap: z.enum(CHAP_MODES).optional(),
    assignAddresses: z.boolean().optional(),
    labelPrefix: z.string().max(20).optional(),
    switchNames: z.tuple([deviceName, deviceName]).optional(),
    networks: z.object({ a: plan.optional(), b: plan.optional() }).strict().optional(),
    managementSwitchName: deviceName.optional(),
    management: plan.optional(),
  })
  .strict();

export const patternCommands = [
  command(
    'applyPattern',
    'Start from a pattern, replacing the drawing or adding to it',
    z.object({ pattern: z.enum(PATTERN_IDS), options: patternOptions.optional(), mode: z.enum(['replace', 'merge']) }).strict() as z.ZodType<ApplyPatternArgs>,
    applyPattern,
  ),
];
