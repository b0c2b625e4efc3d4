'use strict';
/**
 * A stand-in server for the pool's test: starts one analysis process as the pool does, sets it
 * spinning on a task, and tells the test both process ids; the test then kills this process outright.
 */
const { fork } = require('node:child_process');
const path = require('node:path');

const root = path.resolve(__dirname, '..', '..', '..');
const child = fork(path.join(root, 'server', 'analysis', 'child.cjs'), [path.join(__dirname, 'pool-tasks.ts')], {
  cwd: root,
  serialization: 'advanced',
  stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
});
child.on('message', (message) => {
  if (!message.ready) return;
  child.send({ id: 1, task: 'spin', input: null });
  process.send({ parent: process.pid, child: child.pid });
});
