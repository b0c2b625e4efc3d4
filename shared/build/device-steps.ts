import { displayName, otherEnd, type PortRef } from '@/shared/topology/index';
import type { ArrayDevice, Device, Network, SwitchDevice } from '@/shared/topology/schema';
import { byName, rackOf, stepId } from './step-kit';
import { listText, placeText, portName, portSettingsText } from './step-text';
import type { Step, StepContext, StepKind, StepPhase } from './types';

/**
 * Switches, expansion shelves and arrays, in the power-on order (common practice): every switch
 * first — management switches before data and shared ones, so the management network is up to reach
 * the rest — then each array's shelves, then each array, waiting for its ready indication.
 */
const SWITCH_ORDER = { management: 0, data: 1, shared: 2 } as const;
const SWITCH_WORDS = { management: 'management switch', data: 'data switch', shared: 'shared switch' } as const;

function step(ctx: StepContext, device: Device, kind: StepKind, phase: StepPhase, title: string, detail: string, source: string): Step {
  return { id: stepId(kind, device.id), phase, kind, title, detail, deviceId: device.id, rackId: rackOf(ctx, device), expectedSessions: null, caution: false, source };
}

export function deviceSteps(ctx: StepContext): Step[] {
  const switches = byName(ctx.doc.devices.filter((d): d is SwitchDevice => d.kind === 'switch')).sort(
    (a, b) => SWITCH_ORDER[a.role] - SWITCH_ORDER[b.role],
  );
  const arrays = byName(ctx.doc.devices.filter((d): d is ArrayDevice => d.kind === 'array'));
  return [
    ...switches.map((s) => switchStep(ctx, s)),
    ...arrays.map((a) => shelvesStep(ctx, a)),
    ...arrays.flatMap((a) => [arrayStep(ctx, a), arrayPortsStep(ctx, a)]),
  ];
}

/** "fabric A (VLAN 110, MTU 9000)". */
function networkText(network: Network): string {
  const parts = [network.vlan === undefined ? 'no VLAN set' : `VLAN ${network.vlan}`, network.mtu === undefined ? 'MTU not set' : `MTU ${network.mtu}`];
  return `${displayName(network)} (${parts.join(', ')})`;
}

/** The networks on a switch's ports: its own ports' and those of the ports cabled to it. */
function switchNetworks(ctx: StepContext, device: SwitchDevice): Network[] {
  const ids = new Set<string>();
  for (const port of device.ports) {
    if (port.networkId !== undefined) ids.add(port.networkId);
    for (const cable of ctx.index.cablesByPort.get(port.id) ?? []) {
      const far = ctx.index.ports.get(otherEnd(cable, port.id));
      if (far?.port.networkId !== undefined) ids.add(far.port.networkId);
    }
  }
  return byName([...ids].map((id) => ctx.index.networks.get(id)).filter((n): n is Network => n !== undefined));
}

function switchStep(ctx: StepContext, device: SwitchDevice): Step {
  const name = displayName(device);
  const networks = switchNetworks(ctx, device);
  const carry =
    networks.length === 0
      ? 'The design puts no network on its ports.'
      : `Set its ports for ${listText(networks.map(networkText))}, the same VLAN and MTU on every port along each path.`;
  const detail = `Power on ${name} (${SWITCH_WORDS[device.role]}, ${placeText(device, ctx.racks)}) and wait until it has finished starting. ${carry}`;
  return step(ctx, device, 'switch', 'switches', `Power on ${name}`, detail, 'common practice');
}

function shelvesStep(ctx: StepContext, device: ArrayDevice): Step {
  const name = displayName(device);
  const detail =
    `If ${name} has expansion shelves (the design does not show them), power them on now, before the array itself, ` +
    `and wait until each one shows it is ready. If it has none, mark this done with the note "none".`;
  return step(ctx, device, 'shelves', 'shelves', `Expansion shelves of ${name}, if any`, detail, 'common practice');
}

function arrayStep(ctx: StepContext, device: ArrayDevice): Step {
  const name = displayName(device);
  const controllers = listText(device.controllers.map((c) => displayName(c)));
  const detail =
    `Power on ${name} (${placeText(device, ctx.racks)}) once its switches and shelves are up, and wait for its ready indication: ` +
    `${device.controllers.length === 1 ? 'its controller' : 'every controller'} (${controllers}) must report ready before any host logs in.`;
  return step(ctx, device, 'array', 'arrays', `Power on ${name} and wait until it is ready`, detail, 'common practice');
}

/** A port the design uses: cabled, or given a network or an address (as the address worksheet lists them). */
export function portInUse(ctx: StepContext, ref: PortRef): boolean {
  return ref.port.networkId !== undefined || ref.port.address !== undefined || ctx.index.cablesByPort.has(ref.port.id);
}

/** A device's ports of one role that the design uses, in the device's own order. */
export function portsOf(ctx: StepContext, device: Device, role: 'data' | 'management'): PortRef[] {
  const ports = device.kind === 'switch' ? device.ports : device.kind === 'array' ? device.controllers.flatMap((c) => c.ports) : device.adapters.flatMap((a) => a.ports);
  const refs: PortRef[] = [];
  for (const port of ports) {
    const ref = ctx.index.ports.get(port.id);
    if (ref && ref.device === device && port.role === role && portInUse(ctx, ref)) refs.push(ref);
  }
  return refs;
}

export function settings(ctx: StepContext, ref: PortRef): string {
  const network = ref.port.networkId === undefined ? undefined : ctx.index.networks.get(ref.port.networkId);
  return `${portName(ref)}: ${portSettingsText(ref, network)}`;
}

function arrayPortsStep(ctx: StepContext, device: ArrayDevice): Step {
  const name = displayName(device);
  const ports = portsOf(ctx, device, 'data');
  const targets = [device.iqn, ...device.controllers.map((c) => c.iqn)].filter((iqn): iqn is string => !!iqn);
  const detail =
    (ports.length === 0 ? `The design uses no data port of ${name}.` : `Check ${name}'s data ports against the plan: ${ports.map((p) => settings(ctx, p)).join('; ')}.`) +
    (targets.length > 0 ? ` Target name${targets.length === 1 ? '' : 's'}: ${targets.join(', ')}.` : '');
  return step(ctx, device, 'array-ports', 'arrays', `Check ${name}'s data ports`, detail, 'the design');
}

const KIND_ORDER = { array: 0, switch: 1, host: 2 } as const;

/** Last: every device's management ports reachable from the management network. */
export function managementSteps(ctx: StepContext): Step[] {
  const devices = byName(ctx.doc.devices).sort((a, b) => KIND_ORDER[a.kind] - KIND_ORDER[b.kind]);
  const steps: Step[] = [];
  for (const device of devices) {
    // A switch's management-role ports are mostly the access ports of the management network;
    // its own management interface is the one with an address.
    const ports = portsOf(ctx, device, 'management').filter((p) => device.kind !== 'switch' || p.port.address !== undefined);
    if (ports.length === 0) continue;
    const name = displayName(device);
    const password = device.kind === 'array' ? ` Make sure ${name}'s management has a password of its own, not the maker's default.` : '';
    const detail = `From the management network, reach ${name}'s management port${ports.length === 1 ? '' : 's'}: ${ports.map((p) => settings(ctx, p)).join('; ')}.${password}`;
    steps.push(step(ctx, device, 'management', 'management', `Reach ${name}'s management`, detail, 'common practice'));
  }
  return steps;
}
