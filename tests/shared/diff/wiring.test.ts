import { diffTopologies } from '@/shared/diff';
import { bay, cableOf, deviceOf, edited, portOf } from './fixtures';

describe('diff of cables and addresses', () => {
  it('shows a cable whose end moved as changed, with both ends named by device and port', () => {
    const after = edited(bay(), (doc) => (cableOf(doc, 'c-1').b = 'sw-b.p4'));
    const diff = diffTopologies(bay(), after);
    expect(diff.cables.changed).toEqual([{ id: 'c-1', name: 'BAY-c-1', changes: [{ field: 'b', before: 'sw-a / p1', after: 'sw-b / p4' }] }]);
    expect(diff.counts.total).toBe(1);
  });

  it('lines up a cable that was turned around and had one end moved', () => {
    // Before: srv-1 card-1 p1 — sw-a p1. After: sw-a p4 — srv-1 card-1 p1. Only the switch end moved.
    const after = edited(bay(), (doc) => {
      const cable = cableOf(doc, 'c-1');
      cable.a = 'sw-a.p4';
      cable.b = 'srv-1.card-1.p1';
    });
    expect(diffTopologies(bay(), after).cables.changed[0].changes).toEqual([{ field: 'b', before: 'sw-a / p1', after: 'sw-a / p4' }]);
  });

  it('shows both ends when a cable was moved entirely', () => {
    const after = edited(bay(), (doc) => {
      const cable = cableOf(doc, 'c-4');
      cable.a = 'srv-1.card-1.p2';
      cable.b = 'sw-a.p4';
    });
    expect(diffTopologies(bay(), after).cables.changed[0].changes).toEqual([
      { field: 'a', before: 'store-1 / ctl-b p1', after: 'srv-1 / card-1 p2' },
      { field: 'b', before: 'sw-a / p3', after: 'sw-a / p4' },
    ]);
  });

  it('lists a changed media, length and label, and a removed label', () => {
    const after = edited(bay(), (doc) => {
      const cable = cableOf(doc, 'c-3');
      cable.media = 'om4'; // TIA-492AAAD multimode fibre — from memory
      cable.lengthM = 12;
      cable.label = 'BAY-c-3-new';
      delete cableOf(doc, 'c-5').label;
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.cables.changed).toEqual([
      {
        id: 'c-3',
        name: 'BAY-c-3-new',
        changes: [
          { field: 'media', before: 'cat6a', after: 'om4' },
          { field: 'lengthM', before: 3, after: 12 },
          { field: 'label', before: 'BAY-c-3', after: 'BAY-c-3-new' },
        ],
      },
      // A cable without a label is named by its id.
      { id: 'c-5', name: 'c-5', changes: [{ field: 'label', before: 'BAY-c-5', after: null }] },
    ]);
  });

  it('lists added and removed cables, sorted by id', () => {
    const after = edited(bay(), (doc) => {
      doc.cables = doc.cables.filter((c) => c.id !== 'c-2');
      doc.cables.push({ id: 'c-9', a: 'srv-1.card-1.p2', b: 'sw-b.p4', media: 'cat6' });
      doc.cables.push({ id: 'c-10', a: 'srv-1.card-2.p1', b: 'sw-a.p4', media: 'cat6' });
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.cables.removed.map((c) => c.id)).toEqual(['c-2']);
    expect(diff.cables.added).toEqual([
      {
        id: 'c-10',
        name: 'c-10',
        changes: [
          { field: 'a', before: null, after: 'srv-1 / card-2 p1' },
          { field: 'b', before: null, after: 'sw-a / p4' },
          { field: 'media', before: null, after: 'cat6' },
        ],
      },
      expect.objectContaining({ id: 'c-9' }),
    ]);
  });

  it('shows a changed address with the port it is on', () => {
    const after = edited(bay(), (doc) => {
      portOf(doc, 'srv-1.card-1.p1').address = { mode: 'static', ip: '198.51.100.31' }; // RFC 5737 TEST-NET-2
    });
    const diff = diffTopologies(bay(), after);
    const [entry] = diff.addresses.changed;
    expect(entry).toEqual({
      id: 'srv-1.card-1.p1',
      name: 'srv-1 / card-1 p1',
      device: 'srv-1',
      changes: [{ field: 'address', before: '198.51.100.21', after: '198.51.100.31' }],
    });
    const line = `${entry.name}: ${entry.changes[0].before} → ${entry.changes[0].after}`;
    expect(line).toBe('srv-1 / card-1 p1: 198.51.100.21 → 198.51.100.31');
    // The address is the only thing that changed: the port itself is not listed.
    expect(diff.counts.total).toBe(1);
  });

  it('lists an address that came, one that went, and a switch to DHCP', () => {
    const after = edited(bay(), (doc) => {
      portOf(doc, 'srv-1.card-1.p2').address = { mode: 'static', ip: '198.51.100.22' }; // RFC 5737
      delete portOf(doc, 'arr-1.ctl-b.p2').address;
      portOf(doc, 'srv-1.card-2.p1').address = { mode: 'dhcp' };
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.addresses.added).toEqual([
      { id: 'srv-1.card-1.p2', name: 'srv-1 / card-1 p2', device: 'srv-1', changes: [{ field: 'address', before: null, after: '198.51.100.22' }] },
    ]);
    expect(diff.addresses.removed).toEqual([
      { id: 'arr-1.ctl-b.p2', name: 'store-1 / ctl-b p2', device: 'store-1', changes: [{ field: 'address', before: '203.0.113.2', after: null }] },
    ]);
    expect(diff.addresses.changed[0].changes).toEqual([{ field: 'address', before: '203.0.113.21', after: 'dhcp' }]);
  });

  it('names the ends of a removed cable from the version that had them', () => {
    const after = edited(bay(), (doc) => {
      deviceOf(doc, 'sw-a').name = 'edge-a';
      doc.cables = doc.cables.filter((c) => c.id !== 'c-3');
    });
    const removed = diffTopologies(bay(), after).cables.removed[0];
    expect(removed.changes.slice(0, 2)).toEqual([
      { field: 'a', before: 'store-1 / ctl-a p1', after: null },
      { field: 'b', before: 'sw-a / p2', after: null },
    ]);
  });
});
