import type { Finding, Report } from '@/shared/analysis/types';
import { bringUpSteps, type Step } from '@/shared/build';
import { loginPlan, type LoginPlan } from '@/shared/handover/login-plan';
import { rackContents } from '@/shared/racks/occupancy';
import { rackHeightU } from '@/shared/racks/geometry';
import { cableSchedule } from '@/shared/schedule';
import type { ScheduleEnd } from '@/shared/schedule/types';
import { addressTable, type Cell } from '@/shared/schedule/tables';
import { displayName } from '@/shared/topology/index';
import type { ChapMode, Topology } from '@/shared/topology/schema';

/**
 * The handover pack of one version as plain data: what the customer's team needs to run the
 * network for years. The PDF (server/services/handover) and the printable page draw the same pack,
 * so they cannot disagree. Pure: no React, Express or Sequelize; the same inputs give the same pack.
 *
 * Sections, in order: cover (design, site, version, author, approval — or "not approved"), the
 * topology picture (drawn by the caller), rack elevations, the address worksheet, the cable schedule,
 * the login plan per host, CHAP mode (the mode only: secrets never appear in a document), the bring-up order, the safety
 * cautions and the open findings (errors and warnings) with the override comment of an approval
 * given over errors.
 */
export type HandoverApproval = { by: string; at: string; comment: string | null; override: boolean };

export type HandoverMeta = {
  design: string;
  site: string | null;
  version: number;
  /** The version's message (what changed). */
  message: string;
  author: string;
  savedAt: string;
  /** The latest approval of the version, or null: the version is not approved. */
  approval: HandoverApproval | null;
};

export type PackTable = { header: readonly string[]; rows: string[][] };

export type RackElevation = { rack: string; row: string | null; heightU: number; units: { units: string; device: string }[] };

export type HandoverPack = {
  meta: HandoverMeta;
  /** "Version 2 · approved 2026-11-30" or "Version 3 · not approved"; printed on every page. */
  stamp: string;
  approved: boolean;
  racks: RackElevation[];
  addresses: PackTable;
  cables: PackTable;
  /** Per host: each data port and the target portals and names it logs in to (shared/handover/login-plan.ts). */
  loginPlan: LoginPlan;
  chap: { mode: ChapMode; text: string };
  steps: Step[];
  cautions: Step[];
  findings: Finding[];
};

export const NOT_APPROVED = 'not approved';

/** Dates on paper read the same everywhere: the ISO calendar date in UTC. */
export function paperDate(iso: string): string {
  return iso.slice(0, 10);
}

export function packStamp(meta: Pick<HandoverMeta, 'version' | 'approval'>): string {
  return meta.approval ? `Version ${meta.version} · approved ${paperDate(meta.approval.at)}` : `Version ${meta.version} · ${NOT_APPROVED}`;
}

const CHAP_TEXT: Record<ChapMode, string> = {
  none: 'No CHAP: initiators log in without authentication (RFC 7143 §12.1 AuthMethod=None). Keep the storage networks isolated.',
  'one-way': 'One-way CHAP: each target checks its initiator\u2019s secret (RFC 7143 §12.1.3). The secrets are not printed here; an admin or installer reveals them in the app.',
  mutual: 'Mutual CHAP: each target checks the initiator and each initiator checks the target, with a different secret per direction (RFC 7143 §12.1.3). The secrets are not printed here; an admin or installer reveals them in the app.',
};

const text = (cell: Cell): string => (cell === null ? '' : String(cell));

function endText(end: ScheduleEnd): string {
  const where = [end.device, end.part, end.port].filter((p) => p !== null && p !== '').join(' ');
  const place = end.rack ? ` (${end.rack}${end.ru === null ? '' : ` U${end.ru}`})` : '';
  return where + place;
}

export function rackElevations(doc: Topology): RackElevation[] {
  return rackContents(doc).map(({ rack, occupants }) => ({
    rack: displayName(rack),
    row: rack.row ?? null,
    heightU: rackHeightU(rack),
    units: [...occupants]
      .sort((a, b) => b.top - a.top)
      .map((o) => ({ units: o.top === o.bottom ? `U${o.bottom}` : `U${o.bottom}\u2013U${o.top}`, device: displayName(o.device) })),
  }));
}

export function handoverPack(doc: Topology, report: Report, meta: HandoverMeta): HandoverPack {
  const schedule = cableSchedule(doc);
  const addresses = addressTable(doc);
  const addressCols = [0, 1, 2, 4, 5, 6, 7, 8, 9];
  const steps = bringUpSteps(doc, report);
  const mode = doc.security?.chap ?? 'none';
  return {
    meta,
    stamp: packStamp(meta),
    approved: meta.approval !== null,
    racks: rackElevations(doc),
    addresses: {
      header: ['Device', 'Part', 'Port', 'Network', 'Subnet', 'VLAN', 'MTU', 'Address', 'Gateway'],
      rows: addresses.rows.map((row) => addressCols.map((i) => text(row[i]))),
    },
    cables: {
      header: ['Label', 'From', 'To', 'Media', 'Length', 'Network'],
      rows: schedule.cables.map((c) => [
        c.label,
        endText(c.a),
        endText(c.b),
        c.media,
        c.lengthM === null ? (c.estimatedLengthM === null ? '' : `~${c.estimatedLengthM} m`) : `${c.lengthM} m`,
        [c.network, c.vlan === null ? null : `VLAN ${c.vlan}`].filter(Boolean).join(' · '),
      ]),
    },
    loginPlan: loginPlan(doc),
    chap: { mode, text: CHAP_TEXT[mode] },
    steps: steps.filter((s) => !s.caution),
    cautions: steps.filter((s) => s.caution),
    findings: report.findings.filter((f) => f.severity !== 'info'),
  };
}
