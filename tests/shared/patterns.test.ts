import { analyze } from '@/shared/analysis/analyze';
import { directAttach, dualFabric, dualFabricWithManagement, PATTERNS } from '@/shared/patterns';
import { validateTopology } from '@/shared/topology/validate';

const errorsOf = (doc: Parameters<typeof analyze>[0]) => analyze(doc).findings.filter((f) => f.severity === 'error');

describe('pattern starters', () => {
  it.each(PATTERNS.map((p) => [p.id, p.build] as const))('%s builds a valid document with positions for every device', (_, build) => {
    const doc = build({ hosts: 5 });
    const checked = validateTopology(doc);
    expect(checked.ok).toBe(true);
    expect(Object.keys(doc.layout!).sort()).toEqual(doc.devices.map((d) => d.id).sort());
  });

  it.each(PATTERNS.map((p) => [p.id, p.build] as const))('%s is redundant and error-free with two cards per host', (_, build) => {
    const doc = build({ hosts: 4, cardsPerHost: 2, iqnPrefix: 'iqn.2026-01.example.tidewater', chap: 'mutual' });
    const report = analyze(doc);
    expect(report.hosts).toHaveLength(4);
    expect(report.hosts.every((p) => p.redundant && p.controllersReached.length === 2)).toBe(true);
    expect(errorsOf(doc)).toEqual([]);
  });

  it('shows the card as the single point of failure when hosts have one dual-port card', () => {
    const report = analyze(dualFabric({ hosts: 2, cardsPerHost: 1, portsPerCard: 2 }));
    expect(report.hosts.map((p) => p.singlePointsOfFailure)).toEqual([['host-1.card-1'], ['host-2.card-1']]);
  });

  it('spreads direct attach over both cards when the array has more controllers than the host has cards', () => {
    // four controllers, two dual-port cards: card-1.p1 → ctl-a, card-2.p1 → ctl-b, card-1.p2 → ctl-c, card-2.p2 → ctl-d
    const report = analyze(directAttach({ hosts: 2, controllers: 4, cardsPerHost: 2, portsPerCard: 2 }));
    expect(report.hosts.map((p) => [p.sessions, p.controllersReached.length, p.redundant])).toEqual([
      [4, 4, true],
      [4, 4, true],
    ]);
  });

  it('is deterministic, ids included', () => {
    expect(JSON.stringify(dualFabricWithManagement({ hosts: 3 }))).toBe(JSON.stringify(dualFabricWithManagement({ hosts: 3 })));
    expect(directAttach({ hosts: ['db-1'] }).devices.map((d) => d.id)).toEqual(['array-1', 'db-1']);
  });

  it('counts sessions per fabric: two controller ports per fabric and controller', () => {
    const report = analyze(dualFabric({ hosts: 1, controllerPorts: 4 }));
    expect(report.hosts[0].sessions).toBe(8); // 2 host ports × (2 controllers × 2 ports on the same fabric)
  });

  it('sizes switches to fit, in the sizes switches are sold in', () => {
    const doc = dualFabric({ hosts: 30 });
    const fabA = doc.devices.find((d) => d.id === 'fab-a');
    expect(fabA?.kind === 'switch' && fabA.ports.length).toBe(48); // 30 hosts + 2 controller ports → 48 (common practice sizes)
  });

  it('addresses every storage port in its fabric, skipping the gateway of the management network', () => {
    const doc = dualFabricWithManagement({ hosts: 2 });
    const ctlA = doc.devices[0].kind === 'array' ? doc.devices[0].controllers[0] : undefined;
    expect(ctlA!.ports.map((p) => p.address)).toEqual([
      { mode: 'static', ip: '198.51.100.1' }, // first host address of an RFC 5737 /24
      { mode: 'static', ip: '203.0.113.1' },
      { mode: 'static', ip: '192.0.2.2' }, // 192.0.2.1 is the management gateway
    ]);
  });
});
