import type { Issue } from '@/shared/api/common';

/**
 * How big one document may be, beyond the request body limit. A product decision of ours, not a
 * published value: the largest design we measure (`npm run bench`, 20,000 hosts) has 20,914
 * devices, 130,992 ports, 40,862 cables and 2 networks, and every limit here is at least twice
 * that, so no real storage network meets them, while a document built to exhaust the server's
 * memory or the analysis's time is turned away before anything else reads it. 4094 VLANs
 * (IEEE 802.1Q) bound the networks a design can usefully have; the limit leaves room above that
 * for untagged and IPv6 networks.
 */
export const DOCUMENT_LIMITS = {
  devices: 50_000,
  ports: 400_000,
  cables: 200_000,
  networks: 10_000,
  layout: 50_000,
} as const;

type Counted = keyof typeof DOCUMENT_LIMITS;

const NOUNS: Record<Counted, string> = {
  devices: 'devices',
  ports: 'ports',
  cables: 'cables',
  networks: 'networks',
  layout: 'canvas positions',
};

function lengthOf(value: unknown): number {
  return Array.isArray(value) ? value.length : 0;
}

function field(value: unknown, key: string): unknown {
  return typeof value === 'object' && value !== null && Object.hasOwn(value, key) ? (value as Record<string, unknown>)[key] : undefined;
}

/** Ports of the raw device list, counted without reading anything else (stops once past the limit). */
function countPorts(devices: unknown): number {
  if (!Array.isArray(devices)) return 0;
  let ports = 0;
  for (const device of devices) {
    ports += lengthOf(field(device, 'ports'));
    for (const group of [field(device, 'controllers'), field(device, 'adapters')]) {
      if (!Array.isArray(group)) continue;
      for (const part of group) ports += lengthOf(field(part, 'ports'));
    }
    if (ports > DOCUMENT_LIMITS.ports) break;
  }
  return ports;
}

/** 400000 → "400,000", the same in every locale. */
function fmt(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * The limits a raw (not yet parsed) document exceeds, as issues with the path of the list. Cheap:
 * it reads list lengths only, so it runs before the schema parse and the cross-reference checks.
 */
export function sizeIssues(input: unknown): Issue[] {
  const layout = field(input, 'layout');
  const counts: Record<Counted, number> = {
    devices: lengthOf(field(input, 'devices')),
    ports: countPorts(field(input, 'devices')),
    cables: lengthOf(field(input, 'cables')),
    networks: lengthOf(field(input, 'networks')),
    layout: typeof layout === 'object' && layout !== null ? Object.keys(layout).length : 0,
  };
  const issues: Issue[] = [];
  for (const key of Object.keys(DOCUMENT_LIMITS) as Counted[]) {
    const limit = DOCUMENT_LIMITS[key];
    if (counts[key] <= limit) continue;
    const more = key === 'ports' ? `more than ${fmt(limit)}` : fmt(counts[key]);
    issues.push({
      path: key === 'ports' ? 'devices' : key,
      message: `A document may hold at most ${fmt(limit)} ${NOUNS[key]}; this one has ${more}. Split the design into several documents.`,
    });
  }
  return issues;
}
