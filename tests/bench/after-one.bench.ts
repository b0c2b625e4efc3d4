import { cpus, loadavg } from 'node:os';
import { closeSharedPools } from '@/server/analysis/pool';
import { analysisPool } from '@/server/services/analysis';
import type { TaskOutcome } from '@/server/analysis/tasks';
import { syntheticPoweredDesign } from './helpers/synthetic';

/**
 * `npm run bench`: the after-one-failure analysis (api.md `--after-one`) of synthetic designs with
 * power — two feeds, two PSUs per device, some single-PSU hosts and two switches on one feed — run
 * as the server runs it: the `after-one` task in an analysis process of the pool, with the server's
 * default memory limit, timed from the request to the answer's JSON text arriving back (validation
 * and the transfer included). Median of three after one warm-up. Exits 1 when a target is missed.
 */
const TARGETS: [hosts: number, ms: number][] = [
  [1000, 3000],
  [5000, 20000],
];
const RUNS = 3;

function median(values: number[]): number {
  return [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
}

async function main() {
  const pool = analysisPool({ timeoutMs: 120000, maxOldMb: 512, workers: 1 });
  let ok = true;
  console.log('after-one-failure benchmark (analysis process, 512 MB heap)');
  console.log(['hosts', 'units', 'median ms', 'answer MB', 'target ms', ''].map((c) => c.padStart(10)).join(' '));
  for (const [hosts, target] of TARGETS) {
    const json = JSON.stringify(syntheticPoweredDesign(hosts));
    const times: number[] = [];
    let units = 0;
    let bytes = 0;
    for (let i = 0; i <= RUNS; i += 1) {
      const start = performance.now();
      const outcome = await pool.run<TaskOutcome<{ afterOneJson: string }>>('after-one', json);
      const ms = performance.now() - start;
      if (!outcome.ok) throw new Error(`after-one failed on ${hosts} hosts: ${JSON.stringify(outcome).slice(0, 300)}`);
      if (i > 0) times.push(ms); // the first run warms the process up
      units = (JSON.parse(outcome.value.afterOneJson) as unknown[]).length;
      bytes = outcome.value.afterOneJson.length;
    }
    const ms = median(times);
    const met = ms < target;
    ok &&= met;
    console.log([hosts, units, ms.toFixed(0), (bytes / 2 ** 20).toFixed(1), `< ${target}`, met ? 'met' : 'MISSED'].map((c) => String(c).padStart(10)).join(' '));
  }
  console.log(`load average when done: ${loadavg().map((x) => x.toFixed(2)).join(' ')} on ${cpus().length} cores`);
  await closeSharedPools();
  process.exitCode = ok ? 0 : 1;
}

void main();
