import { MEDIA_NAMES } from '@/shared/rules/cables';
import { endIdentifier } from '@/shared/schedule/identifier';
import type { ScheduleRow } from '@/shared/schedule/types';
import type { Media } from '@/shared/topology/schema';

/**
 * What a printed cable label holds, one label per cable end (both ends carry the same identifier,
 * as ANSI/TIA-606 asks, with the end it is stuck on named first in `here`): the identifier, the
 * printed label, media and length, and the app address of the cable's detail for the QR code,
 * so a phone camera opens that cable's row.
 */
export type LabelWhere = { appUrl: string; designId: number | string; version: number };

export type CableEndLabel = {
  cableId: string;
  /** Which end of the schedule row this label goes on: `a` (near) or `b` (far). */
  end: 'a' | 'b';
  label: string;
  /** The full near/far identifier. */
  identifier: string;
  /** This end's part of the identifier, and the other end's. */
  here: string;
  there: string;
  media: Media;
  /** "Category 6A". */
  mediaName: string;
  /** The chosen length, else the stock length to take; null when neither is known. */
  lengthM: number | null;
  /** "3 m", "0.5 m", or "length not set". */
  lengthText: string;
  /** The cable's detail page in the app, for the QR code. */
  url: string;
};

/** `${APP_URL}/designs/:id/versions/:n/cables/:cableId`, ids percent-encoded (RFC 3986 §2.1). */
export function cableDetailUrl(where: LabelWhere, cableId: string): string {
  const base = where.appUrl.replace(/\/+$/, '');
  return `${base}/designs/${encodeURIComponent(String(where.designId))}/versions/${encodeURIComponent(String(where.version))}/cables/${encodeURIComponent(cableId)}`;
}

export function lengthText(metres: number | null): string {
  return metres === null ? 'length not set' : `${metres} m`;
}

/** The two labels of one cable: near end first. */
export function cableEndLabels(row: ScheduleRow, where: LabelWhere): [CableEndLabel, CableEndLabel] {
  const near = endIdentifier(row.a);
  const far = endIdentifier(row.b);
  const lengthM = row.lengthM ?? row.stockLengthM;
  const common = {
    cableId: row.id,
    label: row.label,
    identifier: row.identifier,
    media: row.media,
    mediaName: MEDIA_NAMES[row.media],
    lengthM,
    lengthText: lengthText(lengthM),
    url: cableDetailUrl(where, row.id),
  };
  return [
    { ...common, end: 'a', here: near, there: far },
    { ...common, end: 'b', here: far, there: near },
  ];
}

/** Every label of a schedule, in the schedule's order, both ends of a cable together. */
export function labelSheet(rows: readonly ScheduleRow[], where: LabelWhere): CableEndLabel[] {
  return rows.flatMap((row) => cableEndLabels(row, where));
}
