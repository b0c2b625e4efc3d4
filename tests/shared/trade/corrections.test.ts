import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import type { Finding } from '@/shared/analysis/types';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { directAttach, dualFabricWithManagement } from '@/shared/patterns';
import { checkIscsiName } from '@/shared/rules/iqn';
import type { Topology } from '@/shared/topology/schema';
import { Draft } from '../helpers/draft';
import { twoFabrics } from '../helpers/topologies';

const of = (doc: Topology, rule: string): Finding[] => analyze(doc).findings.filter((f) => f.rule === rule);

/** One network of the given block beside a valid two-fabric design, and what the block rules say of it. */
function blockVerdict(cidr: string): string[] {
  const d = twoFabrics().network('nx', cidr);
  return analyze(d.build())
    .findings.filter((f) => f.subjects.includes('nx') && f.rule.startsWith('network-'))
    .map((f) => `${f.rule}:${f.severity}`);
}

describe('CHAP off', () => {
  it('says that a claimed initiator name is all it takes, not that any initiator can log in', () => {
    const [finding] = of(twoFabrics().build(), 'chap-off');
    // RFC 7143 §9: without CHAP the target only checks the initiator name the initiator states (from memory)
    expect(finding.message).toContain('any initiator that presents an allowed initiator name can log in');
    expect(finding.message).toContain('easy to claim');
    expect(finding.severity).toBe('warning'); // docs/analysis.md: chap-off is a warning
  });
});

describe('direct attach', () => {
  it('gives every point-to-point link of the pattern its own subnet', () => {
    const doc = directAttach({ hosts: 3, controllers: 2 });
    const cables = doc.cables;
    const networksOf = cables.map((c) => {
      const ends = [c.a, c.b].map((id) => doc.devices.flatMap((d) => (d.kind === 'switch' ? d.ports : d.kind === 'array' ? d.controllers.flatMap((g) => g.ports) : d.adapters.flatMap((g) => g.ports))).find((p) => p.id === id)!);
      expect(ends[0].networkId).toBe(ends[1].networkId); // both ends of a link on its subnet
      return ends[0].networkId;
    });
    expect(new Set(networksOf).size).toBe(cables.length); // common practice: one subnet per direct-attach link
    const report = analyze(doc);
    expect(report.findings.filter((f) => f.severity === 'error' || f.rule === 'direct-attach-shared-subnet')).toEqual([]);
    expect(report.hosts.every((h) => h.redundant)).toBe(true);
  });

  it('uses /30 blocks of the documentation ranges, then IPv6 documentation /64s, never overlapping', () => {
    const doc = directAttach({ hosts: 100, controllers: 2 }); // 200 links: more than the 192 IPv4 /30s
    expect(doc.networks[0].cidr).toBe('198.51.100.0/30'); // RFC 5737 §3
    expect(doc.networks[191].cidr).toBe('192.0.2.252/30'); // RFC 5737 §3
    expect(doc.networks[192].cidr).toBe('2001:db8:0:1::/64'); // RFC 3849
    expect(of(doc, 'network-overlap')).toEqual([]);
  });

  it('reports a controller whose direct-attach links share one subnet', () => {
    const d = new Draft()
      .network('n1', '10.0.0.0/24') // RFC 1918
      .array('v', { a: [{ networkId: 'n1' }, { networkId: 'n1' }], b: 1 })
      .host('h1', { c1: [{ networkId: 'n1' }] })
      .host('h2', { c1: [{ networkId: 'n1' }] })
      .link('h1.c1.1', 'v.a.1')
      .link('h2.c1.1', 'v.a.2');
    const [finding, ...rest] = of(d.build(), 'direct-attach-shared-subnet');
    expect(rest).toEqual([]);
    expect(finding.severity).toBe('warning'); // common practice: one subnet per direct-attach link
    expect(finding.subjects).toEqual(['v.a', 'n1', 'v.a.1', 'v.a.2']);
  });

  it('says nothing of switched ports that share a fabric subnet', () => {
    expect(of(twoFabrics().build(), 'direct-attach-shared-subnet')).toEqual([]); // common practice: one subnet per switched fabric
  });
});

describe('management and data on one VLAN id', () => {
  it('is a finding, because the two share a layer-2 domain', () => {
    const d = twoFabrics().network('nm', '10.9.0.0/24', { purpose: 'management', vlan: 110 });
    const [finding] = of(d.build(), 'management-data-same-vlan');
    expect(finding.subjects).toEqual(['nm', 'na']); // IEEE 802.1Q: one VLAN id is one broadcast domain
    expect(finding.severity).toBe('error');
  });

  it('says nothing when management has a VLAN of its own', () => {
    const d = twoFabrics().network('nm', '10.9.0.0/24', { purpose: 'management', vlan: 10 });
    expect(of(d.build(), 'management-data-same-vlan')).toEqual([]);
  });
});

describe('overlapping networks', () => {
  it('are reported whatever their purposes, also when the overlap runs through a network of the other purpose', () => {
    const doc = new Draft()
      .network('wide', '10.0.0.0/16') // RFC 1918
      .network('mgmt', '10.0.0.0/24', { purpose: 'management' })
      .network('narrow', '10.0.0.0/25')
      .build();
    const overlaps = of(doc, 'network-overlap').map((f) => f.subjects);
    // RFC 4632 §3.1: blocks nest, so each inner network is reported with the narrowest block holding it
    expect(overlaps).toEqual([['mgmt', 'narrow'], ['wide', 'mgmt']]);
    expect(of(doc, 'management-data-same-subnet').map((f) => f.subjects)).toEqual([['mgmt', 'narrow'], ['wide', 'mgmt']]);
  });

  it('gives one finding per network for 5,000 copies of one block', () => {
    const d = new Draft();
    for (let i = 0; i < 5000; i += 1) d.network(`n${i}`, '10.1.0.0/24'); // RFC 1918
    const found = analyze(d.doc).findings.filter((f) => f.rule === 'network-overlap');
    expect(found).toHaveLength(4999); // every copy after the first overlaps the one before it
    expect(new Set(found.map((f) => f.subjects[1])).size).toBe(4999);
  });
});

describe('DHCP on a target port', () => {
  it('is a warning: a target portal should not move', () => {
    const d = twoFabrics();
    d.port('v.a.1').address = { mode: 'dhcp' };
    d.port('h1.c1.1').address = { mode: 'dhcp' };
    const found = of(d.build(), 'target-address-dhcp');
    expect(found.map((f) => [f.subjects, f.severity])).toEqual([[['v.a.1'], 'warning']]); // common practice: static target portals
  });
});

describe('special-use blocks as storage networks', () => {
  it('reports loopback, unspecified, multicast and reserved space as unusable', () => {
    expect(blockVerdict('127.0.0.0/24')).toEqual(['network-unusable:error']); // RFC 1122 §3.2.1.3: loopback
    expect(blockVerdict('0.0.0.0/8')).toEqual(['network-unusable:error']); // RFC 1122 §3.2.1.3: "this network"
    expect(blockVerdict('224.0.1.0/24')).toEqual(['network-unusable:error']); // RFC 5771: multicast
    expect(blockVerdict('240.0.0.0/24')).toEqual(['network-unusable:error']); // RFC 6890: reserved
    expect(blockVerdict('::1/128')).toEqual(['network-unusable:error']); // RFC 4291 §2.5.3: loopback
    expect(blockVerdict('ff02::/16')).toEqual(['network-unusable:error']); // RFC 4291 §2.7: multicast
  });

  it('warns of shared address space and public unicast blocks', () => {
    expect(blockVerdict('100.64.1.0/24')).toEqual(['network-special-use:warning']); // RFC 6598: shared address space
    expect(blockVerdict('198.18.0.0/24')).toEqual(['network-special-use:warning']); // RFC 2544: benchmarking
    expect(blockVerdict('11.0.0.0/24')).toEqual(['network-public:warning']); // outside RFC 1918 and RFC 6890's blocks
    expect(blockVerdict('2a00:1::/64')).toEqual(['network-public:warning']); // RFC 4291 §2.4: global unicast
  });

  it('says nothing of private blocks', () => {
    expect(blockVerdict('10.20.0.0/24')).toEqual([]); // RFC 1918 §3
    expect(blockVerdict('172.16.5.0/24')).toEqual([]); // RFC 1918 §3
    expect(blockVerdict('192.168.10.0/24')).toEqual([]); // RFC 1918 §3
    expect(blockVerdict('fd00:1::/64')).toEqual([]); // RFC 4193 §3.1: unique local
  });

  it('notes documentation blocks as meant for examples', () => {
    expect(blockVerdict('192.0.2.0/25')).toEqual(['network-documentation:info']); // RFC 5737 §3
    expect(blockVerdict('2001:db8:5::/64')).toEqual(['network-documentation:info']); // RFC 3849
  });

  it('notes the demo design calmly: information only, nothing counted as a problem', () => {
    const doc = harborRoadV2();
    const report = analyze(doc);
    const notes = report.findings.filter((f) => f.rule === 'network-documentation');
    expect(notes).toHaveLength(3); // docs/demo.md: fabric A, fabric B and management from RFC 5737
    for (const note of notes) {
      expect(note.severity).toBe('info');
      expect(note.message).toMatch(/meant for examples such as this one/);
      expect(note.message).not.toMatch(/error|must|invalid|wrong/i);
    }
    expect(summarize(report, doc)).toMatchObject({ errors: 0, warnings: 0 });
  });
});

describe('iSCSI name dates', () => {
  it('refuses month 00 and year 0000', () => {
    expect(checkIscsiName('iqn.2001-00.com.example')).toEqual({ ok: false, reason: expect.stringContaining('"00" is not 01–12') }); // RFC 7143 §4.2.7.4: month 01–12
    expect(checkIscsiName('iqn.0000-04.com.example')).toEqual({ ok: false, reason: expect.stringContaining('"0000"') }); // RFC 7143 §4.2.7.4: a year the authority held the domain
    expect(checkIscsiName('iqn.2001-04.com.example').ok).toBe(true); // RFC 7143 §4.2.7.4 example
  });

  it('reports an initiator name dated 0000 on its host', () => {
    const d = twoFabrics();
    (d.device('h1') as { iqn?: string }).iqn = 'iqn.0000-01.com.example:h1';
    expect(of(d.build(), 'iqn-invalid').map((f) => f.subjects)).toEqual([['h1']]); // RFC 7143 §4.2.7.4
  });

  it('names every character a name may not hold, the space too', () => {
    const check = checkIscsiName('iqn.2026-01.com.example:my host_1/a b');
    expect(check.ok).toBe(false);
    // RFC 3722 §6 and RFC 7143 §4.2.7.2: only "-", "." and ":" of punctuation; no spaces
    expect(!check.ok && check.reason).toBe('it contains a space, "_" and "/", which iSCSI names do not allow (of punctuation only "-", "." and ":")');
    expect(checkIscsiName(' iqn.2026-01.com.example:x')).toEqual({ ok: false, reason: expect.stringContaining('a space') }); // RFC 3722 §6
  });
});

describe('duplicate names', () => {
  it('is an error for two devices of one name, compared without case', () => {
    const d = twoFabrics();
    d.device('fb').name = 'FA';
    const [finding] = of(d.build(), 'device-name-duplicate');
    expect(finding).toMatchObject({ severity: 'error', subjects: ['fa', 'fb'] }); // common practice: every end on the cable list must be told apart
  });

  it('warns of two cards of one host and two ports of one device with one name', () => {
    const d = twoFabrics();
    const host = d.device('h1') as { adapters: { name: string }[] };
    host.adapters[1].name = 'c1';
    d.port('fa.2').name = '1';
    const doc = d.build();
    expect(of(doc, 'part-name-duplicate').map((f) => [f.subjects, f.severity])).toEqual([[['h1.c1', 'h1.c2'], 'warning']]); // common practice
    expect(of(doc, 'port-name-duplicate').map((f) => [f.subjects, f.severity])).toEqual([[['fa.1', 'fa.2'], 'warning']]); // common practice
  });

  it('says nothing of ports with one name on different cards', () => {
    expect(of(dualFabricWithManagement({ hosts: 2 }), 'port-name-duplicate')).toEqual([]); // card-1 p1 and card-2 p1 differ by card
    expect(of(twoFabrics().build(), 'device-name-duplicate')).toEqual([]);
  });
});
