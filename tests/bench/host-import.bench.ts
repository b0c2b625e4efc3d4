/**
 * Host inventory import: previewing a 5,000-row CSV (parse and check every cell) must stay under
 * 1 s, the time a designer waits for the preview table. Also the confirmed import of those hosts
 * as one command. Prints the median of several runs. Run: npx tsx tests/bench/host-import.bench.ts
 */
import { importHosts } from '@/lib/editor/commands';
import { IMPORT_COLUMNS, previewHostImport } from '@/lib/editor/host-import';
import { TOPOLOGY_FORMAT, type Topology } from '@/shared/topology/schema';

const ROWS = 5000;
const TARGET_MS = 1000;

function inventory(rows: number): string {
  const lines = [IMPORT_COLUMNS.join(',')];
  for (let i = 1; i <= rows; i++) {
    const rack = `R${String(1 + Math.floor((i - 1) / 40)).padStart(3, '0')}`;
    lines.push(`host-${i},iqn.2026-11.example.tidewater:host-${i},2,2,25,sfp,${rack},${1 + ((i - 1) % 40)}`);
  }
  return lines.join('\n');
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export function benchHostImport(): void {
  console.log(`\n== host inventory import (${ROWS} rows) ==`);
  const csv = inventory(ROWS);
  const times: number[] = [];
  let hosts = previewHostImport(csv).hosts;
  for (let i = 0; i < 7; i++) {
    const start = performance.now();
    const preview = previewHostImport(csv);
    times.push(performance.now() - start);
    if (preview.errors.length > 0) throw new Error(`unexpected errors: ${preview.errors[0].message}`);
    hosts = preview.hosts;
  }
  const ms = median(times);
  console.log(`preview: median ${ms.toFixed(0)} ms (target < ${TARGET_MS} ms) ${ms < TARGET_MS ? 'ok' : 'SLOW'}`);
  const doc: Topology = { format: TOPOLOGY_FORMAT, name: 'import bench', devices: [], cables: [], networks: [] };
  const start = performance.now();
  const next = importHosts(doc, { hosts });
  console.log(`confirm (one command): ${(performance.now() - start).toFixed(0)} ms, ${next.devices.length} hosts in ${next.racks?.length ?? 0} racks`);
  if (ms >= TARGET_MS) process.exitCode = 1;
}

benchHostImport();
