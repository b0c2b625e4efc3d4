import { z } from 'zod';
import { withPositions } from '@/shared/topology/layout';
import { SWITCH_ROLES, type Device, type Position, type SwitchRole, type Topology } from '@/shared/topology/schema';
import { command } from '@/lib/editor/commands/define';
import { deviceById, kindOf, mapGroups, mapPorts, patch, portsOf, removeCablesAt, removeLayout, replaceDevice } from '@/lib/editor/commands/doc';
import { freeSpot } from '@/lib/editor/commands/layout';
import { withPlacement } from '@/lib/editor/commands/placement';
import { CommandError, commandErrorFromZod } from '@/lib/editor/errors';
import { collectIds, nextNumberedName } from '@/lib/editor/ids';
import { buildDevice, TEMPLATE_IDS, templateInfo, type TemplateId, type TemplateOptions } from '@/lib/editor/templates';

/** Adding, naming, editing and deleting whole devices. */
const name = z.string().max(200);
const optionalText = (max: number) => z.string().max(max).nullable().optional();

export type AddDeviceArgs = {
  template: TemplateId;
  options?: TemplateOptions;
  /** Top-left corner on the canvas; by default right of everything drawn. */
  position?: Position;
  /** By default the next free `${prefix}-N` of the template (`host-3`). */
  name?: string;
  /** By default the name; made unique if it is taken. */
  id?: string;
};

/** The id `addDevice` will give a new device with these arguments, so the canvas can select it. */
export function plannedDeviceId(doc: Topology, args: Pick<AddDeviceArgs, 'template' | 'name' | 'id'>): string {
  const taken = collectIds(doc);
  const base = args.id ?? args.name ?? nextNumberedName(doc, templateInfo(args.template).namePrefix, taken);
  let id = base;
  for (let n = 2; taken.has(id); n += 1) id = `${base}-${n}`;
  return id;
}

export function addDevice(doc: Topology, args: AddDeviceArgs): Topology {
  const taken = collectIds(doc);
  const info = templateInfo(args.template);
  const deviceName = args.name ?? nextNumberedName(doc, info.namePrefix, taken);
  let device: Device;
  try {
    device = buildDevice(taken, args.template, args.id ?? deviceName, deviceName, args.options);
  } catch (error) {
    if (error instanceof z.ZodError) throw commandErrorFromZod(error.issues, 'options');
    throw error;
  }
  const position = args.position ?? freeSpot(doc);
  return { ...doc, devices: [...doc.devices, device], layout: withPositions(doc.layout, [[device.id, { x: position.x, y: position.y }]]) };
}

export type RenameArgs = { id: string; name: string };

export function renameDevice(doc: Topology, args: RenameArgs): Topology {
  return replaceDevice(doc, args.id, (device) => (device.name === args.name ? device : { ...device, name: args.name }));
}

/** Renames a controller, a card or a port (or a device, for callers that do not know the kind). */
export function renamePart(doc: Topology, args: RenameArgs): Topology {
  const kind = kindOf(doc, args.id);
  if (kind === 'device') return renameDevice(doc, args);
  if (kind !== 'controller' && kind !== 'adapter' && kind !== 'port') {
    throw new CommandError(kind ? 'wrong-kind' : 'not-found', kind ? `"${args.id}" is a ${kind}; only controllers, cards and ports are renamed here.` : `There is nothing with the id "${args.id}" in this design.`, 'id');
  }
  if (kind === 'port') return mapPorts(doc, (p) => (p.id === args.id && p.name !== args.name ? { ...p, name: args.name } : p));
  return mapGroups(doc, (g) => (g.id === args.id && g.name !== args.name ? { ...g, name: args.name } : g));
}

/** Deletes devices with every cable on their ports and their canvas positions. Unknown ids are ignored (a stale selection). */
export function deleteDevices(doc: Topology, args: { ids: string[] }): Topology {
  const ids = new Set(args.ids.filter((id) => doc.devices.some((d) => d.id === id)));
  if (ids.size === 0) return doc;
  const ports = new Set(doc.devices.filter((d) => ids.has(d.id)).flatMap((d) => portsOf(d).map((p) => p.id)));
  const without = { ...doc, devices: doc.devices.filter((d) => !ids.has(d.id)) };
  return removeLayout(removeCablesAt(without, ports), ids);
}

export type SetDeviceArgs = {
  id: string;
  /** Switches only. */
  role?: SwitchRole;
  /** A host's initiator name or an array's target name; null removes it. */
  iqn?: string | null;
  /** A rack by its printed name (a new name adds the rack); null unplaces the device. */
  rack?: string | null;
  /** The lowest unit the device fills; null unplaces the device. */
  ru?: number | null;
};

export function setDevice(doc: Topology, args: SetDeviceArgs): Topology {
  const device = deviceById(doc, args.id);
  if (args.role !== undefined && device.kind !== 'switch') throw new CommandError('wrong-kind', 'Only a switch has a role (data, management or shared).', 'role');
  if (args.iqn !== undefined && device.kind === 'switch') throw new CommandError('wrong-kind', 'Only a host has an initiator name and only an array a target name (IQN); a switch has neither.', 'iqn');
  // An empty IQN field means "none"; the analysis judges any other text (iqn-invalid).
  const iqn = args.iqn === undefined ? undefined : args.iqn === null || args.iqn.trim() === '' ? null : args.iqn.trim();
  const rack = args.rack === undefined ? undefined : args.rack === null || args.rack.trim() === '' ? null : args.rack.trim();
  const edited = replaceDevice(doc, args.id, (d) => patch(d, { role: args.role, iqn }));
  return withPlacement(edited, deviceById(edited, args.id), { rack, ru: args.ru });
}

/** A controller's own target name, overriding its array's (format 2); null or empty removes it. */
export function setControllerIqn(doc: Topology, args: { id: string; iqn: string | null }): Topology {
  const kind = kindOf(doc, args.id);
  if (kind !== 'controller') {
    throw new CommandError(kind ? 'wrong-kind' : 'not-found', kind ? `"${args.id}" is a ${kind}; only a controller takes its own target name here.` : `There is nothing with the id "${args.id}" in this design.`, 'id');
  }
  const iqn = args.iqn === null || args.iqn.trim() === '' ? null : args.iqn.trim();
  return mapGroups(doc, (g) => (g.id === args.id ? patch(g, { iqn }) : g));
}

export const deviceCommands = [
  command(
    'addDevice',
    'Add a device from the palette',
    z
      .object({
        template: z.enum(TEMPLATE_IDS),
        options: z.record(z.string(), z.unknown()).optional() as z.ZodType<TemplateOptions | undefined>,
        position: z.object({ x: z.number().finite(), y: z.number().finite() }).strict().optional(),
        name: name.optional(),
        id: z.string().min(1).max(200).optional(),
      })
      .strict(),
    addDevice,
  ),
  command('renameDevice', 'Rename a device', z.object({ id: z.string().min(1), name }).strict(), renameDevice),
  command('renamePart', 'Rename a controller, card or port', z.object({ id: z.string().min(1), name }).strict(), renamePart),
  command('deleteDevices', 'Delete devices and their cables', z.object({ ids: z.array(z.string()) }).strict(), deleteDevices),
  command(
    'setDevice',
    'Edit a device (switch role, host IQN, rack position)',
    z
      .object({
        id: z.string().min(1),
        role: z.enum(SWITCH_ROLES).optional(),
        iqn: optionalText(1000),
        rack: optionalText(100),
        ru: z.number().int().min(1).max(100).nullable().optional(),
      })
      .strict(),
    setDevice,
  ),
  command(
    'setControllerIqn',
    'Give a controller its own target name (IQN)',
    z.object({ id: z.string().min(1), iqn: z.string().max(1000).nullable() }).strict(),
    setControllerIqn,
  ),
];
