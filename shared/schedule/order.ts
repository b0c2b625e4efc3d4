/**
 * Orders the schedule reads in: natural order for names with numbers ("A2" before "A10", "p9"
 * before "p10"), code-unit order otherwise — the same in every browser and on the server (no locale).
 */
const CHUNKS = /(\d+)/;

export function naturalCompare(a: string, b: string): number {
  if (a === b) return 0;
  const x = a.split(CHUNKS);
  const y = b.split(CHUNKS);
  const n = Math.min(x.length, y.length);
  for (let i = 0; i < n; i += 1) {
    if (x[i] === y[i]) continue;
    // split() with a capture group puts digit runs at odd indices.
    if (i % 2 === 1) {
      const diff = Number(x[i]) - Number(y[i]);
      if (diff !== 0) return diff;
      return x[i].length - y[i].length;
    }
    return x[i] < y[i] ? -1 : 1;
  }
  return x.length - y.length;
}
