import { diffTopologies } from '@/shared/diff';
import { validateTopology } from '@/shared/topology/validate';
import { bay, cableOf, edited, portOf } from './fixtures';

describe('diff of versions that carry the same design', () => {
  it('starts from a valid document', () => {
    expect(validateTopology(bay())).toMatchObject({ ok: true });
  });

  it('is empty for a document against itself and against a copy', () => {
    const doc = bay();
    for (const other of [doc, structuredClone(doc)]) {
      const diff = diffTopologies(doc, other);
      expect(diff.empty).toBe(true);
      expect(diff.counts.total).toBe(0);
      expect(diff.document).toEqual([]);
      expect(diff.layoutMoved).toBe(0);
    }
  });

  it('ignores the order of devices, ports, cables and networks', () => {
    const after = edited(bay(), (doc) => {
      doc.devices.reverse();
      doc.cables.reverse();
      doc.networks.reverse();
      for (const device of doc.devices) if (device.kind === 'switch') device.ports.reverse();
    });
    expect(diffTopologies(bay(), after).empty).toBe(true);
  });

  it('treats a cable turned end for end as the same cable', () => {
    const after = edited(bay(), (doc) => {
      const cable = cableOf(doc, 'c-1');
      [cable.a, cable.b] = [cable.b, cable.a];
    });
    expect(diffTopologies(bay(), after).empty).toBe(true);
  });

  it('reads an absent security block as CHAP none', () => {
    // The format page: security is optional, default "none".
    const before = edited(bay(), (doc) => delete doc.security);
    const after = edited(bay(), (doc) => (doc.security = { chap: 'none' }));
    expect(diffTopologies(before, after).empty).toBe(true);
  });

  it('compares addresses as addresses, not as text', () => {
    const v6 = (ip: string) =>
      edited(bay(), (doc) => {
        doc.networks[0].cidr = '2001:db8:0::/64';
        portOf(doc, 'srv-1.card-1.p1').address = { mode: 'static', ip };
      });
    // RFC 3849 documentation prefix; RFC 5952 §4 canonical text vs a longer spelling of one address.
    expect(diffTopologies(v6('2001:db8::21'), v6('2001:DB8:0:0::21')).empty).toBe(true);
    expect(diffTopologies(v6('2001:db8::21'), v6('2001:db8::22')).counts.addresses.changed).toBe(1);
  });

  it('is empty when only boxes moved on the canvas, and counts the moved boxes', () => {
    const after = edited(bay(), (doc) => {
      doc.layout!['sw-a'] = { x: 180, y: 300 };
      doc.layout!['srv-1'] = { x: 320, y: 520 };
      delete doc.layout!['sw-b'];
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.empty).toBe(true);
    expect(diff.layoutMoved).toBe(3);
  });

  it('does not count the position of a removed device as a move', () => {
    const after = edited(bay(), (doc) => {
      doc.devices = doc.devices.filter((d) => d.id !== 'sw-b');
      doc.cables = doc.cables.filter((c) => !c.a.startsWith('sw-b.') && !c.b.startsWith('sw-b.'));
      doc.layout!['sw-b'] = { x: 0, y: 0 };
    });
    const diff = diffTopologies(bay(), after);
    expect(diff.layoutMoved).toBe(0);
    expect(diff.devices.removed.map((d) => d.id)).toEqual(['sw-b']);
  });
});
