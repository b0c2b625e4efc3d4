'use strict';
/**
 * One process of the analysis pool (server/analysis/pool.ts). Plain CommonJS on purpose: it is
 * started by `node` itself, whether the server runs under tsx, jest (babel) or Playwright's
 * webServer, so it registers tsx's loader before it loads the TypeScript task module named in
 * argv[2]. It answers `{ ready: true }` once loaded, then one `{ id, result }` or `{ id, error }`
 * per `{ id, task, input }`, one at a time. It exits when the server goes away (the IPC channel
 * closes), so a killed server leaves no analysis process behind.
 */
require('tsx/cjs/api').register();

const tasks = require(process.argv[2]).TASKS;

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
  process.send(reply);
});

process.on('disconnect', () => process.exit(0));
process.send({ ready: true });
