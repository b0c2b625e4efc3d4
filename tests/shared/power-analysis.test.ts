import { analyze } from '@/shared/analysis/analyze';
import { validateTopology } from '@/shared/topology/validate';
import type { Topology } from '@/shared/topology/schema';
import { Draft } from './helpers/draft';
import { allUnits, bruteForceAfterOne, bruteForcePowerHosts, randomPowerDesign } from './helpers/power-oracle';
import { randomFailures } from './helpers/random-design';

// Power as failure units (docs/topology-format.md, format 2) and afterOneFailure (docs/api.md `--after-one`),
// checked against the brute-force reference: fail every unit (and every pair of units), search again.
const DESIGNS = 520;

function valid(doc: Topology): Topology {
  const checked = validateTopology(doc);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.doc;
}

describe('power in the single-failure analysis', () => {
  it(`gives the brute-force hosts[] on ${DESIGNS} seeded random designs with power`, () => {
    let powerSpofs = 0;
    let multiSwitchFeeds = 0;
    for (let seed = 1; seed <= DESIGNS; seed += 1) {
      const doc = valid(randomPowerDesign(seed));
      const expected = bruteForcePowerHosts(doc);
      const actual = analyze(doc).hosts;
      if (JSON.stringify(actual) !== JSON.stringify(expected)) expect({ seed, actual }).toEqual({ seed, actual: expected });
      const feeds = new Set((doc.powerFeeds ?? []).map((f) => f.id));
      const psus = new Set(doc.devices.flatMap((d) => (d.psus ?? []).map((p) => p.id)));
      for (const pair of expected) for (const u of pair.singlePointsOfFailure) if (feeds.has(u) || psus.has(u)) powerSpofs += 1;
      // A feed that is the only supply of two or more switches: the case the dominators cannot answer alone.
      for (const feed of feeds) {
        const only = doc.devices.filter((d) => d.kind === 'switch' && (d.psus ?? []).length > 0 && d.psus!.every((p) => p.feedId === feed));
        if (only.length > 1) multiSwitchFeeds += 1;
      }
    }
    // The generator must make power matter, or the comparison proves little.
    expect(powerSpofs).toBeGreaterThan(300);
    expect(multiSwitchFeeds).toBeGreaterThan(25);
  });

  it('gives the brute-force hosts[] when units, PSUs and feeds among them, have already failed', () => {
    for (let seed = 2001; seed <= 2200; seed += 1) {
      const doc = valid(randomPowerDesign(seed));
      const failed = randomFailures(doc, seed, allUnits(doc));
      const actual = analyze(doc, { failed }).hosts;
      const expected = bruteForcePowerHosts(doc, failed);
      if (JSON.stringify(actual) !== JSON.stringify(expected)) expect({ seed, failed, actual }).toEqual({ seed, failed, actual: expected });
    }
  });
});

describe('afterOneFailure', () => {
  it(`agrees with failing every pair of units on ${DESIGNS} seeded random designs with power`, () => {
    let exposed = 0;
    let cut = 0;
    for (let seed = 1; seed <= DESIGNS; seed += 1) {
      const doc = valid(randomPowerDesign(seed));
      const expected = bruteForceAfterOne(doc);
      const actual = analyze(doc, { afterOne: true }).afterOneFailure;
      if (JSON.stringify(actual) !== JSON.stringify(expected)) expect({ seed, actual }).toEqual({ seed, actual: expected });
      for (const entry of expected) {
        exposed += entry.exposed.length;
        cut += entry.cutOff.length;
      }
    }
    expect(exposed).toBeGreaterThan(500);
    expect(cut).toBeGreaterThan(200);
  });

  it('is left out of the report unless asked for', () => {
    const doc = valid(randomPowerDesign(3));
    expect('afterOneFailure' in analyze(doc)).toBe(false);
  });
});

/**
 * The drawn fabric: array v (controllers v.a, v.b), switches fa and fb, host h1 with card c1 on fa
 * and card c2 on fb; each controller on both switches.
 *   k1 v.a.1–fa  k2 v.a.2–fb  k3 v.b.1–fa  k4 v.b.2–fb  k5 h1.c1.1–fa  k6 h1.c2.1–fb
 */
function fabric(): Draft {
  return new Draft()
    .array('v', { a: 2, b: 2 })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'fa')
    .link('v.a.2', 'fb')
    .link('v.b.1', 'fa')
    .link('v.b.2', 'fb')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fb')
    .feed('feed-a')
    .feed('feed-b');
}

function pairOf(doc: Topology) {
  return analyze(doc).hosts.find((p) => p.host === 'h1' && p.array === 'v')!;
}

function afterOne(doc: Topology, unit: string) {
  return analyze(doc, { afterOne: true }).afterOneFailure!.find((e) => e.failed === unit)!;
}

describe('drawn cases', () => {
  it('a switch whose two PSUs share a feed: a finding, and the other feed becomes the one to keep', () => {
    const doc = valid(fabric().psus('fa', ['feed-a', 'feed-a']).psus('fb', ['feed-a', 'feed-b']).psus('v', ['feed-a', 'feed-b']).build());
    const report = analyze(doc, { afterOne: true });
    expect(report.findings.filter((f) => f.rule === 'psus-one-feed').map((f) => f.subjects[0])).toEqual(['fa']);
    // Both supplies of fa on feed-a: losing feed-a takes fa down, but fb still has feed-b.
    expect(pairOf(doc).redundant).toBe(true);
    // With feed-b down, fb lives on feed-a alone, so feed-a takes both switches (and the array, whose
    // last supply v.psu1 is on it too): h1 hangs on feed-a and on v.psu1.
    const feedB = afterOne(doc, 'feed-b');
    expect(feedB.cutOff).toEqual([]);
    expect(feedB.exposed).toEqual([{ host: 'h1', array: 'v', singlePointsOfFailure: ['feed-a', 'v.psu1'] }]);
    // With feed-a down, fa is off and h1 depends on everything of fb's side, and on feed-b and the
    // array's supply on it, the last power the array and fb have.
    expect(afterOne(doc, 'feed-a').exposed[0].singlePointsOfFailure).toEqual(['fb', 'fb.psu2', 'feed-b', 'h1.c2', 'k6', 'v.psu2']);
    expect(report.afterOneFailure).toEqual(bruteForceAfterOne(doc));
  });

  it('both switches wholly on one feed: that feed alone cuts the host off', () => {
    const doc = valid(fabric().psus('fa', ['feed-a', 'feed-a']).psus('fb', ['feed-a']).build());
    expect(pairOf(doc).singlePointsOfFailure).toEqual(['feed-a']);
    expect(analyze(doc).failures.find((f) => f.unit === 'feed-a')).toEqual({ unit: 'feed-a', kind: 'feed', cutsOff: [{ host: 'h1', array: 'v' }] });
  });

  it('an array with both controllers\' power on one feed: the feed cuts every host off it', () => {
    const doc = valid(fabric().psus('v', ['feed-a', 'feed-a']).psus('fa', ['feed-a', 'feed-b']).psus('fb', ['feed-a', 'feed-b']).build());
    const report = analyze(doc);
    expect(pairOf(doc).singlePointsOfFailure).toEqual(['feed-a']);
    expect(report.findings.find((f) => f.rule === 'psus-one-feed')?.subjects).toEqual(['v', 'feed-a', 'v.psu1', 'v.psu2']);
    expect(report.findings.find((f) => f.rule === 'single-point-of-failure')?.message).toContain('power feed feed-a');
    // One supply of the array failing leaves the other, which then is what the host hangs on.
    expect(afterOne(doc, 'v.psu1').exposed).toEqual([{ host: 'h1', array: 'v', singlePointsOfFailure: ['feed-a', 'v.psu2'] }]);
  });

  it('a host fine until fa is down, and then depending on one cable', () => {
    const doc = valid(fabric().psus('h1', ['feed-a', 'feed-b']).build());
    expect(pairOf(doc).redundant).toBe(true);
    const fa = afterOne(doc, 'fa');
    expect(fa.cutOff).toEqual([]);
    // fb, the host's card c2 and its cable k6; both controllers still reach fb, so neither is on the list.
    expect(fa.exposed).toEqual([{ host: 'h1', array: 'v', singlePointsOfFailure: ['fb', 'h1.c2', 'k6'] }]);
    // Host cables and cards are the host's own and are not listed; the host's PSUs neither.
    const listed = analyze(doc, { afterOne: true }).afterOneFailure!.map((e) => e.failed);
    expect(listed).toEqual(['fa', 'fb', 'feed-a', 'feed-b', 'k1', 'k2', 'k3', 'k4', 'v.a', 'v.b']);
    expect(analyze(doc, { afterOne: true }).afterOneFailure).toEqual(bruteForceAfterOne(doc));
  });

  it('a PSU on no feed is a finding; a host with one PSU has it as a single point of failure', () => {
    const doc = valid(fabric().psus('h1', [undefined]).build());
    const report = analyze(doc);
    expect(report.findings.filter((f) => f.rule === 'psu-no-feed').map((f) => f.subjects)).toEqual([['h1.psu1', 'h1']]);
    expect(pairOf(doc).singlePointsOfFailure).toEqual(['h1.psu1']);
  });

  it('takes ids such as constructor and __proto__ for feeds and PSUs like any other', () => {
    const draft = new Draft()
      .array('v', { a: 2, b: 2 })
      .switch('fa')
      .switch('fb')
      .host('h1', { c1: 1, c2: 1 })
      .link('v.a.1', 'fa')
      .link('v.a.2', 'fb')
      .link('v.b.1', 'fa')
      .link('v.b.2', 'fb')
      .link('h1.c1.1', 'fa')
      .link('h1.c2.1', 'fb')
      .feed('constructor')
      .feed('__proto__');
    const doc = valid(draft.psus('fa', ['constructor', 'constructor']).psus('fb', ['__proto__']).build());
    doc.devices.find((d) => d.id === 'fb')!.psus![0].id = 'toString';
    const report = analyze(doc, { afterOne: true });
    expect(report.hosts).toEqual(bruteForcePowerHosts(doc));
    expect(report.afterOneFailure).toEqual(bruteForceAfterOne(doc));
    expect(report.afterOneFailure!.find((e) => e.failed === 'constructor')!.exposed[0].singlePointsOfFailure).toEqual(['__proto__', 'fb', 'h1.c2', 'k6', 'toString']);
  });

  it('leaves a design without power exactly as before', () => {
    const doc = valid(fabric().build());
    const report = analyze(doc);
    expect(pairOf(doc).redundant).toBe(true);
    expect(report.findings.some((f) => f.rule === 'psu-no-feed' || f.rule === 'psus-one-feed')).toBe(false);
  });
});
