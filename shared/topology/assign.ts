import { assignAddresses } from '@/shared/address/assign';
import type { Port, Topology } from '@/shared/topology/schema';

/**
 * The canvas's "assign addresses" command: a pure `(doc, options) => doc`. For each chosen network,
 * every host or controller port on it without a static address (or every one, with `overwrite`)
 * gets the lowest free host address, in document order (arrays and hosts as they are listed), never
 * the network, broadcast or gateway address nor one another port already holds. Ports are left
 * alone when the network runs out of addresses.
 */
export type AssignPortOptions = { networkIds?: readonly string[]; overwrite?: boolean };

function groupsOf(doc: Topology): { ports: Port[] }[] {
  return doc.devices.flatMap((d) => (d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : []));
}

export function assignPortAddresses(doc: Topology, options: AssignPortOptions = {}): Topology {
  const copy = structuredClone(doc);
  const wanted = new Set(options.networkIds ?? copy.networks.map((n) => n.id));
  const ports = groupsOf(copy).flatMap((g) => g.ports);
  for (const network of copy.networks) {
    if (!wanted.has(network.id)) continue;
    const members = ports.filter((p) => p.networkId === network.id);
    const targets = members.filter((p) => options.overwrite || p.address?.mode !== 'static');
    const moving = new Set(targets);
    const used = ports
      .filter((p) => !moving.has(p) && p.address?.mode === 'static')
      .map((p) => (p.address as { ip: string }).ip);
    const ips = assignAddresses(network.cidr, targets.length, used, { gateway: network.gateway });
    targets.forEach((port, i) => {
      if (ips[i]) port.address = { mode: 'static', ip: ips[i] };
    });
  }
  return copy;
}
