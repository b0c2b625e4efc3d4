import { analyze } from '@/shared/analysis/analyze';
import { validateTopology } from '@/shared/topology/validate';
import { bruteForceHosts, failureUnits } from './helpers/oracle';
import { randomDesign, randomFailures } from './helpers/random-design';

// The dominator method must give exactly what failing every unit in turn gives.
const DESIGNS = 600;

describe('analysis against the brute-force oracle', () => {
  it(`gives identical hosts[] on ${DESIGNS} seeded random designs`, () => {
    let pairs = 0;
    let withSpof = 0;
    for (let seed = 1; seed <= DESIGNS; seed += 1) {
      const doc = randomDesign(seed);
      const checked = validateTopology(doc);
      if (!checked.ok) throw new Error(`seed ${seed}: ${JSON.stringify(checked.issues)}`);
      const expected = bruteForceHosts(doc);
      const actual = analyze(doc).hosts;
      if (JSON.stringify(actual) !== JSON.stringify(expected)) {
        expect({ seed, actual }).toEqual({ seed, actual: expected });
      }
      pairs += expected.length;
      withSpof += expected.filter((p) => !p.redundant).length;
    }
    // The generator must produce both redundant and non-redundant pairs, or the comparison proves little.
    expect(withSpof).toBeGreaterThan(300);
    expect(pairs - withSpof).toBeGreaterThan(150);
  });

  it('gives identical hosts[] when some units have already failed (what-if)', () => {
    for (let seed = 1001; seed <= 1200; seed += 1) {
      const doc = randomDesign(seed);
      const failed = randomFailures(doc, seed, failureUnits(doc));
      const actual = analyze(doc, { failed }).hosts;
      const expected = bruteForceHosts(doc, failed);
      if (JSON.stringify(actual) !== JSON.stringify(expected)) {
        expect({ seed, failed, actual }).toEqual({ seed, failed, actual: expected });
      }
    }
  });
});
