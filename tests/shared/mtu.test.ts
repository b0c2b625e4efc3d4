import { analyze } from '@/shared/analysis/analyze';
import { Draft } from './helpers/draft';

/**
 * mtu-mismatch is about data paths, and a data path runs from a host port to a controller port
 * (docs/analysis.md). Jumbo frames of 9000 bytes are common practice for storage fabrics;
 * a network without an MTU runs Ethernet's 1500 (RFC 894, erratum 570).
 */
const mismatches = (doc: ReturnType<Draft['build']>) => analyze(doc).findings.filter((f) => f.rule === 'mtu-mismatch');

/** v.a.1 (na, 9000) and v.a.2 (nb, 1500) == sh (shared) ; hosts optional */
function sharedSwitch() {
  return new Draft()
    .network('na', '198.51.100.0/24', { mtu: 9000 }) // RFC 5737 §3; 9000: common practice
    .network('nb', '203.0.113.0/24') // RFC 5737 §3; 1500 by default, RFC 894
    .array('v', { a: [{ networkId: 'na' }, { networkId: 'nb' }] })
    .switch('sh', 'shared')
    .link('v.a.1', 'sh')
    .link('v.a.2', 'sh');
}

describe('mtu-mismatch', () => {
  it('says nothing while a switch joins only controller ports, since no data path exists yet', () => {
    expect(mismatches(sharedSwitch().build())).toEqual([]);
  });

  it('fires once a host on the standard network reaches the jumbo fabric through the same switch', () => {
    const doc = sharedSwitch().host('h1', { c1: [{ networkId: 'nb' }] }).link('h1.c1.1', 'sh').build();
    const found = mismatches(doc);
    expect(found.map((f) => f.subjects)).toEqual([['na', 'nb']]);
    expect(found[0].message).toBe(
      'Data paths join networks with different MTUs: na (MTU 9000), nb (MTU 1500 by default); frames larger than the smallest are dropped.',
    );
  });

  it('fires on a direct-attach cable between a jumbo host port and a standard controller port', () => {
    // h1.c1.1 (na, 9000) == v.a.2 (nb, 1500)
    const doc = new Draft()
      .network('na', '198.51.100.0/24', { mtu: 9000 })
      .network('nb', '203.0.113.0/24', { mtu: 1500 })
      .array('v', { a: [{ networkId: 'na' }, { networkId: 'nb' }] })
      .host('h1', { c1: [{ networkId: 'na' }] })
      .link('h1.c1.1', 'v.a.2')
      .build();
    expect(mismatches(doc).map((f) => f.subjects)).toEqual([['na', 'nb']]);
  });

  it('says nothing when two fabrics of different MTU stay on switches of their own', () => {
    // h1 ==c1== fa (na, 9000) == v.a.1 ; h1 ==c2== fb (nb, 1500) == v.a.2
    const doc = new Draft()
      .network('na', '198.51.100.0/24', { mtu: 9000 })
      .network('nb', '203.0.113.0/24')
      .array('v', { a: [{ networkId: 'na' }, { networkId: 'nb' }] })
      .switch('fa')
      .switch('fb')
      .host('h1', { c1: [{ networkId: 'na' }], c2: [{ networkId: 'nb' }] })
      .link('v.a.1', 'fa')
      .link('v.a.2', 'fb')
      .link('h1.c1.1', 'fa')
      .link('h1.c2.1', 'fb')
      .build();
    expect(mismatches(doc)).toEqual([]);
  });

  it('leaves management networks out, even on a shared switch', () => {
    const doc = sharedSwitch()
      .network('nm', '192.0.2.0/24', { purpose: 'management', mtu: 1500 }) // RFC 5737 §3
      .host('h1', { c1: [{ networkId: 'na' }], onboard: [{ role: 'management', networkId: 'nm', speedGbps: 1 }] })
      .link('h1.c1.1', 'sh')
      .link('h1.onboard.1', 'sh')
      .build();
    // na (9000) and nb (1500) are still joined by h1's data port; nm never counts.
    expect(mismatches(doc).map((f) => f.subjects)).toEqual([['na', 'nb']]);
  });
});
