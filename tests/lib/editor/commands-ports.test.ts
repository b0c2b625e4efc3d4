import { allPorts, apply, device, port, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

function cabled() {
  // host-1 card-1 p1 == switch-1 p1; array-1 ctl-b p1 == switch-1 p2
  let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
  doc = apply(doc, 'cablePorts', { a: 'array-1-ctl-b-p1', b: 'switch-1-p2' });
  return apply(doc, 'addNetwork', { name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/24' }); // RFC 5737 TEST-NET-2
}

describe('controllers', () => {
  it('adds a controller like its siblings under the next free letter', () => {
    const doc = apply(apply(smallDesign(), 'removeController', { id: 'array-1-ctl-a' }), 'addController', { arrayId: 'array-1' });
    const array = device(doc, 'array-1');
    if (array.kind !== 'array') throw new Error('not an array');
    expect(array.controllers.map((c) => c.name)).toEqual(['ctl-b', 'ctl-a']);
    expect(array.controllers[1].ports.map((p) => p.name)).toEqual(['p1', 'p2', 'mgmt']);
  });

  it('refuses a fifth controller and removing the last one', () => {
    let doc = apply(smallDesign(), 'addController', { arrayId: 'array-1' });
    doc = apply(doc, 'addController', { arrayId: 'array-1' });
    expect(refusal(() => apply(doc, 'addController', { arrayId: 'array-1' })).message).toMatch(/at most four/);
    let single = apply(smallDesign(), 'removeController', { id: 'array-1-ctl-b' });
    expect(refusal(() => apply(single, 'removeController', { id: 'array-1-ctl-a' })).code).toBe('refused');
    single = apply(single, 'renameDevice', { id: 'array-1', name: 'vault-1' });
    expect(device(single, 'array-1').name).toBe('vault-1');
  });

  it('removes a controller together with the cables on its ports', () => {
    const doc = apply(cabled(), 'removeController', { id: 'array-1-ctl-b' });
    expect(doc.cables.map((c) => c.id)).toEqual(['cable-1']);
  });

  it('refuses a controller on a host', () => {
    expect(refusal(() => apply(smallDesign(), 'addController', { arrayId: 'host-1' })).code).toBe('wrong-kind');
  });
});

describe('cards', () => {
  it('adds a card before the onboard management group, like the other cards', () => {
    const doc = apply(smallDesign(), 'addAdapter', { hostId: 'host-1' });
    const host = device(doc, 'host-1');
    expect(host.kind === 'host' && host.adapters.map((a) => `${a.name}:${a.ports.length}`)).toEqual(['card-1:2', 'card-2:2', 'card-3:2', 'onboard:1']);
    expect(port(doc, 'host-1-card-3-p2')).toMatchObject({ role: 'data', speedGbps: 10, connector: 'rj45' });
  });

  it('removes a card with its cables', () => {
    const doc = apply(cabled(), 'removeAdapter', { id: 'host-1-card-1' });
    expect(doc.cables.map((c) => c.id)).toEqual(['cable-2']);
    expect(allPorts(doc).some((p) => p.port.id.startsWith('host-1-card-1'))).toBe(false);
  });
});

describe('ports', () => {
  it('adds a port to a switch, a controller and a card, copying the last sibling', () => {
    let doc = apply(smallDesign(), 'addPort', { ownerId: 'switch-1' });
    doc = apply(doc, 'addPort', { ownerId: 'array-1-ctl-a', role: 'data', speedGbps: 25, connector: 'sfp' });
    doc = apply(doc, 'addPort', { ownerId: 'host-1-card-2' });
    expect(port(doc, 'switch-1-p13')).toMatchObject({ name: 'p13', role: 'data' });
    expect(port(doc, 'array-1-ctl-a-p3')).toMatchObject({ speedGbps: 25, connector: 'sfp' });
    expect(port(doc, 'host-1-card-2-p3')).toMatchObject({ speedGbps: 10 });
    const ctl = device(doc, 'array-1');
    expect(ctl.kind === 'array' && ctl.controllers[0].ports.map((p) => p.name)).toEqual(['p1', 'p2', 'p3', 'mgmt']);
  });

  it('gives a new data port the data ports\' speed, not the management port\'s', () => {
    const doc = apply(smallDesign(), 'addPort', { ownerId: 'array-1-ctl-b' });
    expect(port(doc, 'array-1-ctl-b-p3')).toMatchObject({ role: 'data', speedGbps: 10 });
    const mgmt = apply(smallDesign(), 'addPort', { ownerId: 'array-1-ctl-b', role: 'management' });
    expect(port(mgmt, 'array-1-ctl-b-p3')).toMatchObject({ role: 'management', speedGbps: 1 });
  });

  it('refuses a port on a host itself (ports live on its cards)', () => {
    expect(refusal(() => apply(smallDesign(), 'addPort', { ownerId: 'host-1' })).code).toBe('wrong-kind');
  });

  it('removes a port with its cables', () => {
    const doc = apply(cabled(), 'removePort', { id: 'switch-1-p1' });
    expect(doc.cables.map((c) => c.id)).toEqual(['cable-2']);
  });

  it('sets role, speed, connector, network and address of a host port', () => {
    const doc = apply(cabled(), 'setPort', {
      id: 'host-1-card-1-p1',
      speedGbps: 25,
      connector: 'sfp',
      networkId: 'net-fabric-a',
      address: { mode: 'static', ip: '198.51.100.20' }, // RFC 5737 TEST-NET-2
    });
    expect(port(doc, 'host-1-card-1-p1')).toMatchObject({ speedGbps: 25, connector: 'sfp', networkId: 'net-fabric-a', address: { mode: 'static', ip: '198.51.100.20' } });
    const cleared = apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: null, address: null, role: 'management' });
    expect(port(cleared, 'host-1-card-1-p1')).toEqual({ id: 'host-1-card-1-p1', name: 'p1', role: 'management', speedGbps: 25, connector: 'sfp' });
  });

  it('never puts a network or an address on a switch port', () => {
    const doc = cabled();
    expect(refusal(() => apply(doc, 'setPort', { id: 'switch-1-p1', networkId: 'net-fabric-a' })).path).toBe('networkId');
    expect(refusal(() => apply(doc, 'setPort', { id: 'switch-1-p1', address: { mode: 'dhcp' } })).path).toBe('address');
    expect(port(apply(doc, 'setPort', { id: 'switch-1-p1', speedGbps: 25 }), 'switch-1-p1').speedGbps).toBe(25);
  });

  it('refuses an unknown network and a malformed address with their field paths', () => {
    const doc = cabled();
    expect(refusal(() => apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: 'net-nowhere' })).path).toBe('networkId');
    expect(refusal(() => apply(doc, 'setPort', { id: 'host-1-card-1-p1', address: { mode: 'static', ip: '198.51.100.300' } })).path).toMatch(/^args\.address/);
  });

  it('drops a static address that lies outside the network a port moves to', () => {
    let doc = apply(cabled(), 'addNetwork', { name: 'fabric B', purpose: 'data', cidr: '203.0.113.0/24' }); // RFC 5737 TEST-NET-3
    doc = apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: 'net-fabric-a', address: { mode: 'static', ip: '198.51.100.20' } });
    const moved = apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: 'net-fabric-b' });
    expect(port(moved, 'host-1-card-1-p1').address).toBeUndefined();
    const kept = apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: 'net-fabric-b', address: { mode: 'dhcp' } });
    expect(port(kept, 'host-1-card-1-p1').address).toEqual({ mode: 'dhcp' });
  });
});
