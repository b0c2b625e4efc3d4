/**
 * Editor model speed on a 300-device, 600-cable design: a full render snapshot, and one drag step
 * (move one device, rebuild the snapshot incrementally). Prints median and 95th percentile.
 * The browser-side drag is measured by `npm run bench:canvas`. Run: npx tsx tests/bench/editor.bench.ts
 */
import { moveDevice } from '@/lib/editor/commands';
import { buildSnapshot } from '@/lib/editor/geometry';
import { bigDesign } from '@/tests/lib/editor/helpers/big-design';

function percentile(samples: number[], p: number): number {
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

export function benchEditor(): void {
  console.log('\n== editor snapshot (300 devices, 600 cables) ==');
  const doc = bigDesign();
  for (let i = 0; i < 10; i += 1) buildSnapshot(doc); // warm the JIT, as a long-lived canvas is
  const full: number[] = [];
  for (let i = 0; i < 101; i += 1) {
    const start = performance.now();
    buildSnapshot(doc);
    full.push(performance.now() - start);
  }
  let snap = buildSnapshot(doc);
  let current = doc;
  const moves: number[] = [];
  for (let i = 0; i < 201; i += 1) {
    const start = performance.now();
    current = moveDevice(current, { id: 'switch-7', x: 5000 + i * 3, y: 600 });
    snap = buildSnapshot(current, snap);
    moves.push(performance.now() - start);
  }
  const fmt = (n: number) => `${n.toFixed(2)} ms`;
  console.log(`full snapshot: median ${fmt(percentile(full, 50))}, p95 ${fmt(percentile(full, 95))}`);
  console.log(`one drag step: median ${fmt(percentile(moves, 50))}, p95 ${fmt(percentile(moves, 95))}`);
}

if (require.main === module) benchEditor();
