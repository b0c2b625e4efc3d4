import type { AnalysisContext } from '@/shared/analysis/context';
import { addressingFindings } from '@/shared/analysis/rules/addressing';
import { cablingFindings } from '@/shared/analysis/rules/cabling';
import { duplicateNameFindings } from '@/shared/analysis/rules/duplicate-names';
import { lengthFindings } from '@/shared/analysis/rules/lengths';
import { namingFindings } from '@/shared/analysis/rules/naming';
import { networkFindings } from '@/shared/analysis/rules/networks';
import { portalFindings } from '@/shared/analysis/rules/portals';
import { powerFindings } from '@/shared/analysis/rules/power';
import { rackFindings } from '@/shared/analysis/rules/racks';
import { separationFindings } from '@/shared/analysis/rules/separation';
import { specialBlockFindings } from '@/shared/analysis/rules/special-blocks';
import type { Finding } from '@/shared/analysis/types';

/** The design-rule groups that read the document itself (redundancy findings read hosts[] instead). */
export type RuleGroup = (ctx: AnalysisContext) => Finding[];

export const RULE_GROUPS: RuleGroup[] = [
  separationFindings,
  networkFindings,
  specialBlockFindings,
  addressingFindings,
  portalFindings,
  cablingFindings,
  namingFindings,
  duplicateNameFindings,
  rackFindings,
  lengthFindings,
  powerFindings,
];

/** Every rule id the analysis can report, with its severity — for filters and legends in the UI. */
export const RULES = {
  'single-point-of-failure': 'error',
  'host-unreachable': 'error',
  'one-controller-only': 'error',
  'management-port-on-data-switch': 'error',
  'data-port-on-management-switch': 'error',
  'management-data-bridge': 'error',
  'shared-switch-in-use': 'warning',
  'network-overlap': 'error',
  'cidr-host-bits': 'warning',
  'network-link-local': 'warning',
  'management-data-same-subnet': 'error',
  'management-data-same-vlan': 'error',
  'network-unusable': 'error',
  'network-special-use': 'warning',
  'network-public': 'warning',
  'network-documentation': 'info',
  'address-outside-network': 'error',
  'address-duplicate': 'error',
  'address-reserved': 'error',
  'vlan-out-of-range': 'error',
  'mtu-out-of-range': 'error',
  'mtu-mismatch': 'error',
  'port-unaddressed': 'warning',
  'target-address-dhcp': 'warning',
  'direct-attach-shared-subnet': 'warning',
  'port-double-cabled': 'error',
  'connector-mismatch': 'error',
  'speed-mismatch': 'warning',
  'media-unsuited': 'error',
  'cable-too-long': 'error',
  'cable-unmeasured': 'info',
  'cable-between-endpoints': 'warning',
  'port-role-mismatch': 'error',
  'iqn-invalid': 'error',
  'iqn-duplicate': 'error',
  'iqn-missing': 'info',
  'chap-off': 'warning',
  'rack-units-overlap': 'error',
  'device-above-rack-top': 'error',
  'cable-shorter-than-estimate': 'warning',
  'cable-estimate-beyond-reach': 'warning',
  'device-name-duplicate': 'error',
  'part-name-duplicate': 'warning',
  'port-name-duplicate': 'warning',
  'psu-no-feed': 'warning',
  'psus-one-feed': 'warning',
} as const;

export type RuleId = keyof typeof RULES;
