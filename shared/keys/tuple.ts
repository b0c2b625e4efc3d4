/**
 * One string for several ids — a Map key for a pair, a set of ids compared by value — that no two
 * different lists can share, whatever the ids hold. Joining with a separator is not enough: ids
 * may contain any character, so `["a\u0000b"]` and `["a", "b"]` would both read `a\u0000b`. JSON
 * text quotes and escapes every element, so it is injective on lists of strings and can be read
 * back exactly.
 */
export function tupleKey(parts: readonly string[]): string {
  return JSON.stringify(parts);
}

/**
 * A list of ids as one string for props compared by value: the empty string for no ids (so a
 * cheap `=== ''` still means "none"), otherwise the list's tupleKey.
 */
export function joinIds(ids: readonly string[]): string {
  return ids.length === 0 ? '' : tupleKey(ids);
}

/** The ids a joinIds string holds, in order. */
export function splitIds(joined: string): string[] {
  return joined === '' ? [] : (JSON.parse(joined) as string[]);
}
