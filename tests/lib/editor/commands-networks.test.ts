import { plannedNetworkId } from '@/lib/editor/commands';
import { apply, port, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

// Addresses from the documentation ranges: RFC 5737 (IPv4) and RFC 3849 (IPv6).
function withFabricA() {
  let doc = apply(smallDesign(), 'addNetwork', { name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/24', vlan: 110, mtu: 9000 });
  doc = apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: 'net-fabric-a', address: { mode: 'static', ip: '198.51.100.21' } });
  doc = apply(doc, 'setPort', { id: 'host-2-card-1-p1', networkId: 'net-fabric-a', address: { mode: 'dhcp' } });
  doc = apply(doc, 'setPort', { id: 'array-1-ctl-a-p1', networkId: 'net-fabric-a', address: { mode: 'static', ip: '203.0.113.9' } });
  return doc;
}

describe('networks', () => {
  it('adds a network with an id made from its name', () => {
    const doc = withFabricA();
    expect(doc.networks).toEqual([{ id: 'net-fabric-a', name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/24', vlan: 110, mtu: 9000 }]);
    expect(plannedNetworkId(doc, { name: 'fabric A' })).toBe('net-fabric-a-2');
  });

  it('adds an IPv6 network', () => {
    const doc = apply(smallDesign(), 'addNetwork', { name: 'fabric v6', purpose: 'data', cidr: '2001:db8:a::/64' }); // RFC 3849
    expect(doc.networks[0].cidr).toBe('2001:db8:a::/64');
  });

  it('refuses a malformed CIDR or gateway with a field path', () => {
    expect(refusal(() => apply(smallDesign(), 'addNetwork', { name: 'x', purpose: 'data', cidr: '198.51.100.0/33' })).path).toBe('network.cidr');
    expect(refusal(() => apply(smallDesign(), 'addNetwork', { name: 'x', purpose: 'data', cidr: '198.51.100.0/24', gateway: 'router' })).path).toBe('network.gateway');
  });

  it('keeps an out-of-range VLAN or MTU as a draft value for the analysis to report', () => {
    // IEEE 802.1Q: VLAN ids 1–4094; 5000 is a finding (vlan-out-of-range), not a refusal.
    const doc = apply(smallDesign(), 'addNetwork', { name: 'odd', purpose: 'data', cidr: '192.0.2.0/24', vlan: 5000 });
    expect(doc.networks[0].vlan).toBe(5000);
  });

  it('updates fields and clears optional ones with null', () => {
    let doc = apply(withFabricA(), 'updateNetwork', { id: 'net-fabric-a', name: 'fabric A (rack 2)', mtu: 1500, gateway: '198.51.100.254' });
    expect(doc.networks[0]).toMatchObject({ name: 'fabric A (rack 2)', mtu: 1500, gateway: '198.51.100.254', vlan: 110 });
    doc = apply(doc, 'updateNetwork', { id: 'net-fabric-a', vlan: null, gateway: null });
    expect(doc.networks[0]).toEqual({ id: 'net-fabric-a', name: 'fabric A (rack 2)', purpose: 'data', cidr: '198.51.100.0/24', mtu: 1500 });
  });

  it('leaves addresses alone when the block changes, unless asked to readdress', () => {
    const doc = withFabricA();
    const kept = apply(doc, 'updateNetwork', { id: 'net-fabric-a', cidr: '192.0.2.0/24' });
    expect(port(kept, 'host-1-card-1-p1').address).toEqual({ mode: 'static', ip: '198.51.100.21' });
    const moved = apply(doc, 'updateNetwork', { id: 'net-fabric-a', cidr: '192.0.2.0/24', readdress: true });
    // Renumbered from the new RFC 5737 block: the target low, hosts from the middle of the /24's 254
    // usable addresses (.1 + 127 = .128) up — targets low, hosts high (common practice).
    expect(port(moved, 'array-1-ctl-a-p1').address).toEqual({ mode: 'static', ip: '192.0.2.1' });
    expect(port(moved, 'host-1-card-1-p1').address).toEqual({ mode: 'static', ip: '192.0.2.128' });
    expect(port(moved, 'host-2-card-1-p1').address).toEqual({ mode: 'dhcp' });
  });

  it('removing a network takes its ports off it and drops only the static addresses inside it', () => {
    const doc = apply(withFabricA(), 'removeNetwork', { id: 'net-fabric-a' });
    expect(doc.networks).toEqual([]);
    expect(port(doc, 'host-1-card-1-p1')).not.toHaveProperty('networkId');
    expect(port(doc, 'host-1-card-1-p1')).not.toHaveProperty('address');
    expect(port(doc, 'host-2-card-1-p1').address).toEqual({ mode: 'dhcp' });
    expect(port(doc, 'array-1-ctl-a-p1').address).toEqual({ mode: 'static', ip: '203.0.113.9' });
  });

  it('refuses to remove a network that is not there', () => {
    expect(refusal(() => apply(smallDesign(), 'removeNetwork', { id: 'net-x' })).code).toBe('not-found');
  });
});

describe('design settings', () => {
  it('renames the design and sets the CHAP mode', () => {
    let doc = apply(smallDesign(), 'renameDesign', { name: 'Harbor Road storage' });
    doc = apply(doc, 'setChap', { chap: 'mutual' }); // RFC 7143 §12.1.3: CHAP, one-way or mutual
    expect([doc.name, doc.security]).toEqual(['Harbor Road storage', { chap: 'mutual' }]);
  });
});
