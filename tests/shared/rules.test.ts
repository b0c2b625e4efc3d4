import { analyze } from '@/shared/analysis/analyze';
import { reachOf } from '@/shared/rules/cables';
import { REACH, LIMITS } from '@/shared/rules/limits';
import { checkIscsiName } from '@/shared/rules/iqn';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { twoFabrics } from './helpers/topologies';

/** A valid design with one change, and the findings of one rule on it. */
function findings(rule: string, edit: (doc: Topology, d: ReturnType<typeof twoFabrics>) => void) {
  const d = twoFabrics();
  const doc = d.doc;
  edit(doc, d);
  const checked = validateTopology(doc);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return analyze(checked.doc).findings.filter((f) => f.rule === rule);
}

const lengthOnCable = (media: Topology['cables'][number]['media'], lengthM: number, speedGbps: 1 | 10 | 25 = 10) =>
  findings('cable-too-long', (doc, d) => {
    doc.cables[0].media = media;
    doc.cables[0].lengthM = lengthM;
    const connector = media.startsWith('cat') ? 'rj45' : 'sfp';
    for (const end of [doc.cables[0].a, doc.cables[0].b]) Object.assign(d.port(end), { connector, speedGbps });
  });

describe('cable reach against the published values', () => {
  it('holds the reach table to its sources', () => {
    expect(reachOf('cat6', 10)!.maxM).toBe(55); // IEEE 802.3an clause 55; TIA TSB-155
    expect(reachOf('cat6a', 10)!.maxM).toBe(100); // IEEE 802.3an
    expect(reachOf('cat5e', 1)!.maxM).toBe(100); // IEEE 802.3 clause 40 (clause number from memory)
    expect(reachOf('om3', 10)!.maxM).toBe(300); // IEEE 802.3ae 10GBASE-SR
    expect(reachOf('om4', 10)!.maxM).toBe(400); // IEEE 802.3ae / 802.3-2012 10GBASE-SR
    expect(reachOf('om3', 25)!.maxM).toBe(70); // IEEE 802.3by clause 112
    expect(reachOf('om4', 25)!.maxM).toBe(100); // IEEE 802.3by clause 112
    expect(reachOf('dac', 10)!.maxM).toBe(7); // SFF-8431 appendix E (common practice for the limit)
  });

  it('holds the other check values to theirs', () => {
    expect(reachOf('cat5e', 2.5)!.maxM).toBe(100); // IEEE 802.3bz, 2.5GBASE-T (secondary source)
    expect(reachOf('cat6', 5)!.maxM).toBe(100); // IEEE 802.3bz, 5GBASE-T (secondary source)
    expect(reachOf('cat5e', 10)).toBeNull(); // IEEE 802.3an specifies 10GBASE-T on Category 6 and 6A only
    expect(reachOf('om4', 1)!.maxM).toBe(550); // IEEE 802.3z 1000BASE-SX (from memory)
    expect(LIMITS.vlanMin.value).toBe(1); // IEEE 802.1Q: 0 is reserved
    expect(LIMITS.mtuMin.value).toBe(576); // RFC 791 §3.1; the lower bound of the format's 576–9216
    expect(LIMITS.mtuMax.value).toBe(9216); // common practice; the upper bound of the format's 576–9216
    expect(LIMITS.iscsiTcpPort.value).toBe(3260); // RFC 7143 §15
    expect(LIMITS.rackUnitMm.value).toBe(44.45); // EIA-310-D: 1U = 1.75 in
  });

  it('names a source, or says it has none, for every entry of the tables', () => {
    const unsourced = [...Object.entries(LIMITS), ...REACH.map((r) => [`${r.media}@${r.speedGbps}`, r] as const)].filter(
      ([, entry]) => !/(RFC \d+|IEEE 802|SFF-\d+|EIA-|TIA|common practice)/.test(entry.source),
    );
    expect(unsourced).toEqual([]);
    // Clause numbers recalled rather than read are marked as such (docs/trade-values.md).
    expect(reachOf('cat5e', 1)!.source).toContain('from memory');
  });

  it('flags 10GBASE-T past 55 m of Category 6 but not Category 6A up to 100 m', () => {
    expect(lengthOnCable('cat6', 55)).toEqual([]); // IEEE 802.3an: 55 m on Cat 6
    expect(lengthOnCable('cat6', 56)).toHaveLength(1);
    expect(lengthOnCable('cat6a', 100)).toEqual([]); // IEEE 802.3an: 100 m on Cat 6A
    expect(lengthOnCable('cat6a', 101)).toHaveLength(1); // IEEE 802.3an: past 100 m
  });

  it('allows 1000BASE-T over 100 m of Category 5e and no more', () => {
    expect(lengthOnCable('cat5e', 100, 1)).toEqual([]); // IEEE 802.3 clause 40 (from memory)
    expect(lengthOnCable('cat5e', 100.5, 1)).toHaveLength(1); // IEEE 802.3 clause 40: past 100 m (from memory)
  });

  it('flags 10GBASE-SR past 300 m of OM3 and 400 m of OM4', () => {
    expect(lengthOnCable('om3', 300)).toEqual([]); // IEEE 802.3ae
    expect(lengthOnCable('om3', 301)).toHaveLength(1); // IEEE 802.3ae: past 300 m
    expect(lengthOnCable('om4', 400)).toEqual([]); // IEEE 802.3ae / 802.3-2012
    expect(lengthOnCable('om4', 401)).toHaveLength(1); // IEEE 802.3ae / 802.3-2012: past 400 m
  });

  it('reports media that cannot carry the link speed at all', () => {
    const found = findings('media-unsuited', (doc) => {
      doc.cables[0].media = 'cat5e'; // no 10GBASE-T on Category 5e in IEEE 802.3an
    });
    expect(found).toHaveLength(1);
    expect(found[0].message).toContain('cannot carry 10 Gb/s');
  });

  it('reports mismatched connectors and speeds, and cables without a length', () => {
    expect(findings('connector-mismatch', (doc, d) => (d.port(doc.cables[0].a).connector = 'sfp'))).toHaveLength(1);
    expect(findings('connector-mismatch', (doc) => (doc.cables[0].media = 'om4'))).toHaveLength(1);
    expect(findings('speed-mismatch', (doc, d) => (d.port(doc.cables[0].a).speedGbps = 25))[0].severity).toBe('warning');
    expect(findings('cable-unmeasured', (doc) => delete doc.cables[0].lengthM)[0].severity).toBe('info');
  });

  it('reports a port cabled twice', () => {
    const found = findings('port-double-cabled', (doc) => doc.cables.push({ id: 'extra', a: 'h1.c1.1', b: 'fb.9', media: 'cat6a', lengthM: 2 }));
    expect(found.map((f) => f.subjects)).toEqual([['h1.c1.1', 'k5', 'extra']]);
  });
});

describe('networks and addresses', () => {
  it('accepts VLAN ids 1 and 4094 and flags 0 and 4095', () => {
    const vlan = (value: number) => findings('vlan-out-of-range', (doc) => (doc.networks[0].vlan = value));
    expect(vlan(1)).toEqual([]); // IEEE 802.1Q: 1–4094 usable
    expect(vlan(4094)).toEqual([]); // IEEE 802.1Q
    expect(vlan(0)).toHaveLength(1); // IEEE 802.1Q: 0 is reserved (priority tag)
    expect(vlan(4095)).toHaveLength(1); // IEEE 802.1Q: 4095 is reserved
    expect(LIMITS.vlanMax.value).toBe(4094); // IEEE 802.1Q
  });

  it('flags an MTU outside 576–9216 and jumbo and standard networks joined by a path', () => {
    expect(findings('mtu-out-of-range', (doc) => (doc.networks[0].mtu = 9217))).toHaveLength(1); // 9216: common practice
    expect(LIMITS.mtuDefault.value).toBe(1500); // RFC 894 (erratum 570)
    const mismatch = findings('mtu-mismatch', (doc, d) => {
      delete doc.networks[1].mtu; // runs 1500 by default (RFC 894) against fabric A's jumbo 9000 (common practice)
      d.port('h1.c2.1').networkId = 'nb';
      doc.cables[5].b = 'fa.7'; // host's fabric-B port now sits on fabric A's switch
    });
    expect(mismatch.map((f) => f.subjects)).toEqual([['na', 'nb']]);
  });

  it('flags overlapping subnets, and management overlapping data separately', () => {
    expect(findings('network-overlap', (doc) => (doc.networks[1].cidr = '198.51.100.128/25'))).toHaveLength(1); // RFC 4632 nesting
    const mixed = findings('management-data-same-subnet', (doc) => {
      doc.networks.push({ id: 'nm', name: 'mgmt', purpose: 'management', cidr: '198.51.100.0/26' });
    });
    expect(mixed.map((f) => f.subjects)).toEqual([['na', 'nm']]);
  });

  it('reports each overlapping network once, against the narrowest block that holds it', () => {
    // CIDR blocks nest or are disjoint (RFC 4632 §3.1): 198.51.100.0/24 ⊃ .0/25 ⊃ .0/26, and .128/25 beside .0/25.
    const nested = findings('network-overlap', (doc) => {
      doc.networks[1].cidr = '198.51.100.0/25';
      doc.networks.push({ id: 'nc', name: 'c', purpose: 'data', cidr: '198.51.100.0/26' });
      doc.networks.push({ id: 'nd', name: 'd', purpose: 'data', cidr: '198.51.100.128/25' });
    });
    expect(nested.map((f) => f.subjects)).toEqual([['na', 'nb'], ['na', 'nd'], ['nb', 'nc']]);
  });

  it('gives n − 1 findings, not every pair, for many copies of one subnet', () => {
    const copies = findings('network-overlap', (doc) => {
      for (let i = 0; i < 3000; i += 1) doc.networks.push({ id: `copy-${i}`, name: `copy ${i}`, purpose: 'data', cidr: '192.0.2.0/24' });
    });
    expect(copies).toHaveLength(2999);
  });

  it('flags addresses outside the network, reserved, duplicated, or on the gateway', () => {
    const set = (d: ReturnType<typeof twoFabrics>, port: string, ip: string) => (d.port(port).address = { mode: 'static', ip });
    expect(findings('address-outside-network', (_, d) => set(d, 'h1.c1.1', '203.0.113.10'))).toHaveLength(1); // RFC 5737 ranges differ
    expect(findings('address-reserved', (_, d) => set(d, 'h1.c1.1', '198.51.100.0'))).toHaveLength(1); // network address, RFC 4632
    expect(findings('address-reserved', (_, d) => set(d, 'h1.c1.1', '198.51.100.255'))).toHaveLength(1); // broadcast, RFC 919 §7
    expect(findings('address-reserved', (doc, d) => {
      doc.networks[0].cidr = '198.51.100.0/31';
      set(d, 'h1.c1.1', '198.51.100.0'); // RFC 3021 §2.1: both /31 addresses are hosts
    })).toEqual([]);
    const dup = findings('address-duplicate', (_, d) => {
      set(d, 'h1.c1.1', '198.51.100.21');
      set(d, 'v.a.1', '198.51.100.21');
    });
    expect(dup.map((f) => f.subjects)).toEqual([['v.a.1', 'h1.c1.1']]);
    const gateway = findings('address-duplicate', (doc, d) => {
      doc.networks[0].gateway = '198.51.100.1';
      set(d, 'h1.c1.1', '198.51.100.1');
    });
    expect(gateway.map((f) => f.subjects)).toEqual([['na', 'h1.c1.1']]);
  });

  it('warns about cabled ports without a network or an address', () => {
    const found = findings('port-unaddressed', (_, d) => delete d.port('h1.c1.1').networkId);
    expect(found.find((f) => f.subjects[0] === 'h1.c1.1')!.message).toContain('on no network');
    expect(found.find((f) => f.subjects[0] === 'v.a.1')!.message).toContain('no address');
  });

  it('flags a data port on a management network', () => {
    const found = findings('management-data-same-subnet', (doc, d) => {
      doc.networks.push({ id: 'nm', name: 'mgmt', purpose: 'management', cidr: '192.0.2.0/24' }); // RFC 5737 §3
      d.port('h1.c1.1').networkId = 'nm';
    });
    expect(found.map((f) => f.subjects)).toEqual([['h1.c1.1', 'nm']]);
  });
});

describe('iSCSI names', () => {
  it('accepts the examples of RFC 7143', () => {
    for (const name of [
      'iqn.2001-04.com.example', // RFC 7143 §4.2.7.4
      'iqn.2001-04.com.example:storage:diskarrays-sn-a8675309', // RFC 7143 §4.2.7.4
      'iqn.2001-04.com.example:storage.tape1.sys1.xyz', // RFC 7143 §4.2.7.4
      'eui.02004567A425678D', // RFC 7143 §4.2.7.5 (uppercase hex, folded first)
      'naa.52004567BA64678D', // RFC 3980 §4.1; RFC 7143 §4.2.7.6
      'naa.62004567BA64678D0123456789ABCDEF', // RFC 3980 §4.1
    ]) {
      expect({ name, ok: checkIscsiName(name).ok }).toEqual({ name, ok: true });
    }
  });

  it('rejects names derived from the RFC examples by breaking one rule', () => {
    for (const name of [
      'iqn.2001-13.com.example', // RFC 7143 §4.2.7.4: month 01–12
      'iqn.01-04.com.example', // RFC 7143 §4.2.7.4: four-digit year
      'iqn.2001-04', // RFC 7143 §4.2.7.4: naming authority required
      'iqn.2001-04.com.example:storage_disk', // RFC 7143 §4.2.7.2: "_" prohibited
      'iqn.2001-04.com.example:storage disk', // RFC 3722 §6: spaces prohibited
      'iqn.2001-04.com.example:storage/disk', // RFC 3722: "/" prohibited
      'eui.02004567A425678', // RFC 7143 §4.2.7.5: 16 hex digits
      'naa.52004567BA64678D0', // RFC 3980 §4.1: 16 or 32 hex digits
      'iqn.2001-04.com.example:' + 'a'.repeat(223 - 'iqn.2001-04.com.example:'.length + 1), // RFC 7143 §4.2.7.1: 223 bytes
      'wwn.2001-04.com.example', // RFC 7143 §4.2.7: only iqn, eui, naa
    ]) {
      expect({ name, ok: checkIscsiName(name).ok }).toEqual({ name, ok: false });
    }
    expect(checkIscsiName('iqn.2001-04.com.example:' + 'a'.repeat(223 - 24)).ok).toBe(true); // exactly 223 bytes
    // RFC 7143 §4.2.7.1: the limit is in bytes of UTF-8, so 100 two-byte letters (200 bytes) overflow it.
    expect(checkIscsiName('iqn.2001-04.com.example:' + 'é'.repeat(100))).toEqual({ ok: false, reason: 'it is 224 bytes long; the limit is 223' });
    expect(LIMITS.iscsiNameMaxBytes.value).toBe(223); // RFC 7143 §4.2.7.1
  });

  it('prepares names as the iSCSI stringprep profile does before checking them', () => {
    expect(checkIscsiName('IQN.2001-04.COM.EXAMPLE:STORAGE')).toMatchObject({ ok: true, folded: 'iqn.2001-04.com.example:storage' }); // RFC 3722 §4: case folding
    expect(checkIscsiName('iqn.2001-04.com.example:disk\u00ad1')).toMatchObject({ ok: true, folded: 'iqn.2001-04.com.example:disk1' }); // RFC 3722 §3, stringprep B.1: soft hyphen maps to nothing
    expect(checkIscsiName('iqn.2001-04.com.example:\u2163')).toMatchObject({ ok: true, folded: 'iqn.2001-04.com.example:iv' }); // RFC 3722 §5: NFKC
    expect(checkIscsiName('iqn.2001-04.com.example:café').ok).toBe(true); // RFC 3722 §6 prohibits punctuation, not letters of other scripts
    expect(checkIscsiName('iqn.2001-04.com.example:नमस्ते').ok).toBe(true); // RFC 3722 §6: combining marks are not prohibited
  });

  it('rejects the prohibited output of RFC 3722 and says which character', () => {
    expect(checkIscsiName('iqn.2001-04.com.example:a\u3002b')).toEqual({ ok: false, reason: expect.stringContaining('U+3002') }); // RFC 3722 §6: ideographic full stop
    expect(checkIscsiName('iqn.2001-04.com.example:a\u0007b').ok).toBe(false); // RFC 3722 §6, stringprep C.2.1: control
    expect(checkIscsiName('iqn.2001-04.com.example:a\u200eb').ok).toBe(false); // RFC 3722 §6, stringprep C.8: left-to-right mark
    expect(checkIscsiName('iqn.2001-04.com.example:a\ue000b').ok).toBe(false); // RFC 3722 §6, stringprep C.3: private use
    expect(checkIscsiName('iqn.2001-04.com.example:storage_disk')).toEqual({ ok: false, reason: expect.stringContaining('"_"') }); // RFC 3722 §6: 0x5F
    expect(checkIscsiName('iqn.2001-04.com.example:')).toEqual({ ok: false, reason: expect.stringContaining('nothing follows the ":"') }); // RFC 7143 §4.2.7.4
    expect(checkIscsiName('iqn.2001-04')).toEqual({ ok: false, reason: expect.stringContaining('naming authority') }); // RFC 7143 §4.2.7.4
  });

  it('reports invalid and duplicate initiator names, comparing after case folding', () => {
    expect(findings('iqn-invalid', (doc) => doc.devices[3].kind === 'host' && (doc.devices[3].iqn = 'iqn.2026-00.example.tidewater'))).toHaveLength(1); // RFC 7143 §4.2.7.4: month 01–12
    const dup = findings('iqn-duplicate', (doc, d) => {
      d.host('h2', { c1: 1 }, { iqn: 'IQN.2026-01.EXAMPLE.TIDEWATER:H1' }); // RFC 3722 §4: names fold to lowercase
      if (doc.devices[3].kind === 'host') doc.devices[3].iqn = 'iqn.2026-01.example.tidewater:h1';
    });
    expect(dup.map((f) => f.subjects)).toEqual([['h1', 'h2']]);
  });

  it('warns when CHAP is off and not when it is on', () => {
    expect(findings('chap-off', () => undefined)[0].severity).toBe('warning'); // RFC 7143 §9.2.1 recommends CHAP (common practice: prefer CHAP)
    expect(findings('chap-off', (doc) => (doc.security = { chap: 'mutual' }))).toEqual([]);
    expect(LIMITS.chapSecretMinBytes.value).toBe(12); // RFC 7143 §9.2.1: under 96 bits needs IPsec
  });
});
