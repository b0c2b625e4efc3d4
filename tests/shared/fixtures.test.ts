import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import v1Json from '@/shared/fixtures/harbor-road-v1.json';
import v2Json from '@/shared/fixtures/harbor-road-v2.json';
import { validateTopology } from '@/shared/topology/validate';

function load(json: unknown) {
  const checked = validateTopology(json);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.doc;
}

describe('Harbor Road demo fixtures', () => {
  it('are exactly what the builders make', () => {
    expect(v1Json).toEqual(harborRoadV1());
    expect(v2Json).toEqual(harborRoadV2());
  });

  it('match the demo scenario: vault-1, fab-a, fab-b, oob-1 and six hosts with two dual-port cards', () => {
    const doc = load(v2Json);
    expect(doc.devices.map((d) => d.id)).toEqual(['vault-1', 'fab-a', 'fab-b', 'oob-1', 'wms-db-1', 'wms-db-2', 'wms-app-1', 'wms-app-2', 'cam-rec-1', 'cam-rec-2']);
    const vault = doc.devices[0];
    if (vault.kind !== 'array') throw new Error('vault-1 is an array');
    for (const controller of vault.controllers) {
      expect(controller.ports.filter((p) => p.role === 'data' && p.speedGbps === 10 && p.connector === 'rj45')).toHaveLength(4);
      expect(controller.ports.filter((p) => p.role === 'management')).toHaveLength(1);
    }
    for (const host of doc.devices.filter((d) => d.kind === 'host')) {
      if (host.kind !== 'host') continue;
      expect(host.iqn).toMatch(/^iqn\.2026-01\.example\.tidewater:/); // RFC 7143 §4.2.7.4 form
      const cards = host.adapters.filter((a) => a.ports.every((p) => p.role === 'data'));
      expect(cards.map((c) => c.ports.length)).toEqual([2, 2]);
    }
    expect(doc.networks.map((n) => [n.cidr, n.vlan, n.mtu])).toEqual([
      ['198.51.100.0/24', 110, 9000], // RFC 5737 §3
      ['203.0.113.0/24', 120, 9000], // RFC 5737 §3
      ['192.0.2.0/24', 10, 1500], // RFC 5737 §3; MTU 1500 per RFC 894
    ]);
  });

  it('version 1 shows cam-rec-2 single points of failure and the management port on a data switch', () => {
    const doc = load(v1Json);
    const report = analyze(doc);
    const cam = report.hosts.find((p) => p.host === 'cam-rec-2')!;
    expect(cam.singlePointsOfFailure).toEqual(expect.arrayContaining(['fab-a', 'cam-rec-2.card-1']));
    expect(cam.redundant).toBe(false);
    expect(report.hosts.filter((p) => !p.redundant).map((p) => p.host)).toEqual(['cam-rec-2']);
    const spof = report.findings.find((f) => f.rule === 'single-point-of-failure')!;
    expect(spof.message).toMatch(/^cam-rec-2 reaches vault-1 only through switch fab-a, card-1 of cam-rec-2 and cable HR-A-\d\d/);
    const mgmt = report.findings.find((f) => f.rule === 'management-port-on-data-switch')!;
    expect(mgmt.subjects.slice(0, 2)).toEqual(['vault-1.ctl-b.mgmt', 'fab-b']);
    expect(summarize(report, doc)).toEqual({ errors: 2, warnings: 2, singlePointsOfFailure: 3, hosts: 6, redundantHosts: 5 });
  });

  it('version 2 has no single point of failure and no errors', () => {
    const doc = load(v2Json);
    const report = analyze(doc);
    expect(report.failures).toEqual([]);
    expect(report.findings.filter((f) => f.severity === 'error')).toEqual([]);
    expect(report.hosts.map((p) => [p.host, p.sessions, p.controllersReached.length])).toEqual([
      ['cam-rec-1', 8, 2], // 2 storage ports × (2 controllers × 2 ports on the port's fabric)
      ['cam-rec-2', 8, 2],
      ['wms-app-1', 8, 2],
      ['wms-app-2', 8, 2],
      ['wms-db-1', 8, 2],
      ['wms-db-2', 8, 2],
    ]);
    expect(summarize(report, doc)).toEqual({ errors: 0, warnings: 0, singlePointsOfFailure: 0, hosts: 6, redundantHosts: 6 });
  });
});
