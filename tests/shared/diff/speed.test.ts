import { diffTopologies } from '@/shared/diff';
import { dualFabricWithManagement } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';

/**
 * The diff on a big design finds exactly the edits and nothing else. How fast it is lives in
 * `npm run bench` (tests/bench/diff.bench.ts), never in a timed test.
 */
function design(hosts: number): Topology {
  // Networks large enough for every host; 10/8 addresses keep the pattern's assignment in range.
  return dualFabricWithManagement({
    hosts,
    networks: { a: { cidr: '10.0.0.0/16' }, b: { cidr: '10.1.0.0/16' } },
    management: { cidr: '10.2.0.0/16' },
  });
}

describe('diff on a big design', () => {
  it('finds every renamed host and removed cable of a 2,000-host design, ignoring order', () => {
    const before = design(2_000);
    const after = structuredClone(before);
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

    const diff = diffTopologies(before, after);
    expect(renamed).toBeGreaterThan(0);
    expect(diff.counts.devices).toEqual({ added: 0, removed: 0, changed: renamed });
    expect(diff.counts.cables).toEqual({ added: 0, removed, changed: 0 });
    expect(diff.counts.total).toBe(renamed + removed);
  });
});
