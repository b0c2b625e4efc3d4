import type { Finding, Report } from '@/shared/analysis/types';
import { joinIds } from '@/shared/keys/tuple';
import type { Topology } from '@/shared/topology/schema';

/**
 * What the live analysis adds to the drawing, read off the report (never re-derived): which
 * switches, controllers, cards and cables are single points of failure, each host's badge
 * (sessions, redundant or not) and the findings by subject. Per-device marks keep their identity
 * while they are equal, so a new report redraws only the devices whose marks changed.
 */
export type HostBadge = {
  sessions: number;
  /** Every array the host reaches, it reaches with no single point of failure. */
  redundant: boolean;
  /** Arrays reached with at least one session. */
  arrays: number;
  /** The badge's words, short enough for the header ("4 sessions", "no sessions"). */
  text: string;
  /** The full sentence for assistive technology and tooltips. */
  description: string;
};

export type DeviceMarks = {
  /** The device itself (a switch) is a single point of failure for some host. */
  spof: boolean;
  /** Its controllers or cards that are single points of failure, as joinIds text (a string so it compares by value; splitIds reads it). */
  spofGroups: string;
  badge: HostBadge | null;
};

export type CanvasMarks = {
  report: Report | null;
  devices: ReadonlyMap<string, DeviceMarks>;
  spofCables: ReadonlySet<string>;
  /** Every unit that is a single point of failure for at least one host. */
  spofUnits: ReadonlySet<string>;
  findingsBySubject: ReadonlyMap<string, Finding[]>;
};

export const NO_MARKS: DeviceMarks = Object.freeze({ spof: false, spofGroups: '', badge: null });

export const EMPTY_MARKS: CanvasMarks = {
  report: null,
  devices: new Map(),
  spofCables: new Set(),
  spofUnits: new Set(),
  findingsBySubject: new Map(),
};

function badgeFor(name: string, pairs: Report['hosts'], hasDataPorts: boolean): HostBadge | null {
  if (pairs.length === 0) {
    if (!hasDataPorts) return null;
    return { sessions: 0, redundant: false, arrays: 0, text: 'no sessions', description: `${name} reaches no storage array yet.` };
  }
  const sessions = pairs.reduce((sum, p) => sum + p.sessions, 0);
  const redundant = pairs.every((p) => p.redundant);
  const text = `${sessions} session${sessions === 1 ? '' : 's'}`;
  const state = redundant ? 'redundant: no single point of failure' : 'not redundant: a single failure cuts it off';
  return { sessions, redundant, arrays: pairs.length, text, description: `${name}: ${text} to ${pairs.length} array${pairs.length === 1 ? '' : 's'}, ${state}.` };
}

function sameBadge(a: HostBadge | null, b: HostBadge | null): boolean {
  return a === b || (!!a && !!b && a.text === b.text && a.redundant === b.redundant && a.description === b.description);
}

export function computeMarks(doc: Topology, report: Report | null, previous: CanvasMarks = EMPTY_MARKS): CanvasMarks {
  if (!report) return EMPTY_MARKS;
  const spofUnits = new Set(report.failures.map((f) => f.unit));
  const pairsByHost = new Map<string, Report['hosts']>();
  for (const pair of report.hosts) pairsByHost.set(pair.host, [...(pairsByHost.get(pair.host) ?? []), pair]);

  const devices = new Map<string, DeviceMarks>();
  for (const device of doc.devices) {
    const groups = device.kind === 'array' ? device.controllers : device.kind === 'host' ? device.adapters : [];
    const spofGroups = joinIds(groups.filter((g) => spofUnits.has(g.id)).map((g) => g.id));
    const hasData = device.kind === 'host' && device.adapters.some((a) => a.ports.some((p) => p.role === 'data'));
    const badge = device.kind === 'host' ? badgeFor(device.name, pairsByHost.get(device.id) ?? [], hasData) : null;
    const spof = spofUnits.has(device.id);
    if (!spof && spofGroups === '' && badge === null) {
      devices.set(device.id, NO_MARKS);
      continue;
    }
    const old = previous.devices.get(device.id);
    const reuse = old && old.spof === spof && old.spofGroups === spofGroups && sameBadge(old.badge, badge);
    devices.set(device.id, reuse ? old : { spof, spofGroups, badge });
  }

  const cableIds = new Set(doc.cables.map((c) => c.id));
  const spofCables = new Set([...spofUnits].filter((id) => cableIds.has(id)));
  const findingsBySubject = new Map<string, Finding[]>();
  for (const finding of report.findings) {
    for (const subject of finding.subjects) {
      const list = findingsBySubject.get(subject);
      if (list) list.push(finding);
      else findingsBySubject.set(subject, [finding]);
    }
  }
  return { report, devices, spofCables, spofUnits, findingsBySubject };
}

/** The findings about one subject, most severe first (the report's own order). */
export function findingsFor(marks: CanvasMarks, id: string): Finding[] {
  return marks.findingsBySubject.get(id) ?? [];
}

/** Address problems the networks screen flags per port, from the report's findings. */
export const ADDRESS_RULES = ['address-duplicate', 'address-outside-network', 'address-reserved', 'port-unaddressed', 'management-data-same-subnet', 'target-address-dhcp'] as const;

export function addressFindings(marks: CanvasMarks, portId: string): Finding[] {
  return findingsFor(marks, portId).filter((f) => (ADDRESS_RULES as readonly string[]).includes(f.rule));
}
