import { z } from 'zod';
import { linkSpeed, reachOf } from '@/shared/rules/cables';
import { MEDIA, type Cable, type Media, type Port, type Topology } from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { patch, portById } from '@/lib/editor/commands/doc';
import { CommandError } from '@/lib/editor/errors';
import { cableLabel, claimId, collectIds, nextCableNumber } from '@/lib/editor/ids';

/**
 * Cables between ports. A port that already has a cable may get a second one: the format allows
 * it and the analysis reports it (port-double-cabled), and a draft must always be savable — but
 * `replace: true` re-patches instead, removing what was on either port first. Refused outright:
 * a port to itself (the schema rejects it) and a second cable between the very same two ports.
 */
export type CablePortsArgs = {
  a: string;
  b: string;
  media?: Media;
  lengthM?: number;
  /** By default our own `C017` from the cable number. */
  label?: string;
  id?: string;
  /** Remove the cables already on either port first. */
  replace?: boolean;
  /**
   * The lowest cable number to use. The store passes the highest number it has seen this
   * session and in the saved version, so deleting the newest cable never frees its number.
   */
  numberFloor?: number;
};

/**
 * A sensible medium for two ports: Category 6A for RJ45 (it carries up to 10GBASE-T over the
 * full 100 m channel); for SFP, direct-attach copper when it reaches, else OM4 fibre, else an
 * active optical cable. Reaches come from the shared limits table.
 */
export function suggestMedia(a: Port, b: Port, lengthM?: number): Media {
  if (a.connector === 'rj45' || b.connector === 'rj45') return 'cat6a';
  const speed = linkSpeed(a.speedGbps, b.speedGbps);
  for (const media of ['dac', 'om4', 'aoc'] as const) {
    const reach = reachOf(media, speed);
    if (reach && (lengthM === undefined || lengthM <= reach.maxM)) return media;
  }
  return 'om4';
}

/** The id and label `cablePorts` gives the next cable, so the canvas can select it. */
export function plannedCable(doc: Topology, numberFloor = 1): { id: string; label: string } {
  const n = Math.max(nextCableNumber(doc), numberFloor);
  return { id: claimId(collectIds(doc), `cable-${n}`), label: cableLabel(n) };
}

export function cablePorts(doc: Topology, args: CablePortsArgs): Topology {
  if (args.a === args.b) throw new CommandError('refused', 'A cable joins two different ports; pick another port for its other end.', 'b');
  const a = portById(doc, args.a, 'a').port;
  const b = portById(doc, args.b, 'b').port;
  const twin = doc.cables.find((c) => (c.a === args.a && c.b === args.b) || (c.a === args.b && c.b === args.a));
  if (twin && !args.replace) throw new CommandError('refused', `These two ports are already joined by ${twin.label ?? twin.id}.`, 'b');
  const base = args.replace ? { ...doc, cables: doc.cables.filter((c) => ![c.a, c.b].some((end) => end === args.a || end === args.b)) } : doc;
  const n = Math.max(nextCableNumber(doc), args.numberFloor ?? 1);
  const cable: Cable = {
    id: claimId(collectIds(base), args.id ?? `cable-${n}`),
    label: args.label ?? cableLabel(n),
    a: args.a,
    b: args.b,
    media: args.media ?? suggestMedia(a, b, args.lengthM),
  };
  if (args.lengthM !== undefined) cable.lengthM = args.lengthM;
  return { ...base, cables: [...base.cables, cable] };
}

/** Removes cables by id; unknown ids are ignored (a stale selection). */
export function uncable(doc: Topology, args: { ids: string[] }): Topology {
  const ids = new Set(args.ids);
  const cables = doc.cables.filter((c) => !ids.has(c.id));
  return cables.length === doc.cables.length ? doc : { ...doc, cables };
}

/** Removes every cable on one port. */
export function uncablePort(doc: Topology, args: { portId: string }): Topology {
  portById(doc, args.portId, 'portId');
  return uncable(doc, { ids: doc.cables.filter((c) => c.a === args.portId || c.b === args.portId).map((c) => c.id) });
}

export type SetCableArgs = { id: string; media?: Media; lengthM?: number | null; label?: string | null };

export function setCable(doc: Topology, args: SetCableArgs): Topology {
  const index = doc.cables.findIndex((c) => c.id === args.id);
  if (index < 0) throw new CommandError('not-found', `There is no cable "${args.id}" in this design.`, 'id');
  // An emptied label field removes the label; the schedule then falls back to the cable id.
  const label = typeof args.label === 'string' ? args.label.trim() || null : args.label;
  const next = patch(doc.cables[index], { media: args.media, lengthM: args.lengthM, label });
  if (next === doc.cables[index]) return doc;
  const cables = doc.cables.slice();
  cables[index] = next;
  return { ...doc, cables };
}

const id = z.string().min(1);
const length = z.number().positive().max(100000);
const label = z.string().max(100);

export const cablingCommands = [
  command(
    'cablePorts',
    'Cable two ports',
    z.object({ a: id, b: id, media: z.enum(MEDIA).optional(), lengthM: length.optional(), label: label.optional(), id: id.max(200).optional(), replace: z.boolean().optional(), numberFloor: z.number().int().positive().optional() }).strict(),
    cablePorts,
  ),
  command('uncable', 'Remove cables', z.object({ ids: z.array(z.string()) }).strict(), uncable),
  command('uncablePort', 'Remove the cables on a port', z.object({ portId: id }).strict(), uncablePort),
  command('setCable', 'Edit a cable', z.object({ id, media: z.enum(MEDIA).optional(), lengthM: length.nullable().optional(), label: label.nullable().optional() }).strict(), setCable),
];
