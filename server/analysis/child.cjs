'use strict';
/**
 * One process of the analysis pool (server/analysis/pool.ts). Plain CommonJS on purpose: it is
 * started by `node` itself, whether the server runs under tsx, jest (babel) or Playwright's
 * webServer, so it registers tsx's loader before it loads the TypeScript task module named in
 * argv[2]. It answers `{ ready: true }` once loaded, then one `{ id, result }`, `{ id, error }` or
 * `{ id, tampered: true }` per `{ id, task, input }`, one at a time. It exits when the server goes
 * away (the IPC channel closes), so a killed server leaves no analysis process behind.
 */
require('tsx/cjs/api').register();

const tasks = require(process.argv[2]).TASKS;

/**
 * The built-in objects every later task relies on. Code that keeps user-supplied ids as keys of
 * plain objects can write through `obj['__proto__']` or `obj['constructor']` onto them, which would
 * change how every later task in this process behaves, for every other user. They are compared
 * after each task: if anything changed, the task's answer is withheld and the process exits (the
 * pool starts a clean one). Freezing them instead would break ordinary code: an own `toString`
 * or `constructor` key could then no longer be assigned to any plain object.
 */
const WATCHED = [Object, Array, Function, String, Number, Boolean, Symbol, BigInt, Map, Set, WeakMap, WeakSet, RegExp, Date, Promise, Error, TypeError, RangeError, JSON, Math, Reflect, globalThis];

function fingerprint() {
  const entries = [];
  for (const owner of WATCHED) {
    for (const target of [owner, owner.prototype]) {
      if ((typeof target !== 'object' && typeof target !== 'function') || target === null) continue;
      entries.push(target, Object.getPrototypeOf(target));
      for (const key of Reflect.ownKeys(target)) {
        const d = Object.getOwnPropertyDescriptor(target, key);
        entries.push(key, d.value, d.get, d.set, d.writable, d.enumerable, d.configurable);
      }
    }
  }
  return entries;
}

function unchanged(before, after) {
  return before.length === after.length && before.every((value, i) => Object.is(value, after[i]));
}

const clean = fingerprint();

process.on('message', (message) => {
  const { id, task, input } = message;
  const run = tasks.get(task);
  if (!run) {
    process.send({ id, error: `no task named ${String(task)}` });
    return;
  }
  let reply;
  try {
    reply = { id, result: run(input) };
  } catch (error) {
    reply = { id, error: error instanceof Error ? error.message : String(error) };
  }
  if (!unchanged(clean, fingerprint())) {
    process.send({ id, tampered: true }, () => process.exit(0));
    return;
  }
  process.send(reply);
});

process.on('disconnect', () => process.exit(0));

/**
 * A task stuck in a loop never gets to the 'disconnect' event, so a server killed outright (kill -9)
 * would leave it spinning. A watchdog thread, which the loop cannot block, ends this process once
 * its parent is gone (its parent process id changes).
 */
const { Worker } = require('node:worker_threads');
const watchdog = new Worker(
  `const { workerData } = require('node:worker_threads');
   setInterval(() => { if (process.ppid !== workerData.parent) process.kill(workerData.self, 'SIGKILL'); }, 500);`,
  { eval: true, workerData: { parent: process.ppid, self: process.pid } },
);
watchdog.unref();

process.send({ ready: true });
