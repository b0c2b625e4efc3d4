import { analyze } from '@/shared/analysis/analyze';
import { LIMITS } from '@/shared/rules/limits';
import type { Network } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { twoFabrics } from './helpers/topologies';

/** twoFabrics with fabric A's network changed; the findings of one rule (the document must stay valid). */
function findings(rule: string, change: Partial<Network>, hostAddress?: string) {
  const d = twoFabrics();
  Object.assign(d.doc.networks[0], change);
  if (hostAddress) d.port('h1.c1.1').address = { mode: 'static', ip: hostAddress };
  const checked = validateTopology(d.build());
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return analyze(checked.doc).findings.filter((f) => f.rule === rule);
}

describe('a subnet written with host bits set', () => {
  it('is readable, so the schema accepts it, and the analysis reads it as its block and warns', () => {
    const found = findings('cidr-host-bits', { cidr: '198.51.100.7/24' }); // RFC 5737 §3 range
    expect(found).toEqual([
      {
        rule: 'cidr-host-bits',
        severity: 'warning',
        subjects: ['na'],
        message: 'The subnet of na is written 198.51.100.7/24, with host bits set; it is read as 198.51.100.0/24. Write the network address.',
      },
    ]);
    // Read as 198.51.100.0/24 (RFC 4632 masking): an address of that block is inside it.
    expect(findings('address-outside-network', { cidr: '198.51.100.7/24' }, '198.51.100.21')).toEqual([]); // inside 198.51.100.0/24 (RFC 4632)
    expect(findings('address-reserved', { cidr: '198.51.100.7/24' }, '198.51.100.0')).toHaveLength(1); // its network address
  });

  it('says nothing about a subnet written with its network address', () => {
    expect(findings('cidr-host-bits', { cidr: '198.51.100.0/24' })).toEqual([]); // RFC 5737 §3, written as its network address
    expect(findings('cidr-host-bits', { cidr: '2001:db8:10::/64' })).toEqual([]); // RFC 3849
  });

  it('reports IPv6 host bits too', () => {
    expect(findings('cidr-host-bits', { cidr: '2001:db8:10::21/64' })[0].message).toContain('read as 2001:db8:10::/64'); // RFC 3849; RFC 5952 text
  });

  it('rejects a prefix length written with a leading zero as malformed', () => {
    const d = twoFabrics();
    d.doc.networks[0].cidr = '198.51.100.0/024';
    const checked = validateTopology(d.build());
    expect(checked.ok ? [] : checked.issues.map((i) => i.path)).toEqual(['networks.0.cidr']);
  });
});

describe('MTU limits by family', () => {
  it('flags an IPv6 network below 1280 bytes, which an IPv4 network may use', () => {
    expect(LIMITS.mtuMinIpv6.value).toBe(1280); // RFC 8200 §5
    expect(findings('mtu-out-of-range', { cidr: '2001:db8:10::/64', mtu: 1279 })).toHaveLength(1); // RFC 8200 §5
    expect(findings('mtu-out-of-range', { cidr: '2001:db8:10::/64', mtu: 1280 })).toEqual([]); // RFC 8200 §5
    expect(findings('mtu-out-of-range', { mtu: 1279 })).toEqual([]); // IPv4: 576 and up (RFC 791 §3.1)
    expect(findings('mtu-out-of-range', { mtu: 575 })).toHaveLength(1); // RFC 791 §3.1: 576
  });
});

describe('reserved addresses by family', () => {
  it('flags the IPv6 subnet-router anycast address on a port, but no IPv6 "broadcast"', () => {
    const v6 = { cidr: '2001:db8:10::/64' }; // RFC 3849
    expect(findings('address-reserved', v6, '2001:db8:10::')[0].message).toContain('the subnet-router anycast address'); // RFC 4291 §2.6.1
    expect(findings('address-reserved', v6, '2001:db8:10::ffff:ffff:ffff:ffff')).toEqual([]); // RFC 4291 §2: no broadcast in IPv6
    expect(findings('address-reserved', { cidr: '2001:db8:10::/127' }, '2001:db8:10::')).toEqual([]); // RFC 6164 §5
  });

  it('keeps both addresses of an IPv4 /31 for hosts', () => {
    expect(findings('address-reserved', { cidr: '198.51.100.0/31' }, '198.51.100.1')).toEqual([]); // RFC 3021 §2.1
    expect(findings('address-reserved', { cidr: '198.51.100.0/30' }, '198.51.100.3')[0].message).toContain('the broadcast address'); // RFC 919 §7
  });
});

describe('gateways', () => {
  it('flags a gateway on the network or broadcast address', () => {
    expect(findings('address-reserved', { gateway: '198.51.100.0' })[0]).toMatchObject({ subjects: ['na'] }); // network address, RFC 4632
    expect(findings('address-reserved', { gateway: '198.51.100.255' })[0].message).toBe(
      'The gateway 198.51.100.255 of na is the broadcast address of 198.51.100.0/24.', // RFC 919 §7 broadcast
    );
    expect(findings('address-reserved', { gateway: '198.51.100.1' })).toEqual([]); // first host address of a /24 (RFC 4632)
  });

  it('flags a gateway outside its network', () => {
    expect(findings('address-outside-network', { gateway: '203.0.113.1' })[0]).toMatchObject({ subjects: ['na'] }); // RFC 5737 §3: another range
  });
});

describe('link-local subnets', () => {
  it('warns about a storage subnet inside 169.254.0.0/16 or fe80::/10', () => {
    expect(findings('network-link-local', { cidr: '169.254.10.0/24' })).toHaveLength(1); // RFC 3927 §2.1
    expect(findings('network-link-local', { cidr: 'fe80::/64' })).toHaveLength(1); // RFC 4291 §2.5.6
    expect(findings('network-link-local', { cidr: '169.255.0.0/16' })).toEqual([]); // just past RFC 3927's range
    expect(findings('network-link-local', { cidr: '198.51.100.0/24' })).toEqual([]); // RFC 5737 §3
  });
});
