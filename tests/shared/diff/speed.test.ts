import { diffTopologies } from '@/shared/diff';
import { dualFabricWithManagement } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';

/**
 * The diff must stay linear: a 20,000-host design (about 160,000 ports and 60,000 cables) against
 * a lightly edited copy. Nested scans would take minutes here. Time is the process's CPU time, not
 * the wall clock, so other work on a shared machine does not count; the bound leaves room for a
 * slow machine while the figure to aim for is well under a second.
 */
jest.setTimeout(120_000);

function design(hosts: number): Topology {
  // Networks large enough for every host; 10/8 addresses keep the pattern's assignment in range.
  return dualFabricWithManagement({
    hosts,
    networks: { a: { cidr: '10.0.0.0/16' }, b: { cidr: '10.1.0.0/16' } },
    management: { cidr: '10.2.0.0/16' },
  });
}

function edit(doc: Topology) {
  const after = structuredClone(doc);
  let renamed = 0;
  after.devices.forEach((d, i) => {
    if (d.kind === 'host' && i % 100 === 0) {
      d.name += '-renamed';
      renamed += 1;
    }
  });
  const removed = after.cables.filter((_, i) => i % 1000 === 0).length;
  after.cables = after.cables.filter((_, i) => i % 1000 !== 0);
  after.devices.reverse(); // order alone is no change
  return { after, renamed, removed };
}

/** Least CPU milliseconds over a few runs. */
function bestOf(runs: number, work: () => void): number {
  let best = Infinity;
  for (let r = 0; r < runs; r += 1) {
    const start = process.cpuUsage();
    work();
    const used = process.cpuUsage(start);
    best = Math.min(best, (used.user + used.system) / 1000);
  }
  return best;
}

describe('diff speed on big designs', () => {
  it('diffs two versions of a 20,000-host design in linear time with the right counts', () => {
    const big = design(20_000);
    const { after, renamed, removed } = edit(big);
    const diff = diffTopologies(big, after);
    expect(diff.counts.devices).toEqual({ added: 0, removed: 0, changed: renamed });
    expect(diff.counts.cables).toEqual({ added: 0, removed, changed: 0 });
    expect(diff.counts.total).toBe(renamed + removed);

    const bigMs = bestOf(3, () => diffTopologies(big, after));
    const small = design(5_000);
    const smallEdit = edit(small).after;
    const smallMs = bestOf(3, () => diffTopologies(small, smallEdit));
    console.log(`diff CPU time: 20,000 hosts ${bigMs.toFixed(0)} ms; 5,000 hosts ${smallMs.toFixed(0)} ms`);
    expect(bigMs).toBeLessThan(2_500);
    // Four times the design: linear is about 4×, quadratic about 16×.
    expect(bigMs / smallMs).toBeLessThan(9);
  });
});
