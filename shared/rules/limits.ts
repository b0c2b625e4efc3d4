import type { Media, PortSpeed } from '@/shared/topology/schema';

/**
 * Every numeric limit the design rules use, in one table, each with its published source. Where no
 * standard sets a value it says "common practice"; clause numbers recalled rather than read say
 * "from memory". The tests assert these values against the same sources.
 */
export type Limit = { value: number; unit: string; source: string };

export const LIMITS = {
  vlanMin: { value: 1, unit: 'VLAN id', source: 'IEEE 802.1Q (0 and 4095 are reserved)' },
  vlanMax: { value: 4094, unit: 'VLAN id', source: 'IEEE 802.1Q (0 and 4095 are reserved)' },
  mtuDefault: { value: 1500, unit: 'bytes', source: 'RFC 894 (erratum 570): Ethernet MTU 1500' },
  mtuMin: { value: 576, unit: 'bytes', source: 'RFC 791 §3.1: every host must accept 576-byte datagrams' },
  mtuMinIpv6: { value: 1280, unit: 'bytes', source: 'RFC 8200 §5: every IPv6 link has an MTU of at least 1280' },
  mtuMax: { value: 9216, unit: 'bytes', source: 'common practice: the largest jumbo frame switches accept' },
  iscsiNameMaxBytes: { value: 223, unit: 'bytes of UTF-8', source: 'RFC 7143 §4.2.7.1' },
  chapSecretMinBytes: { value: 12, unit: 'bytes', source: 'RFC 7143 §9.2.1: under 96 bits needs IPsec' },
  chapSecretGenerateBytes: { value: 16, unit: 'bytes', source: 'RFC 1994 §2.3 prefers at least 16 octets' },
  iscsiTcpPort: { value: 3260, unit: 'TCP port', source: 'RFC 7143 §15' },
  rackUnitMm: { value: 44.45, unit: 'mm', source: 'EIA-310-D / IEC 60297: 1U = 1.75 in' },
} as const satisfies Record<string, Limit>;

/** Link-local ranges: addresses a host gives itself when nothing else is set; no place for a storage subnet. */
export const LINK_LOCAL_RANGES = [
  { cidr: '169.254.0.0/16', source: 'RFC 3927 §2.1' },
  { cidr: 'fe80::/10', source: 'RFC 4291 §2.5.6' },
] as const;

/** The reach of one medium at one link speed. */
export type Reach = { media: Media; speedGbps: PortSpeed; maxM: number; source: string };

/**
 * What each medium carries and how far. A (media, speed) pair not listed here cannot carry that
 * speed at all (media-unsuited); a cable longer than maxM is cable-too-long. Copper reaches are
 * channel lengths: 100 m = 90 m permanent link + 10 m of cords (ANSI/TIA-568).
 */
export const REACH: readonly Reach[] = [
  { media: 'cat5e', speedGbps: 1, maxM: 100, source: 'IEEE 802.3 clause 40, 1000BASE-T; clause number from memory' },
  { media: 'cat5e', speedGbps: 2.5, maxM: 100, source: 'IEEE 802.3bz clause 126, 2.5GBASE-T; secondary source' },
  { media: 'cat5e', speedGbps: 5, maxM: 100, source: 'IEEE 802.3bz clause 126, 5GBASE-T; secondary source, and some guides ask Category 6 for 5G' },
  { media: 'cat6', speedGbps: 1, maxM: 100, source: 'IEEE 802.3 clause 40; Category 5e or better' },
  { media: 'cat6', speedGbps: 2.5, maxM: 100, source: 'IEEE 802.3bz clause 126; secondary source' },
  { media: 'cat6', speedGbps: 5, maxM: 100, source: 'IEEE 802.3bz clause 126; secondary source' },
  { media: 'cat6', speedGbps: 10, maxM: 55, source: 'IEEE 802.3an clause 55; TIA TSB-155; unshielded, and alien crosstalk may cut it' },
  { media: 'cat6a', speedGbps: 1, maxM: 100, source: 'IEEE 802.3 clause 40; Category 5e or better' },
  { media: 'cat6a', speedGbps: 2.5, maxM: 100, source: 'IEEE 802.3bz clause 126; secondary source' },
  { media: 'cat6a', speedGbps: 5, maxM: 100, source: 'IEEE 802.3bz clause 126; secondary source' },
  { media: 'cat6a', speedGbps: 10, maxM: 100, source: 'IEEE 802.3an clause 55, 10GBASE-T on Category 6A' },
  { media: 'om3', speedGbps: 1, maxM: 550, source: 'IEEE 802.3z clause 38, 1000BASE-SX; from memory' },
  { media: 'om4', speedGbps: 1, maxM: 550, source: 'IEEE 802.3z clause 38, 1000BASE-SX; from memory' },
  { media: 'om3', speedGbps: 10, maxM: 300, source: 'IEEE 802.3ae / 802.3-2012, 10GBASE-SR' },
  { media: 'om4', speedGbps: 10, maxM: 400, source: 'IEEE 802.3ae / 802.3-2012, 10GBASE-SR' },
  { media: 'om3', speedGbps: 25, maxM: 70, source: 'IEEE 802.3by clause 112, 25GBASE-SR' },
  { media: 'om4', speedGbps: 25, maxM: 100, source: 'IEEE 802.3by clause 112, 25GBASE-SR' },
  { media: 'om3', speedGbps: 40, maxM: 100, source: 'IEEE 802.3ba clause 86, 40GBASE-SR4; from memory' },
  { media: 'om4', speedGbps: 40, maxM: 150, source: 'IEEE 802.3ba clause 86, 40GBASE-SR4; from memory' },
  { media: 'om3', speedGbps: 50, maxM: 70, source: 'IEEE 802.3cd, 50GBASE-SR; from memory' },
  { media: 'om4', speedGbps: 50, maxM: 100, source: 'IEEE 802.3cd, 50GBASE-SR; from memory' },
  { media: 'om3', speedGbps: 100, maxM: 70, source: 'IEEE 802.3bm clause 95, 100GBASE-SR4; from memory' },
  { media: 'om4', speedGbps: 100, maxM: 100, source: 'IEEE 802.3bm clause 95, 100GBASE-SR4; from memory' },
  { media: 'dac', speedGbps: 10, maxM: 7, source: 'SFF-8431 appendix E, passive SFP+ direct attach; common practice for the limit' },
  { media: 'dac', speedGbps: 25, maxM: 5, source: 'IEEE 802.3by clause 110, 25GBASE-CR; from memory' },
  { media: 'dac', speedGbps: 40, maxM: 7, source: 'IEEE 802.3ba clause 85, 40GBASE-CR4; from memory' },
  { media: 'dac', speedGbps: 50, maxM: 3, source: 'IEEE 802.3cd clause 136, 50GBASE-CR; from memory' },
  { media: 'dac', speedGbps: 100, maxM: 5, source: 'IEEE 802.3bj clause 92, 100GBASE-CR4; from memory' },
  { media: 'aoc', speedGbps: 10, maxM: 100, source: 'common practice: active optical reach is set by the product' },
  { media: 'aoc', speedGbps: 25, maxM: 100, source: 'common practice: active optical reach is set by the product' },
  { media: 'aoc', speedGbps: 40, maxM: 100, source: 'common practice: active optical reach is set by the product' },
  { media: 'aoc', speedGbps: 50, maxM: 100, source: 'common practice: active optical reach is set by the product' },
  { media: 'aoc', speedGbps: 100, maxM: 100, source: 'common practice: active optical reach is set by the product' },
];

/** Twisted-pair media end in RJ45; fibre, direct-attach copper and active optical cables in SFP cages. */
export const MEDIA_CONNECTOR: Record<Media, 'rj45' | 'sfp'> = {
  cat5e: 'rj45',
  cat6: 'rj45',
  cat6a: 'rj45',
  om3: 'sfp',
  om4: 'sfp',
  dac: 'sfp',
  aoc: 'sfp',
};
