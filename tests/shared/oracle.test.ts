import { analyze } from '@/shared/analysis/analyze';
import { validateTopology } from '@/shared/topology/validate';
import { bruteForceHosts, failureUnits } from './helpers/oracle';
import type { Topology } from '@/shared/topology/schema';
import { randomDesign, randomFailures } from './helpers/random-design';

// The dominator method must give exactly what failing every unit in turn gives.
const DESIGNS = 600;

/** The hard cases a random design holds, so the test can check the generator makes each of them. */
function features(doc: Topology): string[] {
  const owner = new Map<string, { kind: string; role?: string; networkId?: string; portRole: string }>();
  for (const d of doc.devices) {
    const groups = d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : [d];
    for (const g of groups) for (const p of g.ports) owner.set(p.id, { kind: d.kind, role: d.kind === 'switch' ? d.role : undefined, networkId: p.networkId, portRole: p.role });
  }
  const found = new Set<string>();
  if (doc.networks.length === 0) found.add('no networks');
  if (doc.devices.some((d) => d.kind === 'array' && d.controllers.length === 4)) found.add('four controllers');
  const cabled = new Map<string, number>();
  for (const c of doc.cables) {
    const [a, b] = [owner.get(c.a)!, owner.get(c.b)!];
    for (const end of [c.a, c.b]) cabled.set(end, (cabled.get(end) ?? 0) + 1);
    const kinds = [a.kind, b.kind].sort().join('-');
    if (kinds === 'switch-switch') found.add('inter-switch link');
    if (kinds === 'array-host') found.add('direct attach');
    if (kinds === 'host-host') found.add('host to host');
    for (const end of [a, b]) {
      if (end.role === 'shared') found.add('shared switch');
      if (end.role === 'management') found.add('management switch');
      if (end.kind !== 'switch' && end.portRole === 'data' && doc.networks.length > 0 && !end.networkId) found.add('data port without network');
      if (end.kind !== 'switch' && end.portRole === 'management') found.add('management port cabled');
      const network = doc.networks.find((n) => n.id === end.networkId);
      if (end.portRole === 'data' && network?.purpose === 'management') found.add('data port on management network');
    }
  }
  if ([...cabled.values()].some((n) => n > 1)) found.add('port cabled twice');
  for (const d of doc.devices) {
    const groups = d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : [];
    if (groups.some((g) => g.ports.some((p) => p.address?.mode === 'dhcp'))) found.add('DHCP address');
  }
  return [...found];
}

describe('analysis against the brute-force oracle', () => {
  it(`gives identical hosts[] on ${DESIGNS} seeded random designs`, () => {
    let pairs = 0;
    let withSpof = 0;
    const seen = new Map<string, number>();
    for (let seed = 1; seed <= DESIGNS; seed += 1) {
      const doc = randomDesign(seed);
      const checked = validateTopology(doc);
      if (!checked.ok) throw new Error(`seed ${seed}: ${JSON.stringify(checked.issues)}`);
      const expected = bruteForceHosts(doc);
      const actual = analyze(doc).hosts;
      if (JSON.stringify(actual) !== JSON.stringify(expected)) {
        expect({ seed, actual }).toEqual({ seed, actual: expected });
      }
      for (const feature of features(doc)) seen.set(feature, (seen.get(feature) ?? 0) + 1);
      pairs += expected.length;
      withSpof += expected.filter((p) => !p.redundant).length;
    }
    // The generator must produce both redundant and non-redundant pairs, or the comparison proves little.
    expect(withSpof).toBeGreaterThan(300);
    expect(pairs - withSpof).toBeGreaterThan(150);
    // Every hard case turns up in dozens of the designs compared.
    const rare = [
      'no networks', 'four controllers', 'inter-switch link', 'direct attach', 'host to host', 'shared switch',
      'management switch', 'data port without network', 'management port cabled', 'data port on management network',
      'port cabled twice', 'DHCP address',
    ].filter((feature) => (seen.get(feature) ?? 0) < 25);
    expect(rare).toEqual([]);
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
