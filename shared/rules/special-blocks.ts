/**
 * Address blocks that are not an ordinary storage subnet, each with the document that sets it
 * aside (the IANA special-purpose registries, RFC 6890). `use` decides the finding:
 *   unusable      — no host may be given such an address on a link (error)
 *   special       — set aside for another purpose; works on a lab bench, not in a server room (warning)
 *   documentation — reserved for examples such as Cablewright's demo (info)
 *   private       — meant for sites' own networks: nothing to say
 * A block outside every entry of its family is public unicast (warning: a site may own it, but
 * storage traffic is normally kept on private addresses).
 */
export type BlockUse = 'unusable' | 'special' | 'documentation' | 'private';
export type SpecialBlock = { cidr: string; what: string; use: BlockUse; source: string };

export const SPECIAL_BLOCKS: readonly SpecialBlock[] = [
  { cidr: '0.0.0.0/8', what: '"this network" block (its addresses mean "unspecified")', use: 'unusable', source: 'RFC 1122 §3.2.1.3; RFC 6890' },
  { cidr: '127.0.0.0/8', what: 'loopback block', use: 'unusable', source: 'RFC 1122 §3.2.1.3; RFC 6890' },
  { cidr: '224.0.0.0/4', what: 'multicast block', use: 'unusable', source: 'RFC 5771' },
  { cidr: '240.0.0.0/4', what: 'reserved block (with the limited broadcast address)', use: 'unusable', source: 'RFC 1112 §4; RFC 6890' },
  { cidr: '::/128', what: 'unspecified address', use: 'unusable', source: 'RFC 4291 §2.5.2' },
  { cidr: '::1/128', what: 'loopback address', use: 'unusable', source: 'RFC 4291 §2.5.3' },
  { cidr: 'ff00::/8', what: 'multicast block', use: 'unusable', source: 'RFC 4291 §2.7' },
  { cidr: '100.64.0.0/10', what: 'shared address space of carrier-grade NAT', use: 'special', source: 'RFC 6598' },
  { cidr: '192.0.0.0/24', what: 'IETF protocol assignments block', use: 'special', source: 'RFC 6890 §2.2.2' },
  { cidr: '198.18.0.0/15', what: 'benchmarking block', use: 'special', source: 'RFC 2544; RFC 6890' },
  { cidr: '192.0.2.0/24', what: 'documentation block TEST-NET-1', use: 'documentation', source: 'RFC 5737 §3' },
  { cidr: '198.51.100.0/24', what: 'documentation block TEST-NET-2', use: 'documentation', source: 'RFC 5737 §3' },
  { cidr: '203.0.113.0/24', what: 'documentation block TEST-NET-3', use: 'documentation', source: 'RFC 5737 §3' },
  { cidr: '2001:db8::/32', what: 'IPv6 documentation block', use: 'documentation', source: 'RFC 3849' },
  { cidr: '10.0.0.0/8', what: 'private block', use: 'private', source: 'RFC 1918 §3' },
  { cidr: '172.16.0.0/12', what: 'private block', use: 'private', source: 'RFC 1918 §3' },
  { cidr: '192.168.0.0/16', what: 'private block', use: 'private', source: 'RFC 1918 §3' },
  { cidr: 'fc00::/7', what: 'unique local block', use: 'private', source: 'RFC 4193 §3.1' },
  // Link-local blocks have their own rule (network-link-local); here they only stop the "public" verdict.
  { cidr: '169.254.0.0/16', what: 'link-local block', use: 'private', source: 'RFC 3927 §2.1' },
  { cidr: 'fe80::/10', what: 'link-local block', use: 'private', source: 'RFC 4291 §2.5.6' },
];

/** IPv6 global unicast (RFC 4291 §2.4): outside it and the blocks above, IPv6 space is reserved by the IETF. */
export const IPV6_GLOBAL_UNICAST = { cidr: '2000::/3', source: 'RFC 4291 §2.4' } as const;
