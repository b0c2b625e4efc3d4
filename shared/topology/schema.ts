import { z } from 'zod';
import { isValidCidr } from '@/shared/address/cidr';
import { isValidIp } from '@/shared/address/ip';

/**
 * Topology document, format 2 — the executable form of the format page. Only what makes a document
 * unreadable is rejected here; every drafting mistake is left to the analysis as a finding, so a
 * draft can always be saved. Cross-references (unique ids, cable ends, network, rack and feed ids)
 * are checked in crossref.ts because zod sees one value at a time. Format 1 (format1.ts) is still
 * read: validate.ts upgrades it on the way in (upgrade.ts), so everything past the gate sees format 2.
 *
 * Format 2 adds, all optional: `site` (rack and row pitches, slack), `racks`, `powerFeeds`, a
 * device's `placement` (rack, lowest unit, height) and `psus`, and target names (`iqn`) on arrays
 * and controllers. A device's format 1 `rack`/`ru` became `placement`.
 *
 * Addresses: a malformed IP address or CIDR is rejected (not a dotted quad or IPv6 text, a prefix
 * longer than the family, a prefix with leading zeros). A CIDR written with host bits set
 * (`198.51.100.7/24`) is well formed and unambiguous — it is read as the block it lies in — so it
 * is a drafting slip: accepted here and reported by the analysis as `cidr-host-bits`.
 */
export const TOPOLOGY_FORMAT = 'cablewright.topology/2';
export const TOPOLOGY_FORMAT_1 = 'cablewright.topology/1';

export const PORT_SPEEDS = [1, 2.5, 5, 10, 25, 40, 50, 100] as const;
export const CONNECTORS = ['rj45', 'sfp'] as const;
export const MEDIA = ['cat5e', 'cat6', 'cat6a', 'om3', 'om4', 'dac', 'aoc'] as const;
export const PORT_ROLES = ['data', 'management'] as const;
export const SWITCH_ROLES = ['data', 'management', 'shared'] as const;
export const NETWORK_PURPOSES = ['data', 'management'] as const;
export const CHAP_MODES = ['none', 'one-way', 'mutual'] as const;
export const DEVICE_KINDS = ['array', 'switch', 'host'] as const;

export type PortSpeed = (typeof PORT_SPEEDS)[number];
export type Connector = (typeof CONNECTORS)[number];
export type Media = (typeof MEDIA)[number];
export type PortRole = (typeof PORT_ROLES)[number];
export type SwitchRole = (typeof SWITCH_ROLES)[number];
export type NetworkPurpose = (typeof NETWORK_PURPOSES)[number];
export type ChapMode = (typeof CHAP_MODES)[number];
export type DeviceKind = (typeof DEVICE_KINDS)[number];

/** The format page's defaults for what a drafting designer may leave out. */
export const DEFAULT_SITE = { rackPitchMm: 600, rowPitchMm: 1200, slackM: 0.5 } as const;
export const DEFAULT_RACK_HEIGHT_U = 42;
export const DEFAULT_DEVICE_HEIGHT_U: Record<DeviceKind, number> = { array: 2, switch: 1, host: 1 };
/** The tallest rack (and so the highest unit) a document may name; taller is unreadable, not a draft. */
export const MAX_RACK_UNITS = 100;

const id = z.string().min(1, 'must not be empty').max(200, 'must be at most 200 characters');
const name = z.string().max(200, 'must be at most 200 characters');
const units = z.number().int().min(1).max(MAX_RACK_UNITS);
const iqn = z.string().max(1000).optional();

export const addressSchema = z.discriminatedUnion('mode', [
  z
    .object({
      mode: z.literal('static'),
      ip: z.string().refine(isValidIp, 'is not an IPv4 or IPv6 address (no prefix length here)'),
    })
    .strict(),
  z.object({ mode: z.literal('dhcp') }).strict(),
]);

export const portSchema = z
  .object({
    id,
    name,
    role: z.enum(PORT_ROLES),
    speedGbps: z.union(PORT_SPEEDS.map((speed) => z.literal(speed))),
    connector: z.enum(CONNECTORS),
    networkId: id.optional(),
    address: addressSchema.optional(),
  })
  .strict();

/** Where a device sits: `ru` is the lowest unit it occupies, counted from the bottom, 1-based. */
export const placementSchema = z.object({ rackId: id, ru: units, heightU: units.optional() }).strict();

/** One power supply of a device, optionally on a feed. */
export const psuSchema = z.object({ id, name, feedId: id.optional() }).strict();

const psus = z.array(psuSchema).optional();
const placement = placementSchema.optional();

export const controllerSchema = z.object({ id, name, iqn, ports: z.array(portSchema) }).strict();
export const adapterSchema = z.object({ id, name, ports: z.array(portSchema) }).strict();

export const arraySchema = z
  .object({
    id,
    kind: z.literal('array'),
    name,
    iqn,
    controllers: z.array(controllerSchema).min(1).max(4),
    placement,
    psus,
  })
  .strict();

export const switchSchema = z
  .object({
    id,
    kind: z.literal('switch'),
    name,
    role: z.enum(SWITCH_ROLES),
    ports: z.array(portSchema),
    placement,
    psus,
  })
  .strict();

export const hostSchema = z
  .object({
    id,
    kind: z.literal('host'),
    name,
    iqn,
    adapters: z.array(adapterSchema),
    placement,
    psus,
  })
  .strict();

export const deviceSchema = z.discriminatedUnion('kind', [arraySchema, switchSchema, hostSchema]);

export const cableSchema = z
  .object({
    id,
    label: z.string().max(100).optional(),
    a: id,
    b: id,
    media: z.enum(MEDIA),
    lengthM: z.number().positive().max(100000).optional(),
  })
  .strict();

export const networkSchema = z
  .object({
    id,
    name,
    purpose: z.enum(NETWORK_PURPOSES),
    cidr: z.string().refine(isValidCidr, 'is not a CIDR block such as 198.51.100.0/24 or 2001:db8::/64'),
    vlan: z.number().int().optional(),
    mtu: z.number().int().optional(),
    gateway: z.string().refine(isValidIp, 'is not an IPv4 or IPv6 address').optional(),
  })
  .strict();

export const positionSchema = z.object({ x: z.number(), y: z.number() }).strict();

/** Distances of the room, for cable-length estimates; each one falls back to DEFAULT_SITE. */
export const siteSchema = z
  .object({
    rackPitchMm: z.number().positive().max(1_000_000).optional(),
    rowPitchMm: z.number().positive().max(1_000_000).optional(),
    slackM: z.number().min(0).max(1000).optional(),
  })
  .strict();

export const rackSchema = z
  .object({
    id,
    /** The identifier printed on labels, e.g. `A01`. */
    name,
    row: z.string().max(100, 'must be at most 100 characters').optional(),
    position: z.number().int().min(1).max(100_000).optional(),
    heightU: units.optional(),
  })
  .strict();

export const powerFeedSchema = z.object({ id, name }).strict();

export const topologySchema = z
  .object({
    format: z.literal(TOPOLOGY_FORMAT),
    name,
    site: siteSchema.optional(),
    racks: z.array(rackSchema).optional(),
    powerFeeds: z.array(powerFeedSchema).optional(),
    devices: z.array(deviceSchema),
    cables: z.array(cableSchema),
    networks: z.array(networkSchema),
    security: z.object({ chap: z.enum(CHAP_MODES) }).strict().optional(),
    layout: z.record(z.string(), positionSchema).optional(),
  })
  .strict();

export type Topology = z.infer<typeof topologySchema>;
export type Device = z.infer<typeof deviceSchema>;
export type ArrayDevice = z.infer<typeof arraySchema>;
export type SwitchDevice = z.infer<typeof switchSchema>;
export type HostDevice = z.infer<typeof hostSchema>;
export type Controller = z.infer<typeof controllerSchema>;
export type Adapter = z.infer<typeof adapterSchema>;
export type Port = z.infer<typeof portSchema>;
export type Cable = z.infer<typeof cableSchema>;
export type Network = z.infer<typeof networkSchema>;
export type Address = z.infer<typeof addressSchema>;
export type Position = z.infer<typeof positionSchema>;
export type Site = z.infer<typeof siteSchema>;
export type Rack = z.infer<typeof rackSchema>;
export type PowerFeed = z.infer<typeof powerFeedSchema>;
export type Placement = z.infer<typeof placementSchema>;
export type Psu = z.infer<typeof psuSchema>;
