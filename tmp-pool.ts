import path from 'node:path';
import { createPool } from '@/server/analysis/pool';
const pool = createPool({ module: path.resolve('tests/server/helpers/pool-tasks.ts'), workers: 2, timeoutMs: 1500, maxOldMb: 64, queueMax: 10 });
(async () => {
  let t = Date.now();
  console.log(await pool.run('echo', { a: 1 }), Date.now() - t);
  t = Date.now();
  for (const task of ['spin', 'grow', 'throw', 'exit', 'nope']) {
    t = Date.now();
    try { console.log(task, await pool.run(task, null)); } catch (e: any) { console.log(task, e.name, e.kind, e.message, Date.now() - t); }
  }
  t = Date.now();
  console.log(await pool.run('echo', 'again'), Date.now() - t, pool.stats());
})();
