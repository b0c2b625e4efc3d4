import type { Device } from '@/shared/topology/schema';

/**
 * The shape of a diff between two versions' topology documents. Everything is plain JSON (no
 * undefined, no Maps), so the server can send it as is and the client can render it without
 * looking anything up: every entry already carries the names a person reads.
 */

/** A field's value as shown. An absent optional field is `null`. */
export type DiffValue = string | number | boolean | null;

export type FieldChange = { field: string; before: DiffValue; after: DiffValue };

/**
 * One added, removed or changed thing. For a changed thing `changes` lists the fields that differ;
 * for an added one every field it has (`before: null`), for a removed one every field it had
 * (`after: null`), so a reader sees what came or went without opening the other version.
 */
export type DiffEntry = { id: string; name: string; changes: FieldChange[] };

export type DeviceDiffEntry = DiffEntry & { kind: Device['kind'] };

/** A controller of an array or an adapter (card) of a host: the part a port hangs on. */
export type GroupKind = 'controller' | 'adapter';
export type GroupDiffEntry = DiffEntry & { kind: GroupKind; device: string };

/** `name` is the port as an installer reads it ("wms-db-1 / card-1 p1"); `device` its device's name. */
export type PortDiffEntry = DiffEntry & { device: string };

/** Keyed by the port's id: one entry per port whose address came, went or changed. */
export type AddressDiffEntry = DiffEntry & { device: string };

export type DiffSection<E extends DiffEntry = DiffEntry> = { added: E[]; removed: E[]; changed: E[] };

export type SectionCounts = { added: number; removed: number; changed: number };

export const DIFF_SECTIONS = ['devices', 'groups', 'ports', 'cables', 'networks', 'addresses'] as const;
export type DiffSectionName = (typeof DIFF_SECTIONS)[number];

export type DiffCounts = Record<DiffSectionName, SectionCounts> & {
  /** Changed document-level fields (name, security.chap). */
  document: number;
  /** Every entry of every section plus the document-level changes; 0 exactly when `empty`. */
  total: number;
};

export type TopologyDiff = {
  /** Document-level fields: `name` and `security.chap` (an absent `security` reads as "none"). */
  document: FieldChange[];
  devices: DiffSection<DeviceDiffEntry>;
  groups: DiffSection<GroupDiffEntry>;
  ports: DiffSection<PortDiffEntry>;
  cables: DiffSection;
  networks: DiffSection;
  addresses: DiffSection<AddressDiffEntry>;
  /**
   * Devices in both versions whose canvas position differs (or that gained or lost one). Positions
   * are not part of the design, so this never makes the diff non-empty; it lets the UI say
   * "no differences (3 boxes moved)".
   */
  layoutMoved: number;
  counts: DiffCounts;
  /** True when nothing but the layout differs. */
  empty: boolean;
};
