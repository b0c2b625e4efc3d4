import { fork } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import { analyze } from '@/shared/analysis/analyze';
import { validateTopology } from '@/shared/topology/validate';
import { bruteForceHosts } from '../shared/helpers/oracle';
import { syntheticDesign } from './helpers/synthetic';

/**
 * `npm run bench`: analysis time and peak memory on synthetic designs of 100 to 20,000 hosts, and
 * at 100 hosts the speed-up over the brute-force method (fail each unit, search again) measured in
 * the same run. Each size runs in a fresh child process so its peak RSS is its own; the time is
 * the median of several runs after one warm-up. Exits 1 when a target is missed.
 */
const SIZES = [100, 1000, 5000, 20000];
const TARGETS: Record<number, { ms: number; mb?: number }> = { 5000: { ms: 500 }, 20000: { ms: 3000, mb: 500 } };
const MIN_SPEEDUP = 200;

type Measure = { hosts: number; devices: number; cables: number; medianMs: number; cpuMs: number; runs: number; peakRssMb: number; heapGrowthMb: number; pairs: number; spofUnits: number; bruteMs?: number };

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function gc() {
  (globalThis as { gc?: () => void }).gc?.();
}

function measure(hosts: number): Measure {
  const doc = syntheticDesign(hosts);
  const checked = validateTopology(doc);
  if (!checked.ok) throw new Error(`synthetic design is not valid: ${JSON.stringify(checked.issues.slice(0, 3))}`);
  gc();
  const heapBefore = process.memoryUsage().heapUsed;
  const first = analyze(doc); // warm-up, and the heap the analysis leaves before collection
  const heapGrowthMb = (process.memoryUsage().heapUsed - heapBefore) / 2 ** 20;
  const runs = hosts >= 20000 ? 3 : hosts >= 5000 ? 5 : 11;
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    gc();
    const start = performance.now();
    const used = process.cpuUsage();
    analyze(doc);
    const spent = process.cpuUsage(used);
    times.push(performance.now() - start);
    cpu.push((spent.user + spent.system) / 1000);
  }
  let bruteMs: number | undefined;
  if (hosts === 100) {
    const start = performance.now();
    const brute = bruteForceHosts(doc);
    bruteMs = performance.now() - start;
    if (JSON.stringify(brute) !== JSON.stringify(first.hosts)) throw new Error('brute force and analysis disagree');
  }
  return {
    hosts,
    devices: doc.devices.length,
    cables: doc.cables.length,
    medianMs: median(times),
    cpuMs: median(cpu),
    runs,
    peakRssMb: process.resourceUsage().maxRSS / 1024,
    heapGrowthMb,
    pairs: first.hosts.length,
    spofUnits: first.failures.length,
    bruteMs,
  };
}

function child(hosts: number): Promise<Measure> {
  return new Promise((resolve, reject) => {
    const proc = fork(__filename, ['--child', String(hosts)], { execArgv: process.execArgv });
    proc.on('message', (m) => resolve(m as Measure));
    proc.on('error', reject);
    proc.on('exit', (code) => code !== 0 && reject(new Error(`size ${hosts} exited ${code}`)));
  });
}

async function main() {
  const results: Measure[] = [];
  for (const size of SIZES) results.push(await child(size));
  const line = (cells: (string | number)[]) => cells.map((c, i) => String(c).padStart(i === 0 ? 7 : 12)).join(' ');
  console.log(`analysis benchmark (node ${process.version}, gc ${typeof (globalThis as { gc?: unknown }).gc === 'function' ? 'exposed' : 'not exposed'})`);
  // CPU time (all threads of the process, the collector's included) beside wall time: on a shared
  // machine wall time also counts other processes' turns; the targets are judged on wall time.
  console.log(line(['hosts', 'devices', 'cables', 'median ms', 'cpu ms', 'runs', 'peak RSS MB', 'heap +MB', 'pairs', 'SPOF units']));
  for (const r of results) {
    console.log(line([r.hosts, r.devices, r.cables, r.medianMs.toFixed(1), r.cpuMs.toFixed(1), r.runs, r.peakRssMb.toFixed(0), r.heapGrowthMb.toFixed(0), r.pairs, r.spofUnits]));
  }
  console.log(`load average when done: ${loadavg().map((x) => x.toFixed(2)).join(' ')} on ${cpus().length} cores`);
  let ok = true;
  const small = results.find((r) => r.hosts === 100)!;
  const speedup = small.bruteMs! / small.medianMs;
  const speedOk = speedup >= MIN_SPEEDUP;
  ok &&= speedOk;
  console.log(`100 hosts: brute force ${small.bruteMs!.toFixed(0)} ms vs analysis ${small.medianMs.toFixed(2)} ms = ${speedup.toFixed(0)}× (target ≥ ${MIN_SPEEDUP}×) ${speedOk ? 'met' : 'MISSED'}`);
  for (const [size, target] of Object.entries(TARGETS)) {
    const r = results.find((x) => x.hosts === Number(size))!;
    const met = r.medianMs < target.ms && (target.mb === undefined || r.peakRssMb < target.mb);
    ok &&= met;
    console.log(`${size} hosts: ${r.medianMs.toFixed(0)} ms (target < ${target.ms} ms)${target.mb ? `, peak RSS ${r.peakRssMb.toFixed(0)} MB (target < ${target.mb} MB)` : ''} ${met ? 'met' : 'MISSED'}`);
  }
  process.exitCode = ok ? 0 : 1;
}

if (process.argv[2] === '--child') {
  process.send!(measure(Number(process.argv[3])));
  process.disconnect?.();
} else {
  void main();
}
