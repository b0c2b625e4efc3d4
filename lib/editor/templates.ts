import { z } from 'zod';
import {
  CONNECTORS,
  PORT_SPEEDS,
  type Adapter,
  type Connector,
  type Controller,
  type Device,
  type Port,
  type PortRole,
  type PortSpeed,
  type SwitchRole,
} from '@/shared/topology/schema';
import { claimId } from '@/lib/editor/ids';

/**
 * The devices of the palette. A template builds a complete device with readable ids derived from
 * the device id (`host-3-card-2-p1`, `array-1-ctl-b-mgmt`, `switch-2-p17`) and names as an
 * installer says them (`ctl-b`, `card-2`, `p1`, `mgmt`). Management ports are 1G RJ45 because
 * out-of-band management interfaces are nearly always that (common practice).
 */
export const TEMPLATE_IDS = ['array', 'data-switch', 'management-switch', 'shared-switch', 'host'] as const;
export type TemplateId = (typeof TEMPLATE_IDS)[number];

const speed = z.union(PORT_SPEEDS.map((s) => z.literal(s)));
const connector = z.enum(CONNECTORS);

export const arrayOptionsSchema = z
  .object({
    controllers: z.number().int().min(1).max(4),
    dataPorts: z.number().int().min(0).max(32),
    speedGbps: speed,
    connector,
    managementPort: z.boolean(),
  })
  .strict();

export const switchOptionsSchema = z
  .object({ ports: z.number().int().min(1).max(128), speedGbps: speed, connector })
  .strict();

export const hostOptionsSchema = z
  .object({
    cards: z.number().int().min(0).max(8),
    portsPerCard: z.number().int().min(1).max(8),
    speedGbps: speed,
    connector,
    onboardManagement: z.boolean(),
  })
  .strict();

export type ArrayOptions = z.infer<typeof arrayOptionsSchema>;
export type SwitchOptions = z.infer<typeof switchOptionsSchema>;
export type HostOptions = z.infer<typeof hostOptionsSchema>;
export type TemplateOptions = Partial<ArrayOptions> | Partial<SwitchOptions> | Partial<HostOptions>;

export type TemplateInfo = {
  id: TemplateId;
  kind: Device['kind'];
  /** Palette label, our own words. */
  label: string;
  /** New devices are named `${namePrefix}-N`. */
  namePrefix: string;
  switchRole?: SwitchRole;
  defaults: ArrayOptions | SwitchOptions | HostOptions;
};

const ARRAY_DEFAULTS: ArrayOptions = { controllers: 2, dataPorts: 4, speedGbps: 10, connector: 'rj45', managementPort: true };
const HOST_DEFAULTS: HostOptions = { cards: 2, portsPerCard: 2, speedGbps: 10, connector: 'rj45', onboardManagement: true };

export const TEMPLATES: readonly TemplateInfo[] = [
  { id: 'array', kind: 'array', label: 'Storage array', namePrefix: 'array', defaults: ARRAY_DEFAULTS },
  { id: 'data-switch', kind: 'switch', label: 'Data switch', namePrefix: 'switch', switchRole: 'data', defaults: { ports: 24, speedGbps: 10, connector: 'rj45' } },
  { id: 'management-switch', kind: 'switch', label: 'Management switch', namePrefix: 'switch', switchRole: 'management', defaults: { ports: 24, speedGbps: 1, connector: 'rj45' } },
  { id: 'shared-switch', kind: 'switch', label: 'Shared switch', namePrefix: 'switch', switchRole: 'shared', defaults: { ports: 24, speedGbps: 10, connector: 'rj45' } },
  { id: 'host', kind: 'host', label: 'Host', namePrefix: 'host', defaults: HOST_DEFAULTS },
];

export function templateInfo(id: TemplateId): TemplateInfo {
  const info = TEMPLATES.find((t) => t.id === id);
  if (!info) throw new Error(`unknown template ${id}`);
  return info;
}

/** "ctl-a", "ctl-b", …: controllers by letter, as the patterns name them. */
export function controllerName(index: number): string {
  return `ctl-${String.fromCharCode(97 + index)}`;
}

type PortSpec = { name: string; role: PortRole; speedGbps: PortSpeed; connector: Connector };

export function makePort(taken: Set<string>, ownerId: string, spec: PortSpec): Port {
  return { id: claimId(taken, `${ownerId}-${spec.name}`), ...spec };
}

const MANAGEMENT: Omit<PortSpec, 'name'> = { role: 'management', speedGbps: 1, connector: 'rj45' };

export function makeController(taken: Set<string>, arrayId: string, index: number, o: ArrayOptions): Controller {
  const name = controllerName(index);
  const id = claimId(taken, `${arrayId}-${name}`);
  const ports = Array.from({ length: o.dataPorts }, (_, p) =>
    makePort(taken, id, { name: `p${p + 1}`, role: 'data', speedGbps: o.speedGbps, connector: o.connector }),
  );
  if (o.managementPort) ports.push(makePort(taken, id, { name: 'mgmt', ...MANAGEMENT }));
  return { id, name, ports };
}

export function makeCard(taken: Set<string>, hostId: string, number: number, o: Pick<HostOptions, 'portsPerCard' | 'speedGbps' | 'connector'>): Adapter {
  const name = `card-${number}`;
  const id = claimId(taken, `${hostId}-${name}`);
  const ports = Array.from({ length: o.portsPerCard }, (_, p) =>
    makePort(taken, id, { name: `p${p + 1}`, role: 'data', speedGbps: o.speedGbps, connector: o.connector }),
  );
  return { id, name, ports };
}

function buildArray(taken: Set<string>, id: string, name: string, o: ArrayOptions): Device {
  const controllers = Array.from({ length: o.controllers }, (_, c) => makeController(taken, id, c, o));
  return { id, kind: 'array', name, controllers };
}

function buildSwitch(taken: Set<string>, id: string, name: string, role: SwitchRole, o: SwitchOptions): Device {
  const portRole: PortRole = role === 'management' ? 'management' : 'data';
  const ports = Array.from({ length: o.ports }, (_, p) =>
    makePort(taken, id, { name: `p${p + 1}`, role: portRole, speedGbps: o.speedGbps, connector: o.connector }),
  );
  return { id, kind: 'switch', name, role, ports };
}

function buildHost(taken: Set<string>, id: string, name: string, o: HostOptions): Device {
  const adapters = Array.from({ length: o.cards }, (_, c) => makeCard(taken, id, c + 1, o));
  if (o.onboardManagement) {
    const onboard = claimId(taken, `${id}-onboard`);
    adapters.push({ id: onboard, name: 'onboard', ports: [makePort(taken, onboard, { name: 'mgmt', ...MANAGEMENT })] });
  }
  return { id, kind: 'host', name, adapters };
}

/** Options merged over the template's defaults and checked; throws a ZodError for bad options. */
export function resolveOptions(template: TemplateId, options: TemplateOptions = {}): TemplateInfo['defaults'] {
  const info = templateInfo(template);
  const merged = { ...info.defaults, ...options };
  if (info.kind === 'array') return arrayOptionsSchema.parse(merged);
  if (info.kind === 'host') return hostOptionsSchema.parse(merged);
  return switchOptionsSchema.parse(merged);
}

/**
 * A new device from a template. `taken` holds every id of the document and receives the new ones,
 * so the device's ids never collide with what is already there.
 */
export function buildDevice(taken: Set<string>, template: TemplateId, id: string, name: string, options: TemplateOptions = {}): Device {
  const info = templateInfo(template);
  const resolved = resolveOptions(template, options);
  const deviceId = claimId(taken, id);
  if (info.kind === 'array') return buildArray(taken, deviceId, name, resolved as ArrayOptions);
  if (info.kind === 'host') return buildHost(taken, deviceId, name, resolved as HostOptions);
  return buildSwitch(taken, deviceId, name, info.switchRole ?? 'data', resolved as SwitchOptions);
}
