import { containsIp, isReservedInBlock, parseCidr, type Cidr } from '@/shared/address/cidr';
import { ipKey, type Ip } from '@/shared/address/ip';
import { ipOf, nameOf, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { displayName, portLabel, type PortRef } from '@/shared/topology/index';

/**
 * Port addressing: every cabled host or controller port on a network of its own kind, with an
 * address inside that network that is neither reserved nor used twice (nor the gateway).
 */
function blocks(ctx: AnalysisContext): Map<string, Cidr> {
  const map = new Map<string, Cidr>();
  for (const network of ctx.doc.networks) {
    const block = parseCidr(network.cidr);
    if (block) map.set(network.id, block);
  }
  return map;
}

/** Which reserved address of the block this is (the caller knows it is one). */
function reservedWord(block: Cidr, ip: Ip): string {
  if (ip.family === 'ipv6') return 'the subnet-router anycast address';
  return ip.value === block.network ? 'the network address' : 'the broadcast address';
}

function portFindings(ctx: AnalysisContext, ref: PortRef, cabled: boolean, cidrs: Map<string, Cidr>, out: Finding[]): void {
  const { port } = ref;
  const network = port.networkId ? ctx.index.networks.get(port.networkId) : undefined;
  // Cheap checks first: this runs for every port of every design, and most ports are fine.
  if (!(cabled && (!network || !port.address)) && !(network && network.purpose !== port.role) && (port.address?.mode !== 'static' || !network)) return;
  const label = portLabel(ref);
  if (cabled && !network) {
    out.push({ rule: 'port-unaddressed', severity: 'warning', subjects: [port.id], message: `${label} is cabled but on no network.` });
  } else if (cabled && !port.address) {
    out.push({ rule: 'port-unaddressed', severity: 'warning', subjects: [port.id], message: `${label} is cabled but has no address.` });
  }
  if (network && network.purpose !== port.role) {
    out.push({
      rule: 'management-data-same-subnet',
      severity: 'error',
      subjects: [port.id, network.id],
      message: `${label} is a ${port.role} port on the ${network.purpose} network ${displayName(network)}; management and data must not share a subnet.`,
    });
  }
  if (port.address?.mode !== 'static' || !network) return;
  const ip = ipOf(ctx, port.address.ip);
  const block = cidrs.get(network.id);
  if (!ip || !block) return;
  const inside = containsIp(block, ip);
  if (inside && !isReservedInBlock(block, ip)) return;
  if (!inside) {
    out.push({
      rule: 'address-outside-network',
      severity: 'error',
      subjects: [port.id, network.id],
      message: `${label} has ${port.address.ip}, which is outside ${displayName(network)} (${network.cidr}).`,
    });
  } else if (isReservedInBlock(block, ip)) {
    const what = reservedWord(block, ip);
    out.push({
      rule: 'address-reserved',
      severity: 'error',
      subjects: [port.id, network.id],
      message: `${label} has ${port.address.ip}, ${what} of ${displayName(network)}.`,
    });
  }
}

function gatewayFindings(ctx: AnalysisContext, cidrs: Map<string, Cidr>): Finding[] {
  const out: Finding[] = [];
  for (const network of ctx.doc.networks) {
    const block = cidrs.get(network.id);
    const gateway = network.gateway ? ipOf(ctx, network.gateway) : null;
    if (!block || !gateway) continue;
    if (!containsIp(block, gateway)) {
      out.push({
        rule: 'address-outside-network',
        severity: 'error',
        subjects: [network.id],
        message: `The gateway ${network.gateway} of ${displayName(network)} is outside ${network.cidr}.`,
      });
    } else if (isReservedInBlock(block, gateway)) {
      out.push({
        rule: 'address-reserved',
        severity: 'error',
        subjects: [network.id],
        message: `The gateway ${network.gateway} of ${displayName(network)} is ${reservedWord(block, gateway)} of ${network.cidr}.`,
      });
    }
  }
  return out;
}

/**
 * The same address on two ports, or a port on its network's gateway address. Addresses compare by
 * value per family (so 2001:DB8::1 and 2001:db8:0::1 are one address); only the first holder of
 * each is remembered until a second turns up, since almost every address has one holder.
 */
function addressText(ctx: AnalysisContext, holder: string): string | undefined {
  const address = ctx.index.ports.get(holder)?.port.address;
  return address?.mode === 'static' ? address.ip : ctx.index.networks.get(holder)?.gateway;
}

function duplicateFindings(ctx: AnalysisContext): Finding[] {
  const first = { ipv4: new Map<bigint, string>(), ipv6: new Map<bigint, string>() };
  const shared = new Map<string, { text: string; ids: string[] }>();
  const add = (text: string | undefined, holder: string) => {
    const ip = text ? ipOf(ctx, text) : null;
    if (!ip || !text) return;
    const holders = first[ip.family];
    const earlier = holders.get(ip.value);
    if (earlier === undefined) {
      holders.set(ip.value, holder);
      return;
    }
    const key = ipKey(ip);
    const entry = shared.get(key);
    if (entry) entry.ids.push(holder);
    else shared.set(key, { text: addressText(ctx, earlier) ?? text, ids: [earlier, holder] });
  };
  for (const network of ctx.doc.networks) add(network.gateway, network.id);
  for (const ref of ctx.index.ports.values()) {
    if (ref.port.address?.mode === 'static') add(ref.port.address.ip, ref.port.id);
  }
  const out: Finding[] = [];
  for (const { text: ip, ids } of shared.values()) {
    if (!ids.some((id) => ctx.index.ports.has(id))) continue;
    const names = ids.map((id) => {
      const ref = ctx.index.ports.get(id);
      return ref ? portLabel(ref) : `the gateway of ${nameOf(ctx, id)}`;
    });
    out.push({ rule: 'address-duplicate', severity: 'error', subjects: ids, message: `${ip} is used by ${names.join(' and ')}.` });
  }
  return out;
}

export function addressingFindings(ctx: AnalysisContext): Finding[] {
  const cidrs = blocks(ctx);
  const out: Finding[] = [];
  for (const ref of ctx.index.ports.values()) {
    if (ref.device.kind === 'switch') continue;
    portFindings(ctx, ref, ctx.index.cablesByPort.has(ref.port.id), cidrs, out);
  }
  for (const finding of gatewayFindings(ctx, cidrs)) out.push(finding);
  for (const finding of duplicateFindings(ctx)) out.push(finding);
  return out;
}
