import type { RuleId } from '@/shared/analysis/rules';

/**
 * What each finding is called on screen: a few words a designer or reviewer reads first. The rule
 * id stays beside it only as a small code (for searching, and for the command line's JSON).
 */
export const RULE_TITLES: Record<RuleId, string> = {
  'single-point-of-failure': 'Single point of failure',
  'host-unreachable': 'Host reaches no storage',
  'one-controller-only': 'Only one controller reached',
  'management-port-on-data-switch': 'Management port on a data switch',
  'data-port-on-management-switch': 'Data port on the management switch',
  'management-data-bridge': 'Management switch joined to the storage fabric',
  'shared-switch-in-use': 'Shared switch carries management and data',
  'network-overlap': 'Overlapping networks',
  'cidr-host-bits': 'Subnet written with host bits',
  'network-link-local': 'Link-local subnet',
  'management-data-same-subnet': 'Management and data share a subnet',
  'management-data-same-vlan': 'Management and data share a VLAN',
  'network-unusable': 'Subnet no port can use',
  'network-special-use': 'Subnet set aside for another use',
  'network-public': 'Public address space',
  'network-documentation': 'Example addresses',
  'address-outside-network': 'Address outside its network',
  'address-duplicate': 'Address used twice',
  'address-reserved': 'Reserved address',
  'vlan-out-of-range': 'VLAN ID out of range',
  'mtu-out-of-range': 'MTU out of range',
  'mtu-mismatch': 'MTUs differ along a path',
  'port-unaddressed': 'Cabled port without an address',
  'target-address-dhcp': 'Target port on DHCP',
  'direct-attach-shared-subnet': 'Direct-attach links share a subnet',
  'port-double-cabled': 'Port cabled twice',
  'connector-mismatch': 'Connectors do not match',
  'speed-mismatch': 'Port speeds differ',
  'media-unsuited': 'Cable cannot carry the speed',
  'cable-too-long': 'Cable too long',
  'cable-unmeasured': 'Cable length not set',
  'cable-between-endpoints': 'Cable between two endpoints',
  'port-role-mismatch': 'Port roles do not match',
  'iqn-invalid': 'Invalid iSCSI name',
  'iqn-duplicate': 'Initiator name used twice',
  'iqn-missing': 'No initiator name yet',
  'chap-off': 'CHAP is off',
  'device-name-duplicate': 'Two devices with one name',
  'part-name-duplicate': 'Two cards or controllers with one name',
  'port-name-duplicate': 'Two ports with one name',
  'rack-units-overlap': 'Two devices in the same rack units',
  'device-above-rack-top': 'Device above the top of its rack',
  'cable-shorter-than-estimate': 'Cable shorter than the run it needs',
  'cable-estimate-beyond-reach': 'Run longer than the media can carry',
  'psu-no-feed': 'Power supply on no feed',
  'psus-one-feed': 'Every power supply on one feed',
};

// Looked up through a Map: a rule id comes with a report, and "constructor" must not find Object's.
const BY_RULE: ReadonlyMap<string, string> = new Map(Object.entries(RULE_TITLES));

/** A finding's title; a rule this build does not know (a newer server) reads as its id. */
export function ruleTitle(rule: string): string {
  return BY_RULE.get(rule) ?? rule;
}
