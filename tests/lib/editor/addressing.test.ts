import fc from 'fast-check';
import ipaddr from 'ipaddr.js';
import { dualFabricWithManagement } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';
import { autoAssignAddresses, planAddresses } from '@/lib/editor/commands';
import { allPorts, apply, deepFreeze, expectValid, port, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

/**
 * Auto-assign checked against ipaddr.js rather than our own address math: every address inside
 * its network, none twice, none of network, broadcast or gateway.
 */
function unaddressedDesign(): Topology {
  // 2 controllers × 4 data ports + mgmt, fab-a / fab-b / oob-1, six hosts: the demo's shape without addresses.
  return dualFabricWithManagement({ hosts: 6, controllerPorts: 4, assignAddresses: false });
}

/** Checks every static address on a network except the ports in `skip` (addresses a designer typed). */
function checkPlan(doc: Topology, skip: ReadonlySet<string> = new Set()): void {
  const seen = new Set<string>();
  for (const { port: p, device } of allPorts(doc)) {
    if (device.kind === 'switch') {
      expect(p.address).toBeUndefined();
      continue;
    }
    if (p.address?.mode !== 'static' || !p.networkId || skip.has(p.id)) continue;
    const network = doc.networks.find((n) => n.id === p.networkId)!;
    const ip = ipaddr.parse(p.address.ip);
    const range = ipaddr.parseCIDR(network.cidr);
    expect(ip.match(range)).toBe(true); // inside its network (RFC 4632 prefix match)
    expect(seen.has(ip.toNormalizedString())).toBe(false); // no duplicates
    seen.add(ip.toNormalizedString());
    if (ip.kind() === 'ipv4') {
      const prefix = range[1];
      if (prefix <= 30) {
        // The all-zeros and all-ones host parts are the network and broadcast address (RFC 919 §7,
        // RFC 4632); on /31 both are hosts (RFC 3021 §2.1).
        expect(p.address.ip).not.toBe(ipaddr.IPv4.networkAddressFromCIDR(network.cidr).toString());
        expect(p.address.ip).not.toBe(ipaddr.IPv4.broadcastAddressFromCIDR(network.cidr).toString());
      }
    } else if (range[1] < 127) {
      // The subnet-router anycast address (all-zero interface id) is not for hosts (RFC 4291 §2.6.1).
      expect(ip.toNormalizedString()).not.toBe(ipaddr.IPv6.networkAddressFromCIDR(network.cidr).toNormalizedString());
    }
    if (network.gateway) expect(ip.toNormalizedString()).not.toBe(ipaddr.parse(network.gateway).toNormalizedString());
  }
}

describe('automatic addressing', () => {
  it('addresses every unaddressed host and controller port on a network, and no switch port', () => {
    const doc = apply(unaddressedDesign(), 'autoAssignAddresses', {});
    const onNetworks = allPorts(doc).filter((p) => p.device.kind !== 'switch' && p.port.networkId);
    expect(onNetworks.length).toBe(2 * 5 + 6 * 3); // 2 controllers × (4 data + mgmt), 6 hosts × (2 storage + mgmt)
    expect(onNetworks.every((p) => p.port.address?.mode === 'static')).toBe(true);
    checkPlan(doc);
  });

  it('is deterministic: lowest free addresses first, ports in document order', () => {
    const doc = unaddressedDesign();
    const once = autoAssignAddresses(deepFreeze(doc));
    expect(autoAssignAddresses(doc)).toEqual(once);
    expect(port(once, 'array-1.ctl-a.p1').address).toEqual({ mode: 'static', ip: '198.51.100.1' }); // first host of an RFC 5737 /24
    // The management network's gateway is 192.0.2.1 (the pattern's default), so management starts at .2.
    expect(port(once, 'array-1.ctl-a.mgmt').address).toEqual({ mode: 'static', ip: '192.0.2.2' });
  });

  it('keeps addresses already set and never hands them out again', () => {
    let doc = unaddressedDesign();
    doc = apply(doc, 'setPort', { id: 'host-3.card-1.p1', address: { mode: 'static', ip: '198.51.100.1' } });
    doc = apply(doc, 'setPort', { id: 'host-4.card-1.p1', address: { mode: 'static', ip: '198.51.100.3' } });
    doc = apply(doc, 'setPort', { id: 'host-5.card-1.p1', address: { mode: 'dhcp' } });
    const next = apply(doc, 'autoAssignAddresses', {});
    expect(port(next, 'host-3.card-1.p1').address).toEqual({ mode: 'static', ip: '198.51.100.1' });
    expect(port(next, 'host-5.card-1.p1').address).toEqual({ mode: 'dhcp' });
    expect(port(next, 'array-1.ctl-a.p1').address).toEqual({ mode: 'static', ip: '198.51.100.2' });
    checkPlan(next);
  });

  it('leaves the ports a small block cannot hold unaddressed, for the analysis to report', () => {
    let doc = apply(smallDesign(), 'addNetwork', { name: 'tiny', purpose: 'data', cidr: '192.0.2.8/30' }); // RFC 5737 TEST-NET-1
    for (const id of ['host-1-card-1-p1', 'host-2-card-1-p1', 'array-1-ctl-a-p1']) doc = apply(doc, 'setPort', { id, networkId: 'net-tiny' });
    const next = apply(doc, 'autoAssignAddresses', {});
    // A /30 has two host addresses: .9 and .10 (network .8 and broadcast .11 excluded, RFC 4632).
    // Document order: array-1 comes before the hosts, so host-2 is the one left over.
    expect(['array-1-ctl-a-p1', 'host-1-card-1-p1', 'host-2-card-1-p1'].map((id) => port(next, id).address)).toEqual([
      { mode: 'static', ip: '192.0.2.9' },
      { mode: 'static', ip: '192.0.2.10' },
      undefined,
    ]);
  });

  it('uses both addresses of a /31 point-to-point block', () => {
    let doc = apply(smallDesign(), 'addNetwork', { name: 'p2p', purpose: 'data', cidr: '198.51.100.6/31' });
    for (const id of ['host-1-card-1-p1', 'array-1-ctl-a-p1']) doc = apply(doc, 'setPort', { id, networkId: 'net-p2p' });
    const next = apply(doc, 'autoAssignAddresses', {});
    // RFC 3021 §2.1: both addresses of a /31 are host addresses.
    expect([port(next, 'array-1-ctl-a-p1').address, port(next, 'host-1-card-1-p1').address]).toEqual([
      { mode: 'static', ip: '198.51.100.6' },
      { mode: 'static', ip: '198.51.100.7' },
    ]);
  });

  it('assigns IPv6 addresses from an RFC 3849 block, skipping the subnet-router anycast address', () => {
    let doc = apply(smallDesign(), 'addNetwork', { name: 'v6', purpose: 'data', cidr: '2001:db8:a::/64', gateway: '2001:db8:a::1' });
    for (const id of ['host-1-card-1-p1', 'host-2-card-1-p1', 'array-1-ctl-a-p1']) doc = apply(doc, 'setPort', { id, networkId: 'net-v6' });
    const next = apply(doc, 'autoAssignAddresses', {});
    // ::0 is the subnet-router anycast address and ::1 the gateway, so array-1 (the target) gets ::2;
    // hosts take the high block, from the middle of the first 256 usable addresses (::1 + 128 = ::81).
    expect(port(next, 'array-1-ctl-a-p1').address).toEqual({ mode: 'static', ip: '2001:db8:a::2' });
    expect(port(next, 'host-1-card-1-p1').address).toEqual({ mode: 'static', ip: '2001:db8:a::81' });
    expect(port(next, 'host-2-card-1-p1').address).toEqual({ mode: 'static', ip: '2001:db8:a::82' });
    checkPlan(next);
  });

  it('limits itself to the networks or ports asked for', () => {
    const doc = unaddressedDesign();
    const management = apply(doc, 'autoAssignAddresses', { networkIds: ['net-management'] });
    expect(allPorts(management).filter((p) => p.port.address).every((p) => p.port.networkId === 'net-management')).toBe(true);
    expect([...planAddresses(doc, { portIds: ['host-2.card-2.p1'] }).keys()]).toEqual(['host-2.card-2.p1']);
    expect(refusal(() => apply(doc, 'autoAssignAddresses', { networkIds: ['net-nowhere'] })).code).toBe('not-found');
  });

  it('clears the addresses of one network so they can be planned again', () => {
    const doc = apply(apply(unaddressedDesign(), 'autoAssignAddresses', {}), 'clearAddresses', { networkId: 'net-fabric-b' });
    const b = allPorts(doc).filter((p) => p.port.networkId === 'net-fabric-b');
    expect(b.length).toBeGreaterThan(0);
    expect(b.every((p) => p.port.address === undefined)).toBe(true);
    expect(allPorts(doc).some((p) => p.port.networkId === 'net-fabric-a' && p.port.address)).toBe(true);
  });

  it('holds for any RFC 5737 block, gateway and pre-set addresses (property)', () => {
    const bases = ['192.0.2.0', '198.51.100.0', '203.0.113.0'];
    fc.assert(
      fc.property(
        fc.constantFrom(...bases),
        fc.integer({ min: 24, max: 30 }),
        fc.integer({ min: 0, max: 4 }),
        fc.array(fc.integer({ min: 0, max: 255 }), { maxLength: 3 }),
        (base, prefix, gatewayHost, taken) => {
          const cidr = `${base}/${prefix}`;
          const prefixBase = base.split('.').slice(0, 3).join('.');
          let doc = apply(smallDesign(), 'addNetwork', { name: 'n', purpose: 'data', cidr, gateway: `${prefixBase}.${gatewayHost + 1}` });
          const ids = allPorts(doc).filter((p) => p.device.kind !== 'switch' && p.port.role === 'data').map((p) => p.port.id);
          ids.forEach((id, i) => {
            doc = apply(doc, 'setPort', { id, networkId: 'net-n', ...(i < taken.length ? { address: { mode: 'static' as const, ip: `${prefixBase}.${taken[i]}` } } : {}) });
          });
          const next = expectValid(autoAssignAddresses(doc));
          // Typed addresses may be reserved or outside the block (a draft); only the assigned ones are checked.
          const preset = new Set(ids.slice(0, taken.length));
          checkPlan(next, preset);
          const typed = new Set(taken.map((t) => `${prefixBase}.${t}`));
          for (const id of ids.slice(taken.length)) {
            const address = port(next, id).address;
            if (address?.mode === 'static') expect(typed.has(address.ip)).toBe(false);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
