import type { Issue } from '@/shared/api/common';
import type { Topology } from '@/shared/topology/schema';
import { iteratePorts, portPath } from '@/shared/topology/index';

/**
 * The checks zod cannot make one value at a time: ids unique across the whole document (racks,
 * power feeds and PSUs included), cable ends that are existing and different ports, network
 * references that resolve to networks, placements naming racks and PSUs naming feeds, switch ports
 * without networkId or address (a switch carries every network), and layout keys naming devices.
 */
type Kind = 'device' | 'controller' | 'card' | 'port' | 'cable' | 'network' | 'rack' | 'power feed' | 'PSU';

/**
 * The first holder of an id, and every kind that claimed it: when an id is used twice, the
 * duplicate is the one problem reported, and a reference that fits any of its holders is not
 * reported again as pointing at the wrong kind.
 */
type Owner = { kind: Kind; path: string; kinds: Set<Kind> };

function collectIds(doc: Topology, issues: Issue[]): Map<string, Owner> {
  const owners = new Map<string, Owner>();
  const claim = (value: string, kind: Kind, path: string) => {
    const first = owners.get(value);
    if (first) {
      first.kinds.add(kind);
      issues.push({
        path: `${path}.id`,
        message: `The id "${value}" is already used by the ${first.kind} at ${first.path}; every id must be unique in the document.`,
      });
      return;
    }
    owners.set(value, { kind, path, kinds: new Set([kind]) });
  };
  doc.racks?.forEach((rack, i) => claim(rack.id, 'rack', `racks.${i}`));
  doc.powerFeeds?.forEach((feed, i) => claim(feed.id, 'power feed', `powerFeeds.${i}`));
  doc.devices.forEach((device, d) => {
    claim(device.id, 'device', `devices.${d}`);
    device.psus?.forEach((psu, i) => claim(psu.id, 'PSU', `devices.${d}.psus.${i}`));
    if (device.kind === 'array') {
      device.controllers.forEach((c, i) => claim(c.id, 'controller', `devices.${d}.controllers.${i}`));
    } else if (device.kind === 'host') {
      device.adapters.forEach((a, i) => claim(a.id, 'card', `devices.${d}.adapters.${i}`));
    }
  });
  for (const ref of iteratePorts(doc)) claim(ref.port.id, 'port', portPath(ref));
  doc.cables.forEach((cable, i) => claim(cable.id, 'cable', `cables.${i}`));
  doc.networks.forEach((network, i) => claim(network.id, 'network', `networks.${i}`));
  return owners;
}

function checkCables(doc: Topology, owners: Map<string, Owner>, issues: Issue[]): void {
  doc.cables.forEach((cable, i) => {
    for (const end of ['a', 'b'] as const) {
      const target = owners.get(cable[end]);
      if (!target) {
        issues.push({ path: `cables.${i}.${end}`, message: `No port has the id "${cable[end]}".` });
      } else if (!target.kinds.has('port')) {
        issues.push({
          path: `cables.${i}.${end}`,
          message: `"${cable[end]}" is a ${target.kind}, not a port; a cable end must name a port.`,
        });
      }
    }
    if (cable.a === cable.b) {
      issues.push({ path: `cables.${i}.b`, message: 'A cable cannot join a port to itself; its two ends must differ.' });
    }
  });
}

function checkPorts(doc: Topology, owners: Map<string, Owner>, issues: Issue[]): void {
  for (const ref of iteratePorts(doc)) {
    const { port, device } = ref;
    const path = portPath(ref);
    if (device.kind === 'switch') {
      if (port.networkId !== undefined) {
        issues.push({
          path: `${path}.networkId`,
          message: 'A switch port carries every network; remove its network reference.',
        });
      }
      if (port.address !== undefined) {
        issues.push({ path: `${path}.address`, message: 'A switch port has no address of its own; remove it.' });
      }
      continue;
    }
    if (port.networkId === undefined) continue;
    const target = owners.get(port.networkId);
    if (!target) {
      issues.push({ path: `${path}.networkId`, message: `No network has the id "${port.networkId}".` });
    } else if (!target.kinds.has('network')) {
      issues.push({
        path: `${path}.networkId`,
        message: `"${port.networkId}" is a ${target.kind}, not a network.`,
      });
    }
  }
}

/** A reference that must name a thing of one kind: missing, or of another kind, is one issue. */
function checkReference(owners: Map<string, Owner>, value: string, kind: Kind, path: string, issues: Issue[]): void {
  const target = owners.get(value);
  if (!target) issues.push({ path, message: `No ${kind} has the id "${value}".` });
  else if (!target.kinds.has(kind)) issues.push({ path, message: `"${value}" is a ${target.kind}, not a ${kind}.` });
}

function checkPlacementsAndPower(doc: Topology, owners: Map<string, Owner>, issues: Issue[]): void {
  doc.devices.forEach((device, d) => {
    if (device.placement) checkReference(owners, device.placement.rackId, 'rack', `devices.${d}.placement.rackId`, issues);
    device.psus?.forEach((psu, i) => {
      if (psu.feedId !== undefined) checkReference(owners, psu.feedId, 'power feed', `devices.${d}.psus.${i}.feedId`, issues);
    });
  });
}

function checkLayout(doc: Topology, owners: Map<string, Owner>, issues: Issue[]): void {
  for (const key of Object.keys(doc.layout ?? {})) {
    if (!owners.get(key)?.kinds.has('device')) {
      issues.push({ path: `layout.${key}`, message: `The layout names "${key}", which is not a device of this document.` });
    }
  }
}

export function crossReferenceIssues(doc: Topology): Issue[] {
  const issues: Issue[] = [];
  const owners = collectIds(doc, issues);
  checkCables(doc, owners, issues);
  checkPorts(doc, owners, issues);
  checkPlacementsAndPower(doc, owners, issues);
  checkLayout(doc, owners, issues);
  return issues;
}
