import { createContext, type AnalysisContext } from '@/shared/analysis/context';
import { sessionPairs } from '@/shared/analysis/sessions';
import { normalizeIp, parseIp } from '@/shared/address/ip';
import { displayName, type PortRef } from '@/shared/topology/index';
import { LIMITS } from '@/shared/rules/limits';
import type { ArrayDevice, Controller, HostDevice, Topology } from '@/shared/topology/schema';

/**
 * The login plan of a design (docs/api.md `login-plan`): for each host, each data port with its address
 * and network, and the target portals and target names that port logs in to. It is read straight
 * from the analysis's own session pairing (`sessionPairs`, the pairs `countSessions` counts), so a
 * host's `expectedSessions` is the report's session count for that host, summed over its arrays.
 *
 * A portal is `address:3260`, the IANA-registered iSCSI port (RFC 7143 §15); an IPv6 address is
 * written in brackets (`[2001:db8::10]:3260`, RFC 7143 §13.8 TargetAddress / RFC 3986 §3.2.2). A
 * controller port without a static address has no portal yet (null), and a target without a name
 * (no `iqn` on the controller or its array) has `iqn: null`: the plan says what is still missing
 * rather than leaving the pair out, because the session is counted either way.
 *
 * Pure and deterministic: hosts and their ports in document order, each port's targets in the
 * document order of the controller ports. Works with no failures assumed (the plan is for the
 * healthy design).
 */
export type LoginTarget = {
  array: string;
  arrayName: string;
  controller: string;
  controllerName: string;
  port: string;
  portName: string;
  /** The controller port's static address; null for DHCP or none yet. */
  address: string | null;
  /** `address:3260`, or null while the controller port has no static address. */
  portal: string | null;
  /** The target name: the controller's own `iqn`, else its array's; null when neither is set. */
  iqn: string | null;
};

export type LoginPort = {
  port: string;
  portName: string;
  card: string;
  cardName: string;
  /** The host port's static address, `"dhcp"`, or null when none is planned yet. */
  address: string | null;
  network: string | null;
  networkName: string | null;
  targets: LoginTarget[];
};

export type LoginHost = {
  host: string;
  name: string;
  /** The host's initiator name, or null when it has none yet. */
  initiator: string | null;
  expectedSessions: number;
  ports: LoginPort[];
};

export type LoginPlan = { hosts: LoginHost[] };

export const ISCSI_PORT = LIMITS.iscsiTcpPort.value;

/** `198.51.100.10:3260`, `[2001:db8::10]:3260`; null for text that is not an address. */
export function portalOf(address: string, port: number = ISCSI_PORT): string | null {
  const ip = parseIp(address);
  if (!ip) return null;
  const text = normalizeIp(address) ?? address;
  return ip.family === 'ipv6' ? `[${text}]:${port}` : `${text}:${port}`;
}

function staticAddress(ref: PortRef): string | null {
  const address = ref.port.address;
  return address?.mode === 'static' ? address.ip : null;
}

function targetName(controller: Controller, array: ArrayDevice): string | null {
  const own = controller.iqn?.trim();
  if (own) return own;
  const shared = array.iqn?.trim();
  return shared ? shared : null;
}

function orderKey(ref: PortRef): number[] {
  return [ref.deviceIndex, ref.groupIndex, ref.portIndex];
}

function byDocumentOrder(x: PortRef, y: PortRef): number {
  const a = orderKey(x);
  const b = orderKey(y);
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return a[i] - b[i];
  return 0;
}

function loginTarget(ref: PortRef): LoginTarget {
  const array = ref.device as ArrayDevice;
  const controller = ref.controller!;
  const address = staticAddress(ref);
  return {
    array: array.id,
    arrayName: displayName(array),
    controller: controller.id,
    controllerName: displayName(controller),
    port: ref.port.id,
    portName: displayName(ref.port),
    address,
    portal: address === null ? null : portalOf(address),
    iqn: targetName(controller, array),
  };
}

export function loginPlan(doc: Topology): LoginPlan {
  const ctx = createContext(doc);
  const byPort = new Map<string, PortRef[]>();
  for (const { hostPort, controllerPorts } of sessionPairs(ctx)) byPort.set(hostPort.port.id, controllerPorts);
  const hosts: LoginHost[] = [];
  for (const device of doc.devices) {
    if (device.kind !== 'host') continue;
    const ports = hostPorts(ctx, device, byPort);
    if (ports.length === 0) continue;
    hosts.push({
      host: device.id,
      name: displayName(device),
      initiator: device.iqn?.trim() ? device.iqn.trim() : null,
      expectedSessions: ports.reduce((sum, port) => sum + port.targets.length, 0),
      ports,
    });
  }
  return { hosts };
}

/**
 * The host's data ports in document order, each with the targets it pairs with. A port planned for
 * storage (on a network or given an address) with no session yet is listed with no targets.
 */
function hostPorts(ctx: AnalysisContext, host: HostDevice, byPort: Map<string, PortRef[]>): LoginPort[] {
  const out: LoginPort[] = [];
  for (const adapter of host.adapters) {
    for (const port of adapter.ports) {
      if (port.role !== 'data') continue;
      const paired = byPort.get(port.id);
      // A spare port (no session, no network, no address) is not part of the plan.
      if (!paired && port.networkId === undefined && port.address === undefined) continue;
      const network = port.networkId === undefined ? undefined : ctx.index.networks.get(port.networkId);
      out.push({
        port: port.id,
        portName: displayName(port),
        card: adapter.id,
        cardName: displayName(adapter),
        address: port.address === undefined ? null : port.address.mode === 'dhcp' ? 'dhcp' : port.address.ip,
        network: network ? network.id : null,
        networkName: network ? displayName(network) : null,
        targets: (paired ?? []).slice().sort(byDocumentOrder).map(loginTarget),
      });
    }
  }
  return out;
}
