/**
 * Objects keyed by what users type (device ids in a layout, positions of a drag). A plain `{}`
 * inherits from Object.prototype, so `record["constructor"]` is a function before anything is set,
 * `"toString" in record` is true, and `record["__proto__"] = p` replaces the prototype instead of
 * storing p (the entry is then lost from Object.keys and JSON). Records made here have no
 * prototype, so every string is an ordinary key; records that came from elsewhere (JSON.parse,
 * zod, a spread) are read only through `ownValue`, which looks at own properties alone.
 *
 * Where no JSON shape forces an object, use a Map instead.
 */
export type IdRecord<T> = Record<string, T>;

/** An empty record with no prototype: assigning any key, `__proto__` included, stores it. */
export function emptyRecord<T>(): IdRecord<T> {
  return Object.create(null) as IdRecord<T>;
}

/** The record's own value under `key`; undefined when it has none (inherited members never count). */
export function ownValue<T>(record: Readonly<Record<string, T>> | undefined, key: string): T | undefined {
  return record !== undefined && Object.hasOwn(record, key) ? record[key] : undefined;
}

/** A prototype-free record of the entries, later entries winning. */
export function recordFrom<T>(entries: Iterable<readonly [string, T]>): IdRecord<T> {
  const record = emptyRecord<T>();
  for (const [key, value] of entries) record[key] = value;
  return record;
}

/** A prototype-free copy of `record` with `changes` applied (a copy even when nothing changes). */
export function recordWith<T>(record: Readonly<Record<string, T>> | undefined, changes: Iterable<readonly [string, T]>): IdRecord<T> {
  const next = recordFrom(Object.entries(record ?? {}));
  for (const [key, value] of changes) next[key] = value;
  return next;
}
