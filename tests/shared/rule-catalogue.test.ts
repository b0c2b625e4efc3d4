import { analyze } from '@/shared/analysis/analyze';
import { RULES } from '@/shared/analysis/rules';
import type { Finding } from '@/shared/analysis/types';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import type { HostDevice, Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { Draft } from './helpers/draft';
import { randomDesign } from './helpers/random-design';
import * as T from './helpers/topologies';

/** The rule ids docs/analysis.md requires, with the severities it fixes, copied from the page. */
const REQUIRED = [
  'single-point-of-failure', 'host-unreachable', 'one-controller-only',
  'management-port-on-data-switch', 'data-port-on-management-switch', 'management-data-bridge', 'shared-switch-in-use',
  'network-overlap', 'management-data-same-subnet', 'address-outside-network', 'address-duplicate', 'address-reserved',
  'vlan-out-of-range', 'mtu-mismatch', 'port-unaddressed',
  'port-double-cabled', 'connector-mismatch', 'speed-mismatch', 'media-unsuited', 'cable-too-long', 'cable-unmeasured',
  'iqn-invalid', 'iqn-duplicate', 'chap-off',
];
const SEVERITY_IN_SPEC = { 'shared-switch-in-use': 'warning', 'cable-unmeasured': 'info', 'chap-off': 'warning' };

/**
 * One design holding one of every mistake:
 *   h1 ==c1== fa == v.a (na) ; fa -k- oob (management) ; fa == h1.onboard (management port) ;
 *   h2 (data ports, uncabled) ; h3 ==c1 (nc)== sh (shared) == v.b (na) ; h4.c1.1 == h5.c1.1 ; v.b.2 (mgmt) == h3.c2.1 …
 */
function everyMistake(): Topology {
  const d = new Draft()
    .network('na', '198.51.100.0/24', { vlan: 4095, mtu: 9000 }) // IEEE 802.1Q: 4095 reserved
    .network('nb', '198.51.100.128/25') // RFC 4632: inside na
    .network('nm', '198.51.100.0/26', { purpose: 'management' })
    .network('nc', '203.0.113.0/24', { mtu: 100 }) // below RFC 791's 576
    .network('nd', '192.0.2.7/24') // host bits set
    .network('ne', '169.254.10.0/24') // RFC 3927 link-local
    .network('nf', '127.0.0.0/8') // RFC 1122 §3.2.1.3 loopback
    .network('ng', '100.64.0.0/24') // RFC 6598 shared address space
    .network('nh', '11.0.0.0/24') // outside every special-use (RFC 6890) and private (RFC 1918) block: public
    .network('ni', '10.20.0.0/24', { purpose: 'management', vlan: 120 })
    .network('nj', '10.30.0.0/24', { vlan: 120 }) // one VLAN id for management and data (common practice)
    .array('v', { a: [{ networkId: 'na' }, { networkId: 'na' }], b: [{ networkId: 'na' }, { role: 'management', speedGbps: 1 }] })
    .switch('fa')
    .switch('oob', 'management')
    .switch('sh', 'shared')
    .host('h1', { c1: [{ networkId: 'na' }], onboard: [{ role: 'management', speedGbps: 1 }] }, { iqn: 'iqn.2026-13.example.tidewater' })
    .host('h2', { c1: 1 }, { iqn: 'iqn.2026-01.example.tidewater:same' })
    .host('h3', { c1: [{ networkId: 'nc' }], c2: [{}] }, { iqn: 'IQN.2026-01.EXAMPLE.TIDEWATER:SAME' })
    .host('h4', { c1: 1 })
    .host('h5', { c1: 1 })
    .array('w', { a: [{ networkId: 'nj' }, { networkId: 'nj' }] })
    .host('h6', { c1: [{ networkId: 'nj' }, { networkId: 'nj' }], c2: 1 })
    .link('v.a.1', 'fa')
    .link('h1.c1.1', 'fa')
    .link('fa', 'oob')
    .link('h1.onboard.1', 'fa')
    .link('v.b.1', 'sh')
    .link('h3.c1.1', 'sh')
    .link('h3.c1.1', 'oob') // cabled twice, and a data port on a management switch
    .link('h4.c1.1', 'h5.c1.1')
    .link('v.b.2', 'h3.c2.1')
    .link('v.a.2', 'fa')
    .link('h6.c1.1', 'w.a.1') // two direct-attach links of w.a on one subnet (common practice)
    .link('h6.c1.2', 'w.a.2');
  d.port('v.b.1').address = { mode: 'dhcp' }; // a target portal on DHCP (common practice)
  d.device('h4').name = 'H5'; // same name as h5 once case is folded
  (d.device('h6') as HostDevice).adapters[1].name = 'c1'; // two cards named c1
  d.port('w.a.2').name = '1'; // two ports named 1 on one controller
  d.port('v.a.1').address = { mode: 'static', ip: '203.0.113.9' }; // outside na
  d.port('h1.c1.1').address = { mode: 'static', ip: '198.51.100.255' }; // na's broadcast address
  d.port('v.a.2').address = { mode: 'static', ip: '203.0.113.9' }; // same as v.a.1
  d.port('v.a.2').connector = 'sfp'; // RJ45 switch port on the other end
  d.port('h3.c1.1').speedGbps = 25;
  d.media('k1', 'cat5e'); // 10GBASE-T needs Category 6 or better (IEEE 802.3an)
  d.media('k2', 'cat6', 80); // past 55 m (IEEE 802.3an)
  d.media('k5', 'cat6a'); // no length
  d.port('h3.c1.1').address = { mode: 'dhcp' };
  // The room: rack r1 in row A; r2 200 racks along row B, 200 × 600 mm + 1200 mm away (site defaults).
  d.rack('r1', { row: 'A', position: 1 }).rack('r2', { row: 'B', position: 200 });
  d.place('h1', 'r1', 10).place('h2', 'r1', 10); // both in unit 10
  d.place('h3', 'r1', 42, 2); // units 42–43 of a 42U rack
  d.place('fa', 'r2', 40).place('v', 'r2', 20).place('sh', 'r1', 40);
  // k2 (h1 → fa, 80 m of Category 6): shorter than the ~121 m estimate.
  // k5 (v.b.1 → sh, Category 6A, no length): ~121 m estimate, past 10GBASE-T's 100 m (IEEE 802.3an).
  const doc = d.build();
  // Power: sh's only PSU on no feed (psu-no-feed); fa's two PSUs on one feed (psus-one-feed). Common practice.
  doc.powerFeeds = [{ id: 'feed-1', name: 'Feed 1' }];
  for (const device of doc.devices) {
    if (device.id === 'sh') device.psus = [{ id: 'sh-psu', name: 'PSU 1' }];
    if (device.id === 'fa') device.psus = [{ id: 'fa-psu-1', name: 'PSU 1', feedId: 'feed-1' }, { id: 'fa-psu-2', name: 'PSU 2', feedId: 'feed-1' }];
  }
  return doc;
}

function everyFinding(): { doc: Topology; finding: Finding }[] {
  const docs = [everyMistake(), harborRoadV1(), harborRoadV2(), ...Object.values(T).map((make) => {
    const made = make();
    return 'build' in made ? made.build() : made;
  })];
  for (let seed = 1; seed <= 200; seed += 1) docs.push(randomDesign(seed));
  return docs.flatMap((doc) => analyze(doc).findings.map((finding) => ({ doc, finding })));
}

function idsOf(doc: Topology): Set<string> {
  const ids = new Set<string>([...doc.cables.map((c) => c.id), ...doc.networks.map((n) => n.id), ...(doc.racks ?? []).map((r) => r.id), ...(doc.powerFeeds ?? []).map((f) => f.id)]);
  for (const d of doc.devices) {
    ids.add(d.id);
    for (const psu of d.psus ?? []) ids.add(psu.id);
    const groups = d.kind === 'array' ? d.controllers : d.kind === 'host' ? d.adapters : [d];
    for (const g of groups) {
      ids.add(g.id);
      for (const p of g.ports) ids.add(p.id);
    }
  }
  return ids;
}

describe('the rule catalogue', () => {
  it('holds every rule id docs/analysis.md requires, with the severities it names', () => {
    expect(REQUIRED.filter((rule) => !(rule in RULES))).toEqual([]);
    for (const [rule, severity] of Object.entries(SEVERITY_IN_SPEC)) expect({ rule, severity: RULES[rule as keyof typeof RULES] }).toEqual({ rule, severity });
  });

  it('fires every rule it lists on a design that holds one of every mistake', () => {
    const doc = everyMistake();
    expect(validateTopology(doc)).toMatchObject({ ok: true }); // every one of them is a drafting mistake, not an unreadable document
    const fired = new Set(analyze(doc).findings.map((f) => f.rule));
    expect(Object.keys(RULES).filter((rule) => !fired.has(rule))).toEqual([]);
  });

  it('reports each finding with its catalogue severity, ids of the document as subjects and a full sentence', () => {
    const wrong: unknown[] = [];
    for (const { doc, finding } of everyFinding()) {
      const ids = idsOf(doc);
      const severity = RULES[finding.rule as keyof typeof RULES];
      const strangers = finding.subjects.filter((id) => !ids.has(id));
      if (severity !== finding.severity || strangers.length > 0 || !/^\S.*[.]$/s.test(finding.message) || /undefined|\[object/.test(finding.message)) {
        wrong.push({ finding, severity, strangers });
      }
    }
    expect(wrong).toEqual([]);
  });

  it('reports nothing above info on the approved demo design', () => {
    expect(analyze(harborRoadV2()).findings.filter((f) => f.severity !== 'info')).toEqual([]);
  });
});
