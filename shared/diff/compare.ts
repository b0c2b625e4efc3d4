import type { DiffEntry, DiffSection, DiffValue, FieldChange } from '@/shared/diff/types';

/**
 * Field-by-field comparison of one section (devices, ports, cables, …), driven by a small spec so
 * that every section is diffed the same way: things are matched by id through Maps (one pass over
 * each version, no nested scans), then only the fields of things present in both are compared.
 */

/** What a field is compared by, and how it is shown. `S` is one version's lookups. */
export type FieldSpec<T, S> = {
  field: string;
  /** The compared value. References give the referenced id, so a rename elsewhere is no change here. */
  key: (item: T) => DiffValue;
  /** The shown value, e.g. a referenced device's name; defaults to the key. */
  show?: (item: T, side: S) => DiffValue;
  /** Equality for fields with several spellings of one value (IPv6 text); defaults to `===`. */
  equal?: (before: DiffValue, after: DiffValue) => boolean;
};

export type SectionSpec<T, S, E extends DiffEntry> = {
  fields: FieldSpec<T, S>[];
  /** Everything of the entry but its changes, read from the version it is shown from. */
  describe: (id: string, item: T, side: S) => Omit<E, 'changes'>;
  /** Puts the later item in the earlier one's terms before comparing (a cable turned end for end). */
  align?: (before: T, after: T) => T;
  /** Whether an item of the map counts as there at all (a port without an address has no address entry). */
  present?: (item: T) => boolean;
};

export type Version<T, S> = { items: Map<string, T>; side: S };

function shown<T, S>(spec: FieldSpec<T, S>, item: T, side: S): DiffValue {
  return spec.show ? spec.show(item, side) : spec.key(item);
}

/** Every field an item has, for an added (`present` after) or removed (`present` before) entry. */
function presentFields<T, S>(fields: FieldSpec<T, S>[], item: T, side: S, present: 'before' | 'after'): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const spec of fields) {
    if (spec.key(item) === null) continue;
    const value = shown(spec, item, side);
    changes.push(present === 'after' ? { field: spec.field, before: null, after: value } : { field: spec.field, before: value, after: null });
  }
  return changes;
}

function changedFields<T, S>(fields: FieldSpec<T, S>[], before: Version<T, S>, after: Version<T, S>, b: T, a: T): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const spec of fields) {
    const kb = spec.key(b);
    const ka = spec.key(a);
    if (kb === ka || (kb !== null && ka !== null && spec.equal?.(kb, ka))) continue;
    changes.push({ field: spec.field, before: shown(spec, b, before.side), after: shown(spec, a, after.side) });
  }
  return changes;
}

/** Code-unit order: the same on every machine and locale, unlike localeCompare. */
export function byId(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

const sortById = <E extends DiffEntry>(entries: E[]) => entries.sort((x, y) => byId(x.id, y.id));

/**
 * Walks both maps in insertion order and sorts only the entries found, not every id: between two
 * versions of a 20,000-host design most things are unchanged, and sorting 160,000 port ids would
 * cost more than comparing them.
 */
export function compareSection<T, S, E extends DiffEntry>(
  spec: SectionSpec<T, S, E>,
  before: Version<T, S>,
  after: Version<T, S>,
): DiffSection<E> {
  const section: DiffSection<E> = { added: [], removed: [], changed: [] };
  const entry = (id: string, item: T, side: S, changes: FieldChange[]) => ({ ...spec.describe(id, item, side), changes }) as E;
  const there = (item: T | undefined): item is T => item !== undefined && (!spec.present || spec.present(item));
  // forEach rather than `for (const [id, item] of map)`: the browser build's Babel turns that
  // destructuring into a helper call per item, which doubles the time on big designs.
  before.items.forEach((b, id) => {
    if (!there(b)) return;
    const a = after.items.get(id);
    if (!there(a)) {
      section.removed.push(entry(id, b, before.side, presentFields(spec.fields, b, before.side, 'before')));
    } else if (a !== b) {
      const changes = changedFields(spec.fields, before, after, b, spec.align ? spec.align(b, a) : a);
      if (changes.length > 0) section.changed.push(entry(id, a, after.side, changes));
    }
  });
  after.items.forEach((a, id) => {
    if (there(a) && !there(before.items.get(id))) section.added.push(entry(id, a, after.side, presentFields(spec.fields, a, after.side, 'after')));
  });
  sortById(section.added);
  sortById(section.removed);
  sortById(section.changed);
  return section;
}
