import type { HostArrayResult } from '@/shared/analysis/types';
import { displayName, type PortRef } from '@/shared/topology/index';
import type { HostDevice } from '@/shared/topology/schema';
import { portsOf, settings } from './device-steps';
import { byName, rackOf, stepId } from './step-kit';
import { listText, plural, portalText, portName } from './step-text';
import type { Step, StepContext, StepKind } from './types';

/**
 * Each host once the arrays are ready (by name): initiator name; each data port's address, VLAN and
 * MTU; CHAP when the design asks for it; discovery of the target portals (TCP 3260, RFC 7143 §15);
 * login with exactly the sessions the analysis plans; multipath across the controllers reached.
 */
export function hostSteps(ctx: StepContext): Step[] {
  const hosts = byName(ctx.doc.devices.filter((d): d is HostDevice => d.kind === 'host'));
  const all = portalsByArray(ctx);
  return hosts.flatMap((host) => stepsOf(ctx, all, host));
}

function stepsOf(ctx: StepContext, all: Map<string, Portals>, host: HostDevice): Step[] {
  const name = displayName(host);
  const ports = portsOf(ctx, host, 'data');
  const planned = (ctx.planned.get(host.id) ?? []).filter((r) => r.sessions > 0);
  const expected = planned.reduce((sum, r) => sum + r.sessions, 0);
  const make = (kind: StepKind, title: string, detail: string, source: string, ids: string[] = [host.id], sessions: number | null = null): Step => ({
    id: stepId(kind, ...ids),
    phase: 'hosts',
    kind,
    title,
    detail,
    deviceId: host.id,
    rackId: rackOf(ctx, host),
    expectedSessions: sessions,
    caution: false,
    source,
  });

  const steps = [make('initiator', `Set ${name}'s initiator name`, initiatorText(host), 'RFC 7143 §4.2.7')];
  for (const ref of ports) {
    steps.push(make('host-port', `Set ${name} ${portName(ref)}`, `Set ${settings(ctx, ref)}.`, 'the design', [ref.port.id]));
  }
  const chap = ctx.doc.security?.chap ?? 'none';
  if (chap !== 'none') {
    const who = chap === 'mutual' ? 'mutual CHAP: the array checks the host and the host checks the array, with two different secrets' : 'one-way CHAP: the array checks the host';
    const detail = `The design uses ${who}. Enter ${name}'s secrets from the team's CHAP secrets; never write a secret in a note or show it in a photo.`;
    steps.push(make('chap', `Set CHAP on ${name}`, detail, 'RFC 7143 §9.2'));
  }
  steps.push(make('discovery', `Discover ${name}'s target portals`, discoveryText(all, name, ports, planned), 'RFC 7143 §15'));
  steps.push(make('login', `Log ${name} in: ${plural(expected, 'session')}`, loginText(ctx, name, planned, expected), 'the analysis', [host.id], expected));
  steps.push(make('multipath', `Check multipath on ${name}`, multipathText(ctx, name, planned, expected), 'the analysis', [host.id], expected));
  return steps;
}

function initiatorText(host: HostDevice): string {
  const name = displayName(host);
  if (host.iqn?.trim()) return `Set ${name}'s iSCSI initiator name to ${host.iqn.trim()}, exactly as written here.`;
  return (
    `The design gives ${name} no initiator name. Set one by the iSCSI naming rules (iqn.yyyy-mm.reversed-domain:unique-name, ` +
    'RFC 7143 §4.2.7.4), and tell the designer which, so the array\u2019s access list matches it.'
  );
}

/** An array's portals grouped by the network of their port (undefined: a port on no network). */
type Portals = Map<string | undefined, string[]>;

/** Each array's portals, worked out once for all hosts (a host reads only its own networks' lists). */
function portalsByArray(ctx: StepContext): Map<string, Portals> {
  const out = new Map<string, Portals>();
  for (const array of ctx.doc.devices) {
    if (array.kind !== 'array') continue;
    const groups: Portals = new Map();
    for (const controller of array.controllers) {
      for (const port of controller.ports) {
        if (port.role !== 'data' || !port.address) continue;
        const text = port.address.mode === 'static' ? portalText(port.address.ip) : `${displayName(controller)} ${displayName(port)} (address from DHCP)`;
        const list = groups.get(port.networkId);
        if (list) list.push(text);
        else groups.set(port.networkId, [text]);
      }
    }
    out.set(array.id, groups);
  }
  return out;
}

/**
 * The arrays' portals a host discovers: those on the same network as one of its data ports; a side
 * without a network pairs with any (as the analysis reads it).
 */
function portals(all: Map<string, Portals>, ports: readonly PortRef[], planned: readonly HostArrayResult[]): string[] {
  const networks = new Set(ports.map((p) => p.port.networkId));
  const out: string[] = [];
  for (const result of planned) {
    const groups = all.get(result.array);
    if (!groups) continue;
    for (const [networkId, list] of groups) {
      if (networkId === undefined || networks.has(undefined) || networks.has(networkId)) out.push(...list);
    }
  }
  return out;
}

function discoveryText(all: Map<string, Portals>, name: string, ports: readonly PortRef[], planned: readonly HostArrayResult[]): string {
  if (planned.length === 0) return `The analysis plans no sessions for ${name}, so there is nothing to discover. Tell the designer before going on.`;
  const found = portals(all, ports, planned);
  const list = found.length > 0 ? `: ${listText(found)}` : '';
  return `From ${name}, send discovery to the target portals on its storage networks (TCP port 3260)${list}. Each one should answer with its target name.`;
}

function arrayCounts(ctx: StepContext, planned: readonly HostArrayResult[]): string {
  return listText(planned.map((r) => `${displayName(ctx.index.devices.get(r.array) ?? { id: r.array })}: ${r.sessions}`));
}

function loginText(ctx: StepContext, name: string, planned: readonly HostArrayResult[], expected: number): string {
  if (expected === 0) return `The analysis plans no sessions for ${name}. Tell the designer before going on.`;
  return (
    `Log in to every portal discovered. The analysis plans ${plural(expected, 'session')} for ${name} (${arrayCounts(ctx, planned)}); ` +
    `the host must show exactly ${expected}. More or fewer means a cable, an address or a network differs from the design.`
  );
}

function multipathText(ctx: StepContext, name: string, planned: readonly HostArrayResult[], expected: number): string {
  if (expected === 0) return `${name} has no planned sessions, so there are no paths to check.`;
  const each = planned.map((r) => {
    const array = displayName(ctx.index.devices.get(r.array) ?? { id: r.array });
    const controllers = r.controllersReached.map((id) => {
      const found = ctx.index.controllers.get(id);
      return found ? displayName(found.controller) : id;
    });
    return `each volume of ${array} on ${plural(r.sessions, 'path')} through ${listText(controllers)}`;
  });
  return `Check that multipath on ${name} shows ${listText(each)}. Pull no cable to test it unless the change plan allows.`;
}
