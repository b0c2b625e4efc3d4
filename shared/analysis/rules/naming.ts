import { nameOf, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { checkIscsiName } from '@/shared/rules/iqn';

/**
 * Initiator names (RFC 7143 §4.2.7) and CHAP. Duplicates compare after case folding, because
 * iSCSI names are case-insensitive; two hosts with one name confuse every target's access lists.
 */
function hasDataPorts(adapters: { ports: { role: string }[] }[]): boolean {
  return adapters.some((a) => a.ports.some((p) => p.role === 'data'));
}

export function namingFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  const byName = new Map<string, string[]>();
  for (const device of ctx.doc.devices) {
    if (device.kind !== 'host') continue;
    const host = nameOf(ctx, device.id);
    if (device.iqn === undefined || device.iqn === '') {
      if (hasDataPorts(device.adapters)) {
        out.push({ rule: 'iqn-missing', severity: 'info', subjects: [device.id], message: `${host} has no initiator name yet.` });
      }
      continue;
    }
    const check = checkIscsiName(device.iqn);
    if (!check.ok) {
      out.push({
        rule: 'iqn-invalid',
        severity: 'error',
        subjects: [device.id],
        message: `The initiator name "${device.iqn}" of ${host} is not a valid iSCSI name: ${check.reason}.`,
      });
      continue;
    }
    const holders = byName.get(check.folded);
    if (holders) holders.push(device.id);
    else byName.set(check.folded, [device.id]);
  }
  for (const [name, hosts] of byName) {
    if (hosts.length < 2) continue;
    out.push({
      rule: 'iqn-duplicate',
      severity: 'error',
      subjects: hosts,
      message: `${hosts.map((h) => nameOf(ctx, h)).join(' and ')} share the initiator name ${name}; each host needs its own.`,
    });
  }
  if ((ctx.doc.security?.chap ?? 'none') === 'none') {
    out.push({
      rule: 'chap-off',
      severity: 'warning',
      subjects: [],
      message: 'CHAP is off: any initiator that presents an allowed initiator name can log in, because the name alone is trusted and is easy to claim. Turn on one-way or mutual CHAP.',
    });
  }
  return out;
}
