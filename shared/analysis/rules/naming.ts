import { nameOf, type AnalysisContext } from '@/shared/analysis/context';
import { displayName } from '@/shared/topology/index';
import type { Finding } from '@/shared/analysis/types';
import { checkIscsiName } from '@/shared/rules/iqn';

/**
 * Initiator and target names (RFC 7143 §4.2.7) and CHAP. Duplicates compare after case folding,
 * because iSCSI names are case-insensitive; two hosts with one name confuse every target's access
 * lists, and an iSCSI name names one node: two arrays, or a host and an array, may not share one.
 * The controllers of one array may repeat the array's name (one target, several portals).
 */
function hasDataPorts(adapters: { ports: { role: string }[] }[]): boolean {
  return adapters.some((a) => a.ports.some((p) => p.role === 'data'));
}

type Holder = { subject: string; device: string; role: 'initiator' | 'target' };

function invalidName(subject: string, what: string, name: string, reason: string): Finding {
  return { rule: 'iqn-invalid', severity: 'error', subjects: [subject], message: `The ${what} "${name}" is not a valid iSCSI name: ${reason}.` };
}

/** A holder of a name as a designer reads it: "wms-db-1", "vault-1 (target)", "ctl-a of vault-1 (target)". */
function holderWords(ctx: AnalysisContext, holder: Holder): string {
  if (holder.role === 'initiator') return nameOf(ctx, holder.device);
  const controller = ctx.index.controllers.get(holder.subject);
  return controller ? `${displayName(controller.controller)} of ${nameOf(ctx, holder.device)} (target)` : `${nameOf(ctx, holder.device)} (target)`;
}

export function namingFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  const byName = new Map<string, Holder[]>();
  const hold = (folded: string, holder: Holder) => {
    const holders = byName.get(folded);
    if (holders) holders.push(holder);
    else byName.set(folded, [holder]);
  };
  for (const device of ctx.doc.devices) {
    if (device.kind === 'array') {
      // Target names (format 2): on the array, and a controller may carry its own instead.
      const names: { subject: string; iqn: string; words: string }[] = [];
      if (device.iqn) names.push({ subject: device.id, iqn: device.iqn, words: `target name of ${nameOf(ctx, device.id)}` });
      for (const controller of device.controllers) {
        if (controller.iqn) names.push({ subject: controller.id, iqn: controller.iqn, words: `target name of ${displayName(controller)} of ${nameOf(ctx, device.id)}` });
      }
      const own = new Set<string>();
      for (const name of names) {
        const check = checkIscsiName(name.iqn);
        if (!check.ok) {
          out.push(invalidName(name.subject, name.words, name.iqn, check.reason));
          continue;
        }
        // One array's controllers may repeat its own name: it is still one target.
        if (own.has(check.folded)) continue;
        own.add(check.folded);
        hold(check.folded, { subject: name.subject, device: device.id, role: 'target' });
      }
      continue;
    }
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
      out.push(invalidName(device.id, `initiator name of ${host}`, device.iqn, check.reason));
      continue;
    }
    hold(check.folded, { subject: device.id, device: device.id, role: 'initiator' });
  }
  for (const [name, holders] of byName) {
    if (holders.length < 2) continue;
    const targets = holders.some((h) => h.role === 'target');
    const initiators = holders.some((h) => h.role === 'initiator');
    const need = initiators && targets ? 'every initiator and every target needs a name of its own' : targets ? 'each array needs a target name of its own' : 'each host needs its own';
    out.push({
      rule: 'iqn-duplicate',
      severity: 'error',
      subjects: holders.map((h) => h.subject),
      message: `${holders.map((h) => holderWords(ctx, h)).join(' and ')} share the ${targets && !initiators ? 'target' : initiators && !targets ? 'initiator' : 'iSCSI'} name ${name}; ${need}.`,
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
