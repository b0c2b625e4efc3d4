import type { ChapMode, Connector, Media, PortSpeed } from '@/shared/topology/schema';

/** Options every pattern takes. Everything has a default, so `dualFabric({})` is a complete design. */
export type NetworkPlan = { name?: string; cidr: string; vlan?: number; mtu?: number; gateway?: string };

export type PatternOptions = {
  name?: string;
  /** A host count (hosts named host-1, host-2, …) or the host names themselves. */
  hosts?: number | string[];
  cardsPerHost?: number;
  portsPerCard?: number;
  speedGbps?: PortSpeed;
  connector?: Connector;
  /** Cable media for data links; by default Category 6A for RJ45 and direct-attach copper for SFP. */
  media?: Media;
  arrayName?: string;
  controllers?: number;
  /** Data ports per controller; by default just enough for the pattern. */
  controllerPorts?: number;
  /**
   * Host initiator names become `<iqnPrefix>:<host name>`, e.g. iqn.2026-01.example.tidewater, and
   * the array's target name `<iqnPrefix>:storage.<array name>`.
   */
  iqnPrefix?: string;
  chap?: ChapMode;
  /** Put static addresses on every port that has a network (default true). */
  assignAddresses?: boolean;
  /** Prefix of printed cable labels, e.g. "HR-" gives HR-A-01. */
  labelPrefix?: string;
  /** Length of each host cable in metres; controller and inter-switch cables get 3 m. */
  hostCableLengthM?: (hostIndex: number) => number;
};

export type FabricOptions = PatternOptions & {
  switchNames?: [string, string];
  networks?: { a?: Partial<NetworkPlan>; b?: Partial<NetworkPlan> };
};

export type ManagedFabricOptions = FabricOptions & {
  managementSwitchName?: string;
  management?: Partial<NetworkPlan>;
};

export const DEFAULTS = {
  cardsPerHost: 2,
  portsPerCard: 2,
  speedGbps: 10 as PortSpeed,
  connector: 'rj45' as Connector,
  arrayName: 'array-1',
  controllers: 2,
  // RFC 5737 documentation ranges; VLAN and MTU values are common practice for storage fabrics.
  fabricA: { name: 'fabric A', cidr: '198.51.100.0/24', vlan: 110, mtu: 9000 },
  fabricB: { name: 'fabric B', cidr: '203.0.113.0/24', vlan: 120, mtu: 9000 },
  management: { name: 'management', cidr: '192.0.2.0/24', vlan: 10, mtu: 1500, gateway: '192.0.2.1' },
};

export function hostNames(hosts: PatternOptions['hosts']): string[] {
  if (Array.isArray(hosts)) return hosts;
  return Array.from({ length: hosts ?? 4 }, (_, i) => `host-${i + 1}`);
}

export function dataMedia(options: PatternOptions): Media {
  if (options.media) return options.media;
  return (options.connector ?? DEFAULTS.connector) === 'sfp' ? 'dac' : 'cat6a';
}

/** "ctl-a", "ctl-b", …: controller names by letter. */
export function controllerName(index: number): string {
  return `ctl-${String.fromCharCode(97 + index)}`;
}

