import { plannedDeviceId } from '@/lib/editor/commands';
import { CommandError } from '@/lib/editor/errors';
import { TEMPLATES } from '@/lib/editor/templates';
import { allPorts, apply, blank, device, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

describe('adding devices from templates', () => {
  it('numbers new devices by template and derives readable ids for every part', () => {
    const doc = smallDesign();
    expect(doc.devices.map((d) => d.id)).toEqual(['array-1', 'switch-1', 'switch-2', 'host-1', 'host-2']);
    const host = device(doc, 'host-1');
    expect(host.kind === 'host' && host.adapters.map((a) => a.id)).toEqual(['host-1-card-1', 'host-1-card-2', 'host-1-onboard']);
    expect(allPorts(doc).map((p) => p.port.id)).toContain('host-1-card-2-p1');
    expect(allPorts(doc).map((p) => p.port.id)).toContain('array-1-ctl-b-mgmt');
  });

  it('builds an array of 1–4 controllers × data ports, each controller with one management port', () => {
    const doc = apply(blank(), 'addDevice', { template: 'array', options: { controllers: 4, dataPorts: 3, speedGbps: 25, connector: 'sfp' } });
    const array = device(doc, 'array-1');
    if (array.kind !== 'array') throw new Error('not an array');
    expect(array.controllers.map((c) => c.name)).toEqual(['ctl-a', 'ctl-b', 'ctl-c', 'ctl-d']);
    for (const controller of array.controllers) {
      expect(controller.ports.filter((p) => p.role === 'data').map((p) => [p.speedGbps, p.connector])).toEqual([[25, 'sfp'], [25, 'sfp'], [25, 'sfp']]);
      // Out-of-band management ports are 1G copper (common practice).
      expect(controller.ports.filter((p) => p.role === 'management').map((p) => [p.speedGbps, p.connector])).toEqual([[1, 'rj45']]);
    }
  });

  it('refuses a fifth controller in the template options with a field path', () => {
    const error = refusal(() => apply(blank(), 'addDevice', { template: 'array', options: { controllers: 5 } }));
    expect(error).toBeInstanceOf(CommandError);
    expect(error.code).toBe('bad-args');
    expect(error.path).toBe('options.controllers');
  });

  it('gives management switches management ports and data/shared switches data ports', () => {
    let doc = apply(blank(), 'addDevice', { template: 'management-switch' });
    doc = apply(doc, 'addDevice', { template: 'shared-switch', options: { ports: 48 } });
    const [mgmt, shared] = doc.devices;
    expect(mgmt.kind === 'switch' && [mgmt.role, mgmt.ports.length, mgmt.ports.every((p) => p.role === 'management')]).toEqual(['management', 24, true]);
    expect(shared.kind === 'switch' && [shared.role, shared.ports.length, shared.ports.every((p) => p.role === 'data')]).toEqual(['shared', 48, true]);
    expect(doc.devices.map((d) => d.name)).toEqual(['switch-1', 'switch-2']);
  });

  it('builds hosts from cards × ports per card plus an onboard management port', () => {
    const doc = apply(blank(), 'addDevice', { template: 'host', options: { cards: 3, portsPerCard: 4 } });
    const host = device(doc, 'host-1');
    expect(host.kind === 'host' && host.adapters.map((a) => [a.name, a.ports.length])).toEqual([['card-1', 4], ['card-2', 4], ['card-3', 4], ['onboard', 1]]);
  });

  it('fills the gap a deleted device left and never reuses a taken id', () => {
    let doc = apply(smallDesign(), 'deleteDevices', { ids: ['host-1'] });
    expect(plannedDeviceId(doc, { template: 'host' })).toBe('host-1');
    doc = apply(doc, 'addDevice', { template: 'host' });
    expect(doc.devices.filter((d) => d.kind === 'host').map((d) => d.id).sort()).toEqual(['host-1', 'host-2']);
    doc = apply(doc, 'addDevice', { template: 'host', name: 'host-2' });
    expect(doc.devices[doc.devices.length - 1].id).toBe('host-2-2');
  });

  it('places a device without a position right of the drawing, on the grid', () => {
    const doc = apply(smallDesign(), 'addDevice', { template: 'host' });
    const p = doc.layout!['host-3'];
    expect(p.x % 20).toBe(0);
    expect(p.y % 20).toBe(0);
    expect(p.x).toBeGreaterThan(700);
  });

  it('offers one palette entry per device kind and switch role', () => {
    expect(TEMPLATES.map((t) => t.id)).toEqual(['array', 'data-switch', 'management-switch', 'shared-switch', 'host']);
  });
});

describe('renaming and editing devices', () => {
  it('renames a device, a controller, a card and a port by id', () => {
    let doc = apply(smallDesign(), 'renameDevice', { id: 'host-1', name: 'wms-db-1' });
    doc = apply(doc, 'renamePart', { id: 'array-1-ctl-a', name: 'upper' });
    doc = apply(doc, 'renamePart', { id: 'host-1-card-2', name: 'slot 3' });
    doc = apply(doc, 'renamePart', { id: 'switch-1-p4', name: 'uplink' });
    const names = JSON.stringify(doc);
    for (const name of ['wms-db-1', 'upper', 'slot 3', 'uplink']) expect(names).toContain(`"name":"${name}"`);
  });

  it('refuses to rename a cable or an unknown id as a part', () => {
    const doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    expect(refusal(() => apply(doc, 'renamePart', { id: 'cable-1', name: 'x' })).code).toBe('wrong-kind');
    expect(refusal(() => apply(doc, 'renamePart', { id: 'nothing-here', name: 'x' })).code).toBe('not-found');
  });

  it('returns the very same document when a rename changes nothing', () => {
    const doc = smallDesign();
    expect(apply(doc, 'renameDevice', { id: 'host-1', name: 'host-1' })).toBe(doc);
  });

  it('sets switch role, host IQN and rack position, and clears them with null', () => {
    let doc = apply(smallDesign(), 'setDevice', { id: 'switch-1', role: 'shared', rack: 'R2', ru: 40 });
    doc = apply(doc, 'setDevice', { id: 'host-1', iqn: 'iqn.2026-01.example.tidewater:host-1' }); // RFC 7143 §4.2.7.2 iqn. form
    // A rack name nobody has used yet adds the rack (42U, the format's default height).
    expect(doc.racks).toEqual([{ id: 'rk-r2', name: 'R2', heightU: 42 }]);
    expect(device(doc, 'switch-1')).toMatchObject({ role: 'shared', placement: { rackId: 'rk-r2', ru: 40 } });
    expect(device(doc, 'host-1')).toMatchObject({ iqn: 'iqn.2026-01.example.tidewater:host-1' });
    doc = apply(doc, 'setDevice', { id: 'switch-1', rack: null, ru: null });
    doc = apply(doc, 'setDevice', { id: 'host-1', iqn: '' });
    expect('placement' in device(doc, 'switch-1')).toBe(false);
    expect('iqn' in device(doc, 'host-1')).toBe(false);
    expect(doc.racks).toHaveLength(1); // the rack stays in the room when it is emptied
  });

  it('puts a device into the lowest free units of a rack chosen by name, and moves it by unit', () => {
    let doc = apply(smallDesign(), 'setDevice', { id: 'switch-1', rack: 'A01', ru: 1 });
    doc = apply(doc, 'setDevice', { id: 'host-1', rack: 'A01' });
    expect(device(doc, 'host-1').placement).toEqual({ rackId: 'rk-a01', ru: 2 }); // unit 1 is the switch's
    doc = apply(doc, 'setDevice', { id: 'host-1', ru: 30 });
    expect(device(doc, 'host-1').placement).toEqual({ rackId: 'rk-a01', ru: 30 });
    expect(doc.racks).toHaveLength(1);
  });

  it('refuses a unit for a device in no rack, a role on a host and an IQN on a switch', () => {
    expect(() => apply(smallDesign(), 'setDevice', { id: 'host-1', ru: 4 })).toThrow(/Choose a rack first/);
    expect(() => apply(smallDesign(), 'setDevice', { id: 'host-1', role: 'data' })).toThrow(/Only a switch/);
    expect(() => apply(smallDesign(), 'setDevice', { id: 'switch-1', iqn: 'iqn.x' })).toThrow(/Only a host/);
  });
});

describe('deleting devices', () => {
  it('removes the devices with every cable on their ports and their layout entries', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p2' });
    doc = apply(doc, 'cablePorts', { a: 'array-1-ctl-a-p1', b: 'switch-2-p1' });
    doc = apply(doc, 'deleteDevices', { ids: ['switch-1', 'host-2'] });
    expect(doc.devices.map((d) => d.id)).toEqual(['array-1', 'switch-2', 'host-1']);
    expect(doc.cables.map((c) => [c.a, c.b])).toEqual([['array-1-ctl-a-p1', 'switch-2-p1']]);
    expect(Object.keys(doc.layout!).sort()).toEqual(['array-1', 'host-1', 'switch-2']);
  });

  it('ignores ids that are no longer in the document (a stale selection)', () => {
    const doc = smallDesign();
    expect(apply(doc, 'deleteDevices', { ids: ['host-9'] })).toBe(doc);
  });
});

describe('deleting a mixed selection', () => {
  it('removes cables, devices, parts and networks in one step, skipping what went along', () => {
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p2' });
    doc = apply(doc, 'addNetwork', { name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/24' }); // RFC 5737
    doc = apply(doc, 'deleteItems', { ids: ['cable-2', 'host-1', 'host-1-card-1-p1', 'host-2-card-2', 'switch-2-p3', 'net-fabric-a', 'gone'] });
    expect(doc.cables).toEqual([]);
    expect(doc.networks).toEqual([]);
    expect(doc.devices.map((d) => d.id)).toEqual(['array-1', 'switch-1', 'switch-2', 'host-2']);
    const host = device(doc, 'host-2');
    expect(host.kind === 'host' && host.adapters.map((a) => a.name)).toEqual(['card-1', 'onboard']);
    const sw = device(doc, 'switch-2');
    expect(sw.kind === 'switch' && sw.ports.length).toBe(11);
  });

  it('refuses to take the last controller of an array', () => {
    expect(refusal(() => apply(smallDesign(), 'deleteItems', { ids: ['array-1-ctl-a', 'array-1-ctl-b'] })).code).toBe('refused');
  });
});

describe('target names', () => {
  it('gives an array a target name and a controller its own, and refuses one on a switch or a card', () => {
    const named = apply(smallDesign(), 'setDevice', { id: 'array-1', iqn: ' iqn.2026-01.example.tidewater:storage.array-1 ' });
    expect(device(named, 'array-1')).toMatchObject({ iqn: 'iqn.2026-01.example.tidewater:storage.array-1' });
    const own = apply(named, 'setControllerIqn', { id: 'array-1-ctl-b', iqn: 'iqn.2026-01.example.tidewater:storage.array-1.b' });
    const array = device(own, 'array-1');
    expect(array.kind === 'array' && array.controllers.map((c) => c.iqn)).toEqual([undefined, 'iqn.2026-01.example.tidewater:storage.array-1.b']);
    const cleared = apply(own, 'setControllerIqn', { id: 'array-1-ctl-b', iqn: '' });
    const again = device(cleared, 'array-1');
    expect(again.kind === 'array' && 'iqn' in again.controllers[1]).toBe(false);
    expect(refusal(() => apply(named, 'setControllerIqn', { id: 'host-1-card-1', iqn: 'iqn.2026-01.example.tidewater:x' }))).toMatchObject({ code: 'wrong-kind', path: 'id' });
    expect(refusal(() => apply(named, 'setControllerIqn', { id: 'nothing', iqn: null }))).toMatchObject({ code: 'not-found' });
    expect(refusal(() => apply(named, 'setDevice', { id: 'switch-1', iqn: 'iqn.2026-01.example.tidewater:x' }))).toMatchObject({ code: 'wrong-kind' });
  });
});
