import { displayName, indexTopology, type PortRef, type TopologyIndex } from '@/shared/topology/index';
import type { Cable, Topology } from '@/shared/topology/schema';
import type { UnitKind } from '@/shared/analysis/types';
import { parseIp, type Ip } from '@/shared/address/ip';
import { powerModel, withPowerFailures, type PowerModel } from '@/shared/analysis/power';

/**
 * What every part of the analysis needs to know about one document: the lookups, which units have
 * failed (what-if), and how each cable end takes part in data paths.
 */
export type AnalysisContext = {
  doc: Topology;
  index: TopologyIndex;
  /**
   * Every unit that is down: those asked for (what-if), plus the data-path units of each device
   * those failures leave without power (power.ts).
   */
  failed: ReadonlySet<string>;
  /** The units asked for, as given. */
  requested: readonly string[];
  power: PowerModel;
  /** With no networks at all, every data port pairs with every other (docs/analysis.md). */
  hasNetworks: boolean;
  /** The cables that can carry a data path, in document order; filled on first use (see dataCables). */
  cache: { dataCables?: readonly DataCableEnds[]; ips?: Map<string, Ip | null> };
};

export type DataCableEnds = { cable: Cable; a: PortRef; b: PortRef; roleA: EndRole; roleB: EndRole };

/**
 * How a cable end takes part in data paths: a controller or host data port ends a path, a port of a
 * data or shared switch forwards, and anything else (management ports, management switches, a
 * failed unit) carries no data path.
 */
export type EndRole = 'controller' | 'host' | 'switch' | 'none';

export function createContext(doc: Topology, failed: readonly string[] = []): AnalysisContext {
  const power = powerModel(doc);
  return { doc, index: indexTopology(doc), failed: withPowerFailures(power, failed), requested: failed, power, hasNetworks: doc.networks.length > 0, cache: {} };
}

export function isForwardingSwitch(ctx: AnalysisContext, ref: PortRef): boolean {
  const device = ref.device;
  return device.kind === 'switch' && device.role !== 'management' && !ctx.failed.has(device.id);
}

export function endRole(ctx: AnalysisContext, ref: PortRef | undefined): EndRole {
  if (!ref) return 'none';
  if (ref.device.kind === 'switch') return isForwardingSwitch(ctx, ref) ? 'switch' : 'none';
  if (ref.port.role !== 'data') return 'none';
  if (ref.controller) return ctx.failed.has(ref.controller.id) ? 'none' : 'controller';
  if (ref.adapter) return ctx.failed.has(ref.adapter.id) ? 'none' : 'host';
  return 'none';
}

/** A cable that can carry a data path, with its ends classified; null when it cannot. */
export function dataCable(ctx: AnalysisContext, cable: Cable): DataCableEnds | null {
  if (ctx.failed.has(cable.id)) return null;
  const a = ctx.index.ports.get(cable.a);
  const b = ctx.index.ports.get(cable.b);
  const roleA = endRole(ctx, a);
  const roleB = endRole(ctx, b);
  if (!a || !b || roleA === 'none' || roleB === 'none') return null;
  // Hosts and controllers end paths; two path ends joined directly only count host-to-controller.
  if (roleA !== 'switch' && roleB !== 'switch' && roleA === roleB) return null;
  if (roleA === 'switch' && roleB === 'switch' && a.device.id === b.device.id) return null;
  return { cable, a, b, roleA, roleB };
}

/** An address parsed once per analysis, however many rules read it. */
export function ipOf(ctx: AnalysisContext, text: string): Ip | null {
  const cache = (ctx.cache.ips ??= new Map());
  let ip = cache.get(text);
  if (ip === undefined) cache.set(text, (ip = parseIp(text)));
  return ip;
}

/** Every cable that can carry a data path, classified once per analysis and shared by its parts. */
export function dataCables(ctx: AnalysisContext): readonly DataCableEnds[] {
  if (!ctx.cache.dataCables) {
    const list: DataCableEnds[] = [];
    for (const cable of ctx.doc.cables) {
      const ends = dataCable(ctx, cable);
      if (ends) list.push(ends);
    }
    ctx.cache.dataCables = list;
  }
  return ctx.cache.dataCables;
}

/** Whether a host port and a controller port may form a session by their networks. */
export function networksPair(ctx: AnalysisContext, hostNet?: string, controllerNet?: string): boolean {
  if (!ctx.hasNetworks || hostNet === undefined || controllerNet === undefined) return true;
  return hostNet === controllerNet;
}

export function unitKindOf(ctx: AnalysisContext, id: string): UnitKind | null {
  if (ctx.index.cables.has(id)) return 'cable';
  if (ctx.index.adapters.has(id)) return 'adapter';
  if (ctx.index.controllers.has(id)) return 'controller';
  if (ctx.power.psus.has(id)) return 'psu';
  if (ctx.power.feeds.has(id)) return 'feed';
  return ctx.index.devices.get(id)?.kind === 'switch' ? 'switch' : null;
}

const KIND_WORDS: Record<UnitKind, string> = {
  cable: 'cable',
  adapter: 'card',
  switch: 'switch',
  controller: 'controller',
  psu: 'power supply',
  feed: 'power feed',
};

/** "switch fab-a", "card wms-db-1 card-2", "cable A-07": a unit as a designer names it. */
export function describeUnit(ctx: AnalysisContext, id: string): string {
  const kind = unitKindOf(ctx, id);
  if (kind === 'cable') {
    const cable = ctx.index.cables.get(id)!;
    return `cable ${cable.label?.trim() || cable.id}`;
  }
  if (kind === 'adapter') {
    const { adapter, host } = ctx.index.adapters.get(id)!;
    const name = displayName(adapter);
    return `${/^card\b/i.test(name) ? name : `card ${name}`} of ${displayName(host)}`;
  }
  if (kind === 'controller') {
    const { controller, array } = ctx.index.controllers.get(id)!;
    return `controller ${displayName(controller)} of ${displayName(array)}`;
  }
  if (kind === 'psu') {
    const { psu, device } = ctx.power.psus.get(id)!;
    return `${KIND_WORDS.psu} ${displayName(psu)} of ${displayName(device)}`;
  }
  if (kind === 'feed') return `${KIND_WORDS.feed} ${displayName(ctx.power.feeds.get(id)!)}`;
  const device = ctx.index.devices.get(id);
  return device ? `${KIND_WORDS.switch} ${displayName(device)}` : id;
}

/** "Cable HR-A-07 …": a unit description opening a sentence (our own word comes first). */
export function atSentenceStart(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function nameOf(ctx: AnalysisContext, id: string): string {
  const device = ctx.index.devices.get(id);
  if (device) return displayName(device);
  const network = ctx.index.networks.get(id);
  return network ? displayName(network) : id;
}

/** Plain code-unit order: the same in every browser and on the server, unlike localeCompare. */
export function byId(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
