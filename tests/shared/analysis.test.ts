import { analyze } from '@/shared/analysis/analyze';
import type { HostArrayResult, Report } from '@/shared/analysis/types';
import * as T from './helpers/topologies';
import { randomDesign } from './helpers/random-design';

const pair = (report: Report, host: string, array: string): HostArrayResult | undefined =>
  report.hosts.find((p) => p.host === host && p.array === array);
const rules = (report: Report) => report.findings.map((f) => f.rule);

describe('single points of failure on the named topologies', () => {
  it('finds no single point of failure when two cards go straight to two controllers', () => {
    expect(analyze(T.directAttachTwoCards()).hosts).toEqual([
      { host: 'h1', array: 'v', sessions: 2, controllersReached: ['v.a', 'v.b'], singlePointsOfFailure: [], redundant: true },
    ]);
  });

  it('reports the card when both ports of one dual-port card carry all the paths', () => {
    const report = analyze(T.directAttachOneDualPortCard());
    expect(pair(report, 'h1', 'v')).toMatchObject({ sessions: 2, singlePointsOfFailure: ['h1.c1'], redundant: false });
    expect(report.failures).toEqual([{ unit: 'h1.c1', kind: 'adapter', cutsOff: [{ host: 'h1', array: 'v' }] }]);
  });

  it('reports the switch as a single point of failure when both host cards use it', () => {
    const report = analyze(T.oneSwitch());
    expect(pair(report, 'h1', 'v')).toMatchObject({ sessions: 4, singlePointsOfFailure: ['fa'] });
    const finding = report.findings.find((f) => f.rule === 'single-point-of-failure')!;
    expect(finding.message).toBe('h1 reaches v only through switch fa; losing it cuts h1 off from v.');
  });

  it('counts four sessions and no single point of failure on two clean fabrics', () => {
    expect(pair(analyze(T.twoFabrics().build()), 'h1', 'v')).toEqual({
      host: 'h1',
      array: 'v',
      sessions: 4,
      controllersReached: ['v.a', 'v.b'],
      singlePointsOfFailure: [],
      redundant: true,
    });
  });

  it('loses the second fabric when a host port is addressed for the wrong one', () => {
    expect(pair(analyze(T.wrongFabricAddress()), 'h1', 'v')).toMatchObject({
      sessions: 2,
      singlePointsOfFailure: ['fa', 'h1.c1', 'k5'],
    });
  });

  it('routes through an inter-switch link without making it a single point of failure', () => {
    expect(pair(analyze(T.interSwitchLink()), 'h1', 'v')).toMatchObject({ sessions: 4, singlePointsOfFailure: [], redundant: true });
  });

  it('reports every switch and link of a chain', () => {
    expect(pair(analyze(T.switchChain()), 'h1', 'v')!.singlePointsOfFailure).toEqual(['k3', 'k4', 's1', 's2', 's3']);
  });

  it('never forwards data through a management switch', () => {
    const report = analyze(T.managementSwitchInPath());
    expect(report.hosts).toEqual([]);
    expect(rules(report)).toEqual(expect.arrayContaining(['host-unreachable', 'management-data-bridge']));
  });

  it('reports the controller and one-controller-only when only one controller is cabled', () => {
    const report = analyze(T.oneControllerCabled());
    expect(pair(report, 'h1', 'v')).toMatchObject({ controllersReached: ['v.a'], singlePointsOfFailure: ['v.a'] });
    const finding = report.findings.find((f) => f.rule === 'one-controller-only')!;
    expect(finding.subjects).toEqual(['h1', 'v', 'v.a']);
    expect(finding.message).toBe('h1 reaches only controller a of v; when that controller fails or restarts for an update, h1 loses v.');
  });

  it('does not let a host carry another host to its storage', () => {
    const report = analyze(T.hostsDoNotForward());
    expect(report.hosts.map((p) => p.host)).toEqual(['h1']);
    expect(report.findings.find((f) => f.rule === 'host-unreachable')!.subjects).toEqual(['h2']);
  });

  it('carries data over a shared switch and warns that it is in use', () => {
    const report = analyze(T.sharedSwitch());
    expect(pair(report, 'h1', 'v')).toMatchObject({ sessions: 4, redundant: true });
    expect(report.findings.find((f) => f.rule === 'shared-switch-in-use')).toMatchObject({ severity: 'warning', subjects: ['sh'] });
  });

  it('judges each array separately', () => {
    const report = analyze(T.twoArrays());
    expect(pair(report, 'h1', 'v1')!.redundant).toBe(true);
    expect(pair(report, 'h1', 'v2')!.singlePointsOfFailure).toEqual(['fa', 'h1.c1', 'k5']);
    expect(report.failures.find((f) => f.unit === 'fa')).toEqual({ unit: 'fa', kind: 'switch', cutsOff: [{ host: 'h1', array: 'v2' }] });
  });

  it('keeps management and data apart', () => {
    const report = analyze(T.managementDataMixing());
    expect(rules(report)).toEqual(
      expect.arrayContaining(['management-port-on-data-switch', 'data-port-on-management-switch', 'management-data-bridge']),
    );
    const onData = report.findings.filter((f) => f.rule === 'management-port-on-data-switch');
    expect(onData.map((f) => f.subjects[0]).sort()).toEqual(['h1.onboard.1', 'v.a.2']);
  });
});

describe('what-if failures', () => {
  it('analyses the design as if the chosen units had failed', () => {
    const report = analyze(T.twoFabrics().build(), { failed: ['fa'] });
    expect(pair(report, 'h1', 'v')).toMatchObject({ sessions: 2, singlePointsOfFailure: ['fb', 'h1.c2', 'k6'], redundant: false });
  });

  it('reports the host unreachable when both paths have failed', () => {
    const report = analyze(T.twoFabrics().build(), { failed: ['h1.c1', 'k6'] });
    expect(report.hosts).toEqual([]);
    expect(rules(report)).toContain('host-unreachable');
  });

  it('ignores ids that are not failure units', () => {
    const doc = T.twoFabrics().build();
    expect(analyze(doc, { failed: ['h1', 'v', 'nothing'] })).toEqual(analyze(doc));
  });
});

describe('determinism', () => {
  it('gives hosts[] and failures[] in id order whatever order a random design lists its parts in', () => {
    for (let seed = 1; seed <= 150; seed += 1) {
      const doc = randomDesign(seed);
      const turned = {
        ...doc,
        devices: [...doc.devices].reverse().map((d) => (d.kind === 'array' ? { ...d, controllers: [...d.controllers].reverse() } : d.kind === 'host' ? { ...d, adapters: [...d.adapters].reverse() } : d)),
        cables: [...doc.cables].reverse(),
        networks: [...doc.networks].reverse(),
      };
      const [a, b] = [analyze(doc), analyze(turned)];
      expect({ seed, hosts: JSON.stringify(b.hosts), failures: JSON.stringify(b.failures) }).toEqual({ seed, hosts: JSON.stringify(a.hosts), failures: JSON.stringify(a.failures) });
      const ids = a.hosts.map((p) => `${p.host}\u0000${p.array}`);
      expect(ids).toEqual([...ids].sort());
    }
  });

  it('gives byte-identical JSON for the same document', () => {
    const doc = T.twoArrays();
    expect(JSON.stringify(analyze(doc))).toBe(JSON.stringify(analyze(JSON.parse(JSON.stringify(doc)))));
  });

  it('gives the same hosts[] and failures[] whatever order devices and cables come in', () => {
    const doc = T.twoArrays();
    const shuffled = { ...doc, devices: [...doc.devices].reverse(), cables: [...doc.cables].reverse() };
    const a = analyze(doc);
    const b = analyze(shuffled);
    expect(b.hosts).toEqual(a.hosts);
    expect(b.failures).toEqual(a.failures);
    expect(b.findings).toEqual(a.findings);
  });
});
