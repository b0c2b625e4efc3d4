import fc from 'fast-check';
import { compareAccess, hostsLosingAccess } from '@/lib/report/whatif';
import { hostRows } from '@/lib/report/view';
import { failureUnits } from '@/lib/report/units';
import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';

const v1 = harborRoadV1();
const v2 = harborRoadV2();

describe('what-if comparison', () => {
  it('reports cam-rec-2 cut off when fab-a fails in Harbor Road version 1', () => {
    // docs/demo.md: version 1 cables cam-rec-2 only to fab-a.
    const impacts = compareAccess(analyze(v1), analyze(v1, { failed: ['fab-a'] }));
    expect(hostsLosingAccess(impacts)).toEqual(['cam-rec-2']);
    // The other five hosts are cabled to both fabrics, so they keep fab-b alone: reduced, not lost.
    expect(impacts.filter((i) => i.effect === 'reduced').map((i) => i.host).sort()).toEqual(['cam-rec-1', 'wms-app-1', 'wms-app-2', 'wms-db-1', 'wms-db-2']);
  });

  it('cuts nobody off when one switch fails in version 2, and marks every host reduced', () => {
    const impacts = compareAccess(analyze(v2), analyze(v2, { failed: ['fab-b'] }));
    expect(hostsLosingAccess(impacts)).toEqual([]);
    expect(impacts.every((i) => i.effect === 'reduced')).toBe(true);
  });

  it('agrees with analyze on any set of failed units: lost exactly when the pair has no result left', () => {
    const ids = failureUnits(v2).map((u) => u.id);
    fc.assert(
      fc.property(fc.subarray(ids, { maxLength: 4 }), (failed) => {
        const simulated = analyze(v2, { failed });
        const left = new Set(simulated.hosts.filter((h) => h.sessions > 0).map((h) => h.host));
        for (const impact of compareAccess(analyze(v2), simulated)) {
          expect(impact.effect === 'lost').toBe(!left.has(impact.host));
          if (impact.effect === 'unchanged') expect(impact.after).toEqual(impact.before);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('orders report rows worst first: cut off, then not redundant, then the rest', () => {
    const rows = hostRows(analyze(v1), analyze(v1, { failed: ['fab-a'] }));
    expect(rows[0]).toMatchObject({ host: 'cam-rec-2', effect: 'lost' });
    const saved = hostRows(analyze(v1), null);
    expect(saved[0].host).toBe('cam-rec-2');
    expect(saved.slice(1).every((r) => r.after?.redundant)).toBe(true);
  });
});
