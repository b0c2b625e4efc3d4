import { analyze } from '@/shared/analysis/analyze';
import type { Report } from '@/shared/analysis/types';
import { Draft } from './helpers/draft';
import { twoFabrics } from './helpers/topologies';

/** The data-path and session rules of docs/analysis.md, one case each. */
const pair = (report: Report, host = 'h1', array = 'v') => report.hosts.find((p) => p.host === host && p.array === array);

/** v.a.1 (na), v.a.2 (nb), v.b.1 (na), v.b.2 (nb) == fa ; h1 ==c1== fa, h1 ==c2== fa  — one switch, two networks */
function twoNetworksOneSwitch(hostNetworks: [string | undefined, string | undefined]) {
  const d = new Draft()
    .network('na', '198.51.100.0/24') // RFC 5737 §3
    .network('nb', '203.0.113.0/24') // RFC 5737 §3
    .array('v', { a: [{ networkId: 'na' }, { networkId: 'nb' }], b: [{ networkId: 'na' }, { networkId: 'nb' }] })
    .switch('fa')
    .host('h1', { c1: [{ networkId: hostNetworks[0] }], c2: [{ networkId: hostNetworks[1] }] });
  for (const end of ['v.a.1', 'v.a.2', 'v.b.1', 'v.b.2', 'h1.c1.1', 'h1.c2.1']) d.link(end, 'fa');
  return d.build();
}

describe('sessions pair ports by network', () => {
  it('pairs each host port with the controller ports of its own network only', () => {
    expect(pair(analyze(twoNetworksOneSwitch(['na', 'nb'])))!.sessions).toBe(4); // 2 host ports × 2 controller ports each
  });

  it('lets a data port with no network pair with every network, and reports the port', () => {
    const report = analyze(twoNetworksOneSwitch([undefined, 'nb']));
    expect(pair(report)!.sessions).toBe(4 + 2); // the port without a network pairs with all four controller ports
    expect(report.findings.filter((f) => f.rule === 'port-unaddressed').map((f) => f.subjects)).toContainEqual(['h1.c1.1']);
  });

  it('pairs every data port with every other when the document has no networks', () => {
    const doc = twoNetworksOneSwitch([undefined, undefined]);
    doc.networks = [];
    for (const d of doc.devices) for (const g of d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : []) for (const p of g.ports) delete p.networkId;
    expect(pair(analyze(doc))!.sessions).toBe(8);
  });

  it('pairs nothing across networks, so a controller seen only over the wrong network is not reached', () => {
    // h1 (na) == fa == v.a.1 (na) ; v.b.1 (nb) == fa
    const doc = new Draft()
      .network('na', '198.51.100.0/24')
      .network('nb', '203.0.113.0/24')
      .array('v', { a: [{ networkId: 'na' }], b: [{ networkId: 'nb' }] })
      .switch('fa')
      .host('h1', { c1: [{ networkId: 'na' }] })
      .link('v.a.1', 'fa')
      .link('v.b.1', 'fa')
      .link('h1.c1.1', 'fa')
      .build();
    expect(pair(analyze(doc))).toMatchObject({ sessions: 1, controllersReached: ['v.a'] });
  });

  it('pairs by network id even when a data port sits on a management network, and reports the port', () => {
    const d = twoFabrics();
    d.doc.networks[1].purpose = 'management';
    const report = analyze(d.build());
    expect(pair(report)!.sessions).toBe(4);
    expect(report.findings.filter((f) => f.rule === 'management-data-same-subnet').map((f) => f.subjects[0]).sort()).toEqual(['h1.c2.1', 'v.a.2', 'v.b.2']);
  });

  it('counts a DHCP-addressed port like a static one', () => {
    const d = twoFabrics();
    d.port('h1.c1.1').address = { mode: 'dhcp' };
    d.port('h1.c2.1').address = { mode: 'static', ip: '203.0.113.21' }; // RFC 5737 §3
    expect(pair(analyze(d.build()))).toMatchObject({ sessions: 4, redundant: true });
  });

  it('counts a pair once when a port is cabled twice into the same fabric', () => {
    // h1.c1.1 == fa twice ; v.a.1 == fa
    const doc = new Draft().array('v', { a: 1 }).switch('fa').host('h1', { c1: 1 }).link('v.a.1', 'fa').link('h1.c1.1', 'fa').link('h1.c1.1', 'fa').build();
    const report = analyze(doc);
    expect(pair(report)).toMatchObject({ sessions: 1, singlePointsOfFailure: ['fa', 'h1.c1', 'k1', 'v.a'] }); // neither host cable alone cuts it off
  });
});

describe('what forwards and what does not', () => {
  it('forwards through a ring of data switches, so no inter-switch cable is a single point of failure', () => {
    // h1 ==c1== s1 ; h1 ==c2== s2 ; s1 - s2 - s3 - s1 ; v.a, v.b == s3
    const doc = new Draft()
      .array('v', { a: 1, b: 1 })
      .switch('s1')
      .switch('s2')
      .switch('s3')
      .host('h1', { c1: 1, c2: 1 })
      .link('h1.c1.1', 's1')
      .link('h1.c2.1', 's2')
      .link('s1', 's2')
      .link('s2', 's3')
      .link('s3', 's1')
      .link('v.a.1', 's3')
      .link('v.b.1', 's3')
      .build();
    expect(pair(analyze(doc))!.singlePointsOfFailure).toEqual(['s3']);
  });

  it('does not forward through a controller: a host cabled to one controller does not reach the other through it', () => {
    // h1 == v.a.1 ; v.a.2 == fa == v.b.1
    const doc = new Draft().array('v', { a: 2, b: 1 }).switch('fa').host('h1', { c1: 1 }).link('h1.c1.1', 'v.a.1').link('v.a.2', 'fa').link('v.b.1', 'fa').build();
    expect(pair(analyze(doc))).toMatchObject({ sessions: 1, controllersReached: ['v.a'] });
  });

  it('carries data over any port of a data switch, whatever role the switch port is marked with', () => {
    const d = twoFabrics();
    const fa = d.device('fa');
    if (fa.kind === 'switch') fa.ports.forEach((p) => (p.role = 'management')); // a switch port's role is informational
    expect(pair(analyze(d.build()))).toMatchObject({ sessions: 4, redundant: true });
  });
});

describe('failure units', () => {
  it('takes a failed controller with its ports', () => {
    expect(pair(analyze(twoFabrics().build(), { failed: ['v.a'] }))).toMatchObject({ sessions: 2, controllersReached: ['v.b'], singlePointsOfFailure: ['v.b'] });
  });

  it('takes a failed card with its ports', () => {
    expect(pair(analyze(twoFabrics().build(), { failed: ['h1.c1'] }))).toMatchObject({ sessions: 2, singlePointsOfFailure: ['fb', 'h1.c2', 'k6'] });
  });

  it('never names a host or an array chassis, and lists in failures[] only units that cut someone off', () => {
    const report = analyze(twoFabrics().build(), { failed: ['fb'] });
    expect(report.failures.map((f) => [f.unit, f.kind])).toEqual([
      ['fa', 'switch'],
      ['h1.c1', 'adapter'],
      ['k5', 'cable'],
    ]);
    expect(report.failures.every((f) => f.cutsOff.length === 1 && f.cutsOff[0].host === 'h1' && f.cutsOff[0].array === 'v')).toBe(true);
  });

  it('lists hosts[] only for pairs with a session', () => {
    const doc = twoFabrics().array('w', { a: 1 }).build(); // w is not cabled
    expect(analyze(doc).hosts.map((p) => p.array)).toEqual(['v']);
  });
});
