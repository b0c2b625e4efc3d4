import type { Media } from '@/shared/topology/schema';

/**
 * The cable schedule as docs/api.md's `GET …/versions/:n/cables` answers it. Plain JSON: every absent
 * value is null, so the same rows go over the wire, into CSV and into the spreadsheet.
 */
export type ScheduleEnd = {
  deviceId: string;
  /** The device's name (its id when the name is empty). */
  device: string;
  /** The controller or card holding the port; null on a switch. */
  part: string | null;
  port: string;
  /** The rack's name, as printed on labels (e.g. `A01`); null when the device is not placed. */
  rack: string | null;
  /** The lowest unit the device fills; null when it is not placed. */
  ru: number | null;
};

export type ScheduleRow = {
  id: string;
  /** The cable's printed label; the cable id when it has none. */
  label: string;
  /** ANSI/TIA-606 style `near/far`, each end `rack-RU:port` (e.g. `A01-40:12/A01-07:card-1.1`). */
  identifier: string;
  /** Near end (the network side: switch, then array, then host) and far end. */
  a: ScheduleEnd;
  b: ScheduleEnd;
  media: Media;
  /** The length the designer chose; null when none is set. */
  lengthM: number | null;
  /** From rack positions (shared/schedule/length.ts); null when an end is unplaced. */
  estimatedLengthM: number | null;
  /** The stock patch cord to take: the chosen length, else the estimate, rounded up; null past 50 m. */
  stockLengthM: number | null;
  /** The storage or management network the cable carries (its host or controller end's); null between switches. */
  network: string | null;
  vlan: number | null;
};

/** Materials: how many cords of each media and stock length (null stock: no length known, or longer than stock). */
export type ScheduleTotal = { media: Media; stockLengthM: number | null; count: number };

export type CableSchedule = { cables: ScheduleRow[]; totals: ScheduleTotal[] };
