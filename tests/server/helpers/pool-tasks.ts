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

export const TASKS = new Map<string, (input: never) => unknown>([
  ['echo', (input: unknown) => ({ echoed: input, pid: process.pid })],
  ['spin', spin],
  ['grow', grow],
  ['throw', () => {
    throw new Error('task failed on purpose');
  }],
  ['exit', () => process.exit(3)],
]);
