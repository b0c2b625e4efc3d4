/**
 * Diff speed: two versions of large synthetic designs (dual fabric with management), a lightly edited
 * copy against the original. Prints CPU time (best of 3) per size and the growth ratio, which stays
 * near 4× for 4× the hosts when the diff is linear. Run: npx tsx tests/bench/diff.bench.ts
 */
import { diffTopologies } from '@/shared/diff';
import { dualFabricWithManagement } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';

function design(hosts: number): Topology {
  return dualFabricWithManagement({
    hosts,
    networks: { a: { cidr: '10.0.0.0/16' }, b: { cidr: '10.1.0.0/16' } },
    management: { cidr: '10.2.0.0/16' },
  });
}

function edited(doc: Topology): Topology {
  const after = structuredClone(doc);
  after.devices.forEach((d, i) => {
    if (d.kind === 'host' && i % 100 === 0) d.name += '-renamed';
  });
  after.cables = after.cables.filter((_, i) => i % 1000 !== 0);
  after.devices.reverse();
  return after;
}

function bestCpuMs(runs: number, work: () => void): number {
  let best = Infinity;
  for (let r = 0; r < runs; r += 1) {
    const start = process.cpuUsage();
    work();
    const used = process.cpuUsage(start);
    best = Math.min(best, (used.user + used.system) / 1000);
  }
  return best;
}

export function benchDiff(): void {
  console.log('\n== diff between two versions ==');
  const times = new Map<number, number>();
  for (const hosts of [1_000, 5_000, 20_000]) {
    const before = design(hosts);
    const after = edited(before);
    const diff = diffTopologies(before, after);
    const ms = bestCpuMs(3, () => diffTopologies(before, after));
    times.set(hosts, ms);
    console.log(`${String(hosts).padStart(6)} hosts: ${ms.toFixed(0).padStart(5)} ms CPU, ${diff.counts.total} changes found`);
  }
  console.log(`growth 5,000 → 20,000 hosts: ${(times.get(20_000)! / times.get(5_000)!).toFixed(1)}× (linear ≈ 4×)`);
}

if (require.main === module) benchDiff();
