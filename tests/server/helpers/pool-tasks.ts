/**
 * Tasks for the pool's own tests, run in its child processes: each one misbehaves in one way the
 * analysis of a hostile document could.
 */
function spin(): never {
  for (;;) {
    // A loop that never yields, like an analysis that never ends.
  }
}

/** Grow one array until the heap gives out: the allocation pattern that V8 treats as fatal. */
function grow(): never {
  const items: number[] = [];
  for (;;) items.push(items.length);
}

/** Write through `__proto__` onto Object.prototype, as code that keys plain objects by user ids can. */
function pollute(key: string): boolean {
  const index: Record<string, Record<string, boolean>> = {};
  index['__proto__'][key] = true;
  return true;
}

export const TASKS = new Map<string, (input: never) => unknown>([
  ['echo', (input: unknown) => ({ echoed: input, pid: process.pid })],
  ['pollute', pollute],
  ['inherits', (key: string) => key in {}],
  ['spin', spin],
  ['grow', grow],
  ['throw', () => {
    throw new Error('task failed on purpose');
  }],
  ['exit', () => process.exit(3)],
]);
