import { diffTopologies } from '@/shared/diff';
import type { HostDevice } from '@/shared/topology/schema';
import { bay, deviceOf, edited, portOf } from './fixtures';

const host = (doc: ReturnType<typeof bay>) => deviceOf(doc, 'srv-1') as HostDevice;

describe('diff of devices, controllers and cards, ports and networks', () => {
  it('lists an added host with its cards and ports, each entry with every field it has', () => {
    const after = edited(bay(), (doc) => {
      doc.devices.push({
        id: 'srv-2',
        kind: 'host',
        name: 'srv-2',
        placement: { rackId: 'rk-r1', ru: 30 },
        adapters: [{ id: 'srv-2.card-1', name: 'card-1', ports: [{ id: 'srv-2.card-1.p1', name: 'p1', role: 'data', speedGbps: 25, connector: 'sfp' }] }],
      });
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.devices.added).toEqual([
      {
        id: 'srv-2',
        name: 'srv-2',
        kind: 'host',
        changes: [
          { field: 'name', before: null, after: 'srv-2' },
          { field: 'kind', before: null, after: 'host' },
          { field: 'rack', before: null, after: 'R1' },
          { field: 'ru', before: null, after: 30 },
        ],
      },
    ]);
    expect(diff.groups.added).toEqual([
      expect.objectContaining({ id: 'srv-2.card-1', name: 'srv-2 / card-1', kind: 'adapter', device: 'srv-2' }),
    ]);
    expect(diff.ports.added).toEqual([
      {
        id: 'srv-2.card-1.p1',
        name: 'srv-2 / card-1 p1',
        device: 'srv-2',
        changes: [
          { field: 'name', before: null, after: 'p1' },
          { field: 'role', before: null, after: 'data' },
          { field: 'speedGbps', before: null, after: 25 }, // IEEE 802.3by, 25 Gb/s Ethernet
          { field: 'connector', before: null, after: 'sfp' },
          { field: 'device', before: null, after: 'srv-2' },
          { field: 'group', before: null, after: 'card-1' },
        ],
      },
    ]);
    expect(diff.counts).toMatchObject({ devices: { added: 1, removed: 0, changed: 0 }, groups: { added: 1 }, ports: { added: 1 }, total: 3 });
    expect(diff.empty).toBe(false);
  });

  it('lists a removed switch with its ports and the cables that went with it, named from the earlier version', () => {
    const after = edited(bay(), (doc) => {
      doc.devices = doc.devices.filter((d) => d.id !== 'sw-b');
      doc.cables = doc.cables.filter((c) => !c.b.startsWith('sw-b.'));
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.devices.removed).toEqual([
      {
        id: 'sw-b',
        name: 'sw-b',
        kind: 'switch',
        changes: [
          { field: 'name', before: 'sw-b', after: null },
          { field: 'kind', before: 'switch', after: null },
          { field: 'role', before: 'data', after: null },
        ],
      },
    ]);
    expect(diff.ports.removed.map((p) => [p.id, p.name])).toEqual([
      ['sw-b.p1', 'sw-b / p1'],
      ['sw-b.p2', 'sw-b / p2'],
      ['sw-b.p3', 'sw-b / p3'],
      ['sw-b.p4', 'sw-b / p4'],
    ]);
    expect(diff.cables.removed.map((c) => c.id)).toEqual(['c-2', 'c-5', 'c-6']);
    expect(diff.cables.removed[0].changes[1]).toEqual({ field: 'b', before: 'sw-b / p1', after: null });
  });

  it('lists changed device fields: name, rack, ru, iqn and a switch role', () => {
    const after = edited(bay(), (doc) => {
      const array = deviceOf(doc, 'arr-1');
      array.name = 'store-2';
      array.placement = { rackId: 'rk-r1', ru: 22 };
      host(doc).iqn = 'iqn.2026-01.example.bay:srv-one'; // RFC 7143 §4.2.7.4 iqn. form
      const sw = deviceOf(doc, 'sw-a');
      if (sw.kind === 'switch') sw.role = 'shared';
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.devices.changed).toEqual([
      {
        id: 'arr-1',
        name: 'store-2',
        kind: 'array',
        changes: [
          { field: 'name', before: 'store-1', after: 'store-2' },
          { field: 'ru', before: 20, after: 22 },
        ],
      },
      { id: 'srv-1', name: 'srv-1', kind: 'host', changes: [{ field: 'iqn', before: 'iqn.2026-01.example.bay:srv-1', after: 'iqn.2026-01.example.bay:srv-one' }] },
      { id: 'sw-a', name: 'sw-a', kind: 'switch', changes: [{ field: 'role', before: 'data', after: 'shared' }] },
    ]);
  });

  it('renaming a switch changes the switch entry only, not its ports or the cables on it', () => {
    const after = edited(bay(), (doc) => (deviceOf(doc, 'sw-a').name = 'edge-a'));
    const diff = diffTopologies(bay(), after);
    expect(diff.counts.total).toBe(1);
    expect(diff.devices.changed[0].changes).toEqual([{ field: 'name', before: 'sw-a', after: 'edge-a' }]);
  });

  it('lists a renamed card and a card added to a host', () => {
    const after = edited(bay(), (doc) => {
      host(doc).adapters[1].name = 'card-B';
      host(doc).adapters.push({ id: 'srv-1.card-3', name: 'card-3', ports: [] });
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.groups.changed).toEqual([
      { id: 'srv-1.card-2', name: 'srv-1 / card-B', kind: 'adapter', device: 'srv-1', changes: [{ field: 'name', before: 'card-2', after: 'card-B' }] },
    ]);
    expect(diff.groups.added.map((g) => g.id)).toEqual(['srv-1.card-3']);
    // The renamed card's port is shown under the new name but is itself unchanged.
    expect(diff.ports.changed).toEqual([]);
  });

  it('lists changed port fields with the owning device, and a port moved to another card', () => {
    const after = edited(bay(), (doc) => {
      const p = portOf(doc, 'arr-1.ctl-a.p1');
      p.speedGbps = 25; // IEEE 802.3by
      p.connector = 'sfp';
      p.networkId = 'net-b';
      p.role = 'management';
      const [moved] = host(doc).adapters[0].ports.splice(1, 1);
      host(doc).adapters[1].ports.push(moved);
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.ports.changed).toEqual([
      {
        id: 'arr-1.ctl-a.p1',
        name: 'store-1 / ctl-a p1',
        device: 'store-1',
        changes: [
          { field: 'role', before: 'data', after: 'management' },
          { field: 'speedGbps', before: 10, after: 25 }, // IEEE 802.3an 10GBASE-T; IEEE 802.3by 25 Gb/s
          { field: 'connector', before: 'rj45', after: 'sfp' },
          { field: 'network', before: 'fabric A', after: 'fabric B' },
        ],
      },
      { id: 'srv-1.card-1.p2', name: 'srv-1 / card-2 p2', device: 'srv-1', changes: [{ field: 'group', before: 'card-1', after: 'card-2' }] },
    ]);
  });

  it('lists added, removed and changed networks', () => {
    const after = edited(bay(), (doc) => {
      doc.networks[0].mtu = 1500; // RFC 894 Ethernet MTU
      doc.networks[0].vlan = 111; // IEEE 802.1Q VLAN id, 1–4094
      doc.networks[0].gateway = '198.51.100.254'; // RFC 5737 TEST-NET-2
      doc.networks[0].purpose = 'management';
      doc.networks = doc.networks.filter((n) => n.id !== 'net-b');
      doc.networks.push({ id: 'net-m', name: 'management', purpose: 'management', cidr: '192.0.2.0/24' }); // RFC 5737 TEST-NET-1
      for (const d of doc.devices) if (d.kind !== 'switch') for (const g of d.kind === 'array' ? d.controllers : d.adapters) for (const p of g.ports) if (p.networkId === 'net-b') delete p.networkId;
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.networks.changed).toEqual([
      {
        id: 'net-a',
        name: 'fabric A',
        changes: [
          { field: 'purpose', before: 'data', after: 'management' },
          { field: 'vlan', before: 110, after: 111 },
          { field: 'mtu', before: 9000, after: 1500 },
          { field: 'gateway', before: null, after: '198.51.100.254' },
        ],
      },
    ]);
    expect(diff.networks.removed.map((n) => [n.id, n.name])).toEqual([['net-b', 'fabric B']]);
    expect(diff.networks.added[0]).toEqual({
      id: 'net-m',
      name: 'management',
      changes: [
        { field: 'name', before: null, after: 'management' },
        { field: 'purpose', before: null, after: 'management' },
        { field: 'cidr', before: null, after: '192.0.2.0/24' },
      ],
    });
    // Ports that left the removed network: shown by the network's name from the earlier version.
    expect(diff.ports.changed.map((p) => p.changes)).toContainEqual([{ field: 'network', before: 'fabric B', after: null }]);
  });

  it('lists the document name and the CHAP mode', () => {
    const after = edited(bay(), (doc) => {
      doc.name = 'Bay storage, second pass';
      doc.security = { chap: 'mutual' }; // RFC 7143 §12.1.3 (CHAP), target authenticated as well — from memory
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.document).toEqual([
      { field: 'name', before: 'Bay storage', after: 'Bay storage, second pass' },
      { field: 'security.chap', before: 'one-way', after: 'mutual' },
    ]);
    expect(diff.counts).toMatchObject({ document: 2, total: 2 });
    expect(diff.empty).toBe(false);
  });
});

describe('diff of the room (format 2)', () => {
  it('lists a rack, a feed and the site as document changes, and a device’s rack by name', () => {
    const after = edited(bay(), (doc) => {
      doc.racks!.push({ id: 'rk-r2', name: 'R2', row: 'A', position: 2, heightU: 48 });
      doc.racks![0].position = 3;
      doc.powerFeeds = [{ id: 'feed-a', name: 'Feed A' }];
      doc.site = { rackPitchMm: 800 };
      deviceOf(doc, 'arr-1').placement = { rackId: 'rk-r2', ru: 20 };
      deviceOf(doc, 'sw-a').psus = [{ id: 'sw-a.psu1', name: 'PSU 1', feedId: 'feed-a' }];
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.document).toEqual([
      { field: 'site.rackPitchMm', before: 600, after: 800 }, // 600 mm: the format's default pitch
      { field: 'rack rk-r1', before: 'R1, row A, position 1, 42U', after: 'R1, row A, position 3, 42U' },
      { field: 'rack rk-r2', before: null, after: 'R2, row A, position 2, 48U' },
      { field: 'power feed feed-a', before: null, after: 'Feed A' },
    ]);
    expect(diff.devices.changed).toEqual([
      { id: 'arr-1', name: 'store-1', kind: 'array', changes: [{ field: 'rack', before: 'R1', after: 'R2' }] },
      { id: 'sw-a', name: 'sw-a', kind: 'switch', changes: [{ field: 'psus', before: null, after: 'PSU 1 (Feed A)' }] },
    ]);
  });

  it('reads an absent site as the defaults, so writing the defaults out is no change', () => {
    const after = edited(bay(), (doc) => (doc.site = { rackPitchMm: 600, rowPitchMm: 1200, slackM: 0.5 }));
    expect(diffTopologies(bay(), after).empty).toBe(true);
  });
});
