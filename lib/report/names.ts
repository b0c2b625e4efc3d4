import type { Report, UnitKind } from '@/shared/analysis/types';
import { displayName, indexTopology, portLabel, type TopologyIndex } from '@/shared/topology';
import type { Cable, Topology } from '@/shared/topology/schema';
import { powerModel } from '@/shared/analysis/power';

/**
 * Names a reviewer reads instead of ids: "switch fab-a", "card-1 of cam-rec-2", "controller ctl-a
 * of vault-1", "cable HR-A-10 (cam-rec-2 card-1 p1 → fab-a p10)". Built once per document; every
 * lookup falls back to the id itself, so a report about something the document lacks still reads.
 */
export type Namer = {
  /** Any subject of a finding or report: device, controller, card, port, cable or network. */
  name: (id: string) => string;
  /** A failure unit named by its kind, with a cable's two ends. */
  unit: (id: string) => string;
  /** A failure unit's kind, read off the document (null for an id that is not a unit). */
  kindOf: (id: string) => UnitKind | null;
  /** A host, array or other device by its own name. */
  device: (id: string) => string;
  /** A cable's two ends as an installer reads them. */
  cableEnds: (cable: Cable) => string;
};

function cableTitle(cable: Cable): string {
  return cable.label?.trim() ? cable.label.trim() : cable.id;
}

export function createNamer(doc: Topology, index: TopologyIndex = indexTopology(doc)): Namer {
  const port = (id: string) => {
    const ref = index.ports.get(id);
    return ref ? portLabel(ref) : id;
  };
  const cableEnds = (cable: Cable) => `${port(cable.a)} → ${port(cable.b)}`;
  const device = (id: string) => {
    const found = index.devices.get(id);
    return found ? displayName(found) : id;
  };

  const power = powerModel(doc);
  const kindOf = (id: string): UnitKind | null => {
    if (index.cables.has(id)) return 'cable';
    if (index.adapters.has(id)) return 'adapter';
    if (index.controllers.has(id)) return 'controller';
    if (power.psus.has(id)) return 'psu';
    if (power.feeds.has(id)) return 'feed';
    return index.devices.get(id)?.kind === 'switch' ? 'switch' : null;
  };

  const unit = (id: string): string => {
    const cable = index.cables.get(id);
    if (cable) return `cable ${cableTitle(cable)} (${cableEnds(cable)})`;
    const adapter = index.adapters.get(id);
    if (adapter) return `${displayName(adapter.adapter)} of ${displayName(adapter.host)}`;
    const controller = index.controllers.get(id);
    if (controller) return `controller ${displayName(controller.controller)} of ${displayName(controller.array)}`;
    const psu = power.psus.get(id);
    if (psu) return `power supply ${displayName(psu.psu)} of ${displayName(psu.device)}`;
    const feed = power.feeds.get(id);
    if (feed) return `power feed ${displayName(feed)}`;
    const found = index.devices.get(id);
    if (found?.kind === 'switch') return `switch ${displayName(found)}`;
    return name(id);
  };

  function name(id: string): string {
    if (index.devices.has(id)) return device(id);
    if (index.ports.has(id)) return port(id);
    const cable = index.cables.get(id);
    if (cable) return `cable ${cableTitle(cable)}`;
    const network = index.networks.get(id);
    if (network) return `network ${displayName(network)}`;
    if (index.adapters.has(id) || index.controllers.has(id) || power.psus.has(id) || power.feeds.has(id)) return unit(id);
    return id;
  }

  return { name, unit, kindOf, device, cableEnds };
}

/** A controller's own name without its array ("ctl-a"): the array is already named beside it. */
export function controllerShortName(index: TopologyIndex, id: string): string {
  const found = index.controllers.get(id);
  return found ? displayName(found.controller) : id;
}

/** Who a failure unit cuts off, as "cam-rec-2 from vault-1" phrases. */
export function cutOffPhrases(namer: Namer, failure: Report['failures'][number]): string[] {
  return failure.cutsOff.map((pair) => `${namer.device(pair.host)} from ${namer.device(pair.array)}`);
}
