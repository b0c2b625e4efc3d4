import type { AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import type { Device } from '@/shared/topology/schema';
import { displayName } from '@/shared/topology/index';

/**
 * Names an installer reads on the cable list and the labels: two devices, two cards of one host (or
 * two controllers of one array), or two ports side by side with one name give two identical cable
 * ends. Names compare trimmed and case-folded, since a label printed in capitals reads the same
 * (common practice). Two devices with one name are an error; the rest are warnings, because the
 * device name still tells most of the end apart.
 */
const key = (name: string) => name.trim().toLowerCase();

/** Items grouped by folded name, only the groups with two or more, in first-seen order. */
function clashes<T>(items: readonly T[], nameOf: (item: T) => string): T[][] {
  const groups = new Map<string, T[]>();
  for (const item of items) {
    const k = key(nameOf(item));
    if (k === '') continue;
    const list = groups.get(k);
    if (list) list.push(item);
    else groups.set(k, [item]);
  }
  return [...groups.values()].filter((list) => list.length > 1);
}

function groupsOf(device: Device): { id: string; name: string; ports: { id: string; name: string }[] }[] {
  return device.kind === 'array' ? device.controllers : device.kind === 'host' ? device.adapters : [];
}

function partFindings(device: Device, out: Finding[]): void {
  const groups = groupsOf(device);
  const partWord = device.kind === 'array' ? 'controllers' : 'cards';
  for (const same of clashes(groups, (g) => g.name)) {
    out.push({
      rule: 'part-name-duplicate',
      severity: 'warning',
      subjects: same.map((g) => g.id),
      message: `${displayName(device)} has ${same.length} ${partWord} named "${same[0].name.trim()}"; the cable list would show their ports alike. Rename one.`,
    });
  }
  const portGroups = device.kind === 'switch' ? [{ name: '', ports: device.ports }] : groups;
  for (const group of portGroups) {
    for (const same of clashes(group.ports, (p) => p.name)) {
      const where = group.name ? `${displayName(device)} ${group.name}` : displayName(device);
      out.push({
        rule: 'port-name-duplicate',
        severity: 'warning',
        subjects: same.map((p) => p.id),
        message: `${where} has ${same.length} ports named "${same[0].name.trim()}"; their cables would have identical ends on the cable list. Rename one.`,
      });
    }
  }
}

export function duplicateNameFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const same of clashes(ctx.doc.devices, (d) => d.name)) {
    out.push({
      rule: 'device-name-duplicate',
      severity: 'error',
      subjects: same.map((d) => d.id),
      message: `${same.length} devices are named "${same[0].name.trim()}"; the cable list and the labels would show identical ends. Give each device its own name.`,
    });
  }
  for (const device of ctx.doc.devices) partFindings(device, out);
  return out;
}
