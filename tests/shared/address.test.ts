import fc from 'fast-check';
import { Address4, Address6 } from 'ip-address';
import {
  assignAddresses,
  broadcastAddress,
  contains,
  networkAddress,
  nextFreeAddress,
  normalizeIp,
  overlap,
  parseIp,
  usableCount,
} from '@/shared/address';

describe('address math on published values', () => {
  it('counts 254 usable hosts in a /24', () => {
    expect(usableCount('198.51.100.0/24')).toBe(BigInt(254)); // RFC 4632 (CIDR): 256 − network − broadcast
  });

  it('treats both addresses of a /31 as hosts and a /32 as one host', () => {
    expect(usableCount('192.0.2.0/31')).toBe(BigInt(2)); // RFC 3021 §2.1
    expect(usableCount('192.0.2.7/32')).toBe(BigInt(1)); // RFC 4632: a /32 is one host route
  });

  it('keeps every IPv6 address for hosts on /127 and /128, and the subnet-router anycast address out of larger subnets', () => {
    expect(usableCount('2001:db8::/127')).toBe(BigInt(2)); // RFC 6164 §5: both addresses of a /127 are used
    expect(usableCount('2001:db8::1/128')).toBe(BigInt(1)); // RFC 4291 §2.3: a /128 is one interface
    expect(usableCount('2001:db8::/126')).toBe(BigInt(3)); // RFC 4291 §2.6.1: ::0 of the subnet is the anycast address
  });

  it('finds the network and broadcast address of a block', () => {
    expect(networkAddress('203.0.113.77/24')).toBe('203.0.113.0'); // RFC 5737 §3 range, RFC 4632 masking
    expect(broadcastAddress('203.0.113.77/24')).toBe('203.0.113.255'); // RFC 919 §7 all-ones host part
    expect(broadcastAddress('192.0.2.64/26')).toBe('192.0.2.127'); // RFC 4632: a /26 spans 64 addresses; RFC 919 §7
    expect(broadcastAddress('2001:db8::/64')).toBeNull(); // RFC 4291 §2: IPv6 has no broadcast
  });

  it('knows the documentation ranges contain their own addresses and nothing else', () => {
    expect(contains('192.0.2.0/24', '192.0.2.10')).toBe(true); // RFC 5737 §3 TEST-NET-1
    expect(contains('198.51.100.0/24', '198.51.100.255')).toBe(true); // RFC 5737 §3 TEST-NET-2
    expect(contains('203.0.113.0/24', '203.0.114.1')).toBe(false); // RFC 5737 §3 TEST-NET-3
    expect(contains('2001:db8::/32', '2001:db8:ffff::1')).toBe(true); // RFC 3849
    expect(contains('2001:db8::/32', '2001:db9::1')).toBe(false); // RFC 3849
    expect(contains('198.51.100.0/24', '2001:db8::1')).toBe(false); // families never mix
  });

  it('sees overlap between the private ranges only where they nest', () => {
    expect(overlap('10.0.0.0/8', '10.20.0.0/16')).toBe(true); // RFC 1918 §3
    expect(overlap('172.16.0.0/12', '172.31.255.0/24')).toBe(true); // RFC 1918 §3: 172.16/12 ends at 172.31.255.255
    expect(overlap('172.16.0.0/12', '172.32.0.0/16')).toBe(false); // RFC 1918 §3
    expect(overlap('192.168.0.0/16', '192.0.2.0/24')).toBe(false); // RFC 1918 §3 vs RFC 5737 §3
    expect(overlap('fc00::/7', 'fd12:3456::/48')).toBe(true); // RFC 4193 §3.1 unique local
    expect(overlap('fe80::/10', 'fc00::/7')).toBe(false); // RFC 4291 §2.5.6 link-local vs RFC 4193
  });

  it('reads only dotted-quad IPv4 and plain IPv6', () => {
    expect(parseIp('1.2.3')).toBeNull(); // ipaddr.js would accept the classful short form; a port address never uses it
    expect(parseIp('0xc0.0.2.1')).toBeNull();
    expect(parseIp('fe80::1%eth0')).toBeNull(); // RFC 4007 §11: a zone index names one machine's interface
    expect(parseIp('198.51.100.256')).toBeNull(); // RFC 791 §3.2: each part of a dotted quad is one octet
    expect(parseIp('198.051.100.1')).toBeNull(); // a leading zero reads as octal in some tools (from memory: inet_aton)
    expect(normalizeIp('2001:DB8:0:0:0:0:0:21')).toBe('2001:db8::21'); // RFC 5952 §4 canonical text
  });
});

describe('automatic addressing', () => {
  it('skips the network address, the gateway and used addresses, lowest first', () => {
    const used = ['198.51.100.2', '198.51.100.4'];
    expect(nextFreeAddress('198.51.100.0/24', used, { gateway: '198.51.100.1' })).toBe('198.51.100.3');
    expect(assignAddresses('198.51.100.0/24', 3, used, { gateway: '198.51.100.1', reserved: ['198.51.100.5'] })).toEqual([
      '198.51.100.3',
      '198.51.100.6',
      '198.51.100.7',
    ]);
  });

  it('never hands out the broadcast address and stops when the block is full', () => {
    const all = assignAddresses('192.0.2.248/30', 10); // RFC 4632: a /30 has two host addresses
    expect(all).toEqual(['192.0.2.249', '192.0.2.250']);
    expect(nextFreeAddress('192.0.2.248/30', all)).toBeNull();
  });

  it('assigns IPv6 addresses without the subnet-router anycast address', () => {
    // RFC 4291 §2.6.1: the all-zero interface identifier is the subnet-router anycast address.
    expect(assignAddresses('2001:db8:10::/64', 2, ['2001:db8:10::1'])).toEqual(['2001:db8:10::2', '2001:db8:10::3']);
  });

  it('is deterministic: the same input gives the same addresses', () => {
    const args = ['203.0.113.0/24', 5, ['203.0.113.9'], { gateway: '203.0.113.1' }] as const;
    expect(assignAddresses(...args)).toEqual(assignAddresses(...args));
  });
});

describe('address math cross-checked with the ip-address package', () => {
  const ipv4 = fc.tuple(fc.nat(255), fc.nat(255), fc.nat(255), fc.nat(255)).map((p) => p.join('.'));

  it('agrees on network, broadcast and containment for random IPv4 blocks', () => {
    fc.assert(
      fc.property(ipv4, fc.integer({ min: 0, max: 32 }), ipv4, (base, prefix, probe) => {
        const cidr = `${base}/${prefix}`;
        const reference = new Address4(cidr);
        expect(networkAddress(cidr)).toBe(reference.startAddress().correctForm());
        expect(broadcastAddress(cidr)).toBe(reference.endAddress().correctForm());
        expect(contains(cidr, probe)).toBe(new Address4(probe).isInSubnet(reference));
      }),
      { numRuns: 500 },
    );
  });

  it('reads compressed IPv6 text as ip-address does', () => {
    const group = fc.oneof(fc.constant(0), fc.nat(0xffff));
    fc.assert(
      fc.property(fc.array(group, { minLength: 8, maxLength: 8 }), (parts) => {
        const text = new Address6(parts.map((p) => p.toString(16)).join(':')).correctForm(); // RFC 5952 compressed
        expect(parseIp(text)?.value).toBe(BigInt(new Address6(text).bigInt()));
        expect(normalizeIp(text)).toBe(text);
      }),
      { numRuns: 500 },
    );
  });

  it('agrees on overlap: two CIDR blocks overlap exactly when one lies inside the other', () => {
    // RFC 4632 §3.1: blocks are aligned powers of two, so they nest or are disjoint.
    fc.assert(
      fc.property(ipv4, fc.integer({ min: 0, max: 32 }), ipv4, fc.integer({ min: 0, max: 32 }), (a, pa, b, pb) => {
        const [x, y] = [new Address4(`${a}/${pa}`), new Address4(`${b}/${pb}`)];
        expect(overlap(`${a}/${pa}`, `${b}/${pb}`)).toBe(x.isInSubnet(y) || y.isInSubnet(x));
      }),
      { numRuns: 500 },
    );
  });

  it('agrees on network address and containment for random IPv6 blocks', () => {
    const group = fc.nat(0xffff).map((n) => n.toString(16));
    const ipv6 = fc.array(group, { minLength: 8, maxLength: 8 }).map((g) => g.join(':'));
    fc.assert(
      fc.property(ipv6, fc.integer({ min: 0, max: 128 }), ipv6, (base, prefix, probe) => {
        const cidr = `${base}/${prefix}`;
        const reference = new Address6(cidr);
        expect(networkAddress(cidr)).toBe(reference.startAddress().correctForm());
        expect(contains(cidr, probe)).toBe(new Address6(probe).isInSubnet(reference));
      }),
      { numRuns: 500 },
    );
  });
});
