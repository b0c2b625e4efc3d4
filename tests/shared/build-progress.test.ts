import { analyze } from '@/shared/analysis/analyze';
import { bringUpSteps } from '@/shared/build';
import { buildProgress } from '@/shared/build/progress';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import type { CableState } from '@/shared/api/build';
import type { Topology } from '@/shared/topology/schema';

/** Progress of a build record from the cables' and steps' current states. */
const doc = harborRoadV2();
const steps = bringUpSteps(doc, analyze(doc));
const states = (entries: Array<[string, CableState]>) => {
  const map = new Map(entries);
  return (id: string) => map.get(id) ?? 'not-started';
};

describe('build progress', () => {
  it('counts a cable done only when it is tested', () => {
    const progress = buildProgress(doc, steps, states([['cable-a-01', 'run'], ['cable-a-02', 'tested'], ['cable-a-03', 'problem']]), () => false);
    expect(progress.cables).toEqual({ done: 1, total: 28 });
    expect(progress.states).toEqual({ 'not-started': 25, run: 1, tested: 1, problem: 1 });
    expect(progress.steps).toEqual({ done: 0, total: steps.length });
  });

  it('counts per rack, a cable between racks in both, and a rack’s own steps and its devices’ steps', () => {
    const progress = buildProgress(doc, steps, () => 'tested', (id) => id === JSON.stringify(['rack', 'rk-a02']));
    const a02 = progress.racks.find((r) => r.rackId === 'rk-a02')!;
    // Counted by hand from the fixture (see build-record.test.ts): 16 cables touch A02.
    expect(a02.cables).toEqual({ done: 16, total: 16 });
    const a02Steps = steps.filter((s) => s.rackId === 'rk-a02');
    expect(a02.steps).toEqual({ done: 1, total: a02Steps.length });
    expect(progress.racks.map((r) => r.rack)).toEqual(['A01', 'A02']);
  });

  it('adds an unplaced entry only when something is not in a rack', () => {
    const loose: Topology = { ...harborRoadV2(), devices: harborRoadV2().devices.map((d) => (d.id === 'wms-db-2' ? { ...d, placement: undefined } : d)) };
    const list = bringUpSteps(loose, analyze(loose));
    const progress = buildProgress(loose, list, () => 'not-started', () => false);
    const unplaced = progress.racks.find((r) => r.rackId === null)!;
    // wms-db-2's three cables (two data, one management) have an unplaced end.
    expect(unplaced.cables.total).toBe(3);
    expect(unplaced.steps.total).toBe(list.filter((s) => s.deviceId === 'wms-db-2').length);
  });
});
