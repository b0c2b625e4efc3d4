import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { assignStableLabels, labelHistory, NO_LABEL_HISTORY } from '@/shared/labels';
import type { Cable, Topology } from '@/shared/topology/schema';
import { Draft } from './helpers/draft';

/**
 * Stable labels over a design's versions. The demo (Harbor Road v2) labels its cables as the
 * patterns do: HR-A-01…HR-A-10 on fabric A (4 controller + 6 host cables), HR-B-01…HR-B-10 on
 * fabric B, HR-M-01…HR-M-08 on management.
 */
const labels = (doc: Topology) => new Map(doc.cables.map((c) => [c.id, c.label]));
const cable = (doc: Topology, id: string): Cable => doc.cables.find((c) => c.id === id)!;
const byLabel = (doc: Topology, label: string): Cable => doc.cables.find((c) => c.label === label)!;

/** A new cable from wms-db-1's spare card-1 p2 (on no network yet) to fab-a's last free port. */
function withNewCable(doc: Topology, extra: Partial<Cable> = {}): Topology {
  const next = structuredClone(doc);
  next.cables.push({ id: 'cable-new', a: 'wms-db-1.card-1.p2', b: 'fab-a.p12', media: 'cat6a', lengthM: 3, ...extra });
  return next;
}

describe('stable cable labels', () => {
  it('keep every label across a version that changes one cable, even one saved without labels', () => {
    const v1 = harborRoadV2();
    const v2 = structuredClone(v1);
    cable(v2, 'cable-a-05').b = 'fab-a.p20'; // re-patched to another switch port
    cable(v2, 'cable-a-05').lengthM = 7;
    const history = labelHistory([v1]);
    expect(assignStableLabels(v2, history)).toBe(v2); // nothing to change: the very same document
    for (const c of v2.cables) delete c.label;
    expect(labels(assignStableLabels(v2, history))).toEqual(labels(v1));
  });

  it('give a new cable the next free label of its fabric', () => {
    const v1 = harborRoadV2();
    const v2 = assignStableLabels(withNewCable(v1), labelHistory([v1]));
    expect(cable(v2, 'cable-new').label).toBe('HR-A-11');
    const mgmt = structuredClone(v1);
    mgmt.cables.push({ id: 'cable-mgmt', a: 'wms-db-1.onboard.mgmt', b: 'oob-1.p12', media: 'cat6' });
    mgmt.cables = mgmt.cables.filter((c) => c.a !== 'wms-db-1.onboard.mgmt' || c.id === 'cable-mgmt');
    expect(cable(assignStableLabels(mgmt, labelHistory([v1])), 'cable-mgmt').label).toBe('HR-M-09');
  });

  it('never hand a deleted cable’s label to a different cable in a later version', () => {
    const v1 = harborRoadV2();
    const gone = byLabel(v1, 'HR-A-10');
    const v2 = structuredClone(v1);
    v2.cables = v2.cables.filter((c) => c.id !== gone.id);
    const v3 = structuredClone(v2); // a version in between, without the cable
    // v4: an unlabelled cable, and one given the old label by hand (as a stale editor number would).
    const v4 = withNewCable(v3);
    v4.cables.push({ id: 'cable-hand', label: 'HR-A-10', a: 'wms-db-2.card-1.p2', b: 'fab-a.p11', media: 'cat6a' });
    const saved = assignStableLabels(v4, labelHistory([v1, v2, v3]));
    expect(cable(saved, 'cable-new').label).toBe('HR-A-11');
    expect(cable(saved, 'cable-hand').label).toBe('HR-A-12');
    expect(saved.cables.filter((c) => c.label === 'HR-A-10')).toEqual([]);
  });

  it('let the same cable come back with its label, but not a new cable under the old id', () => {
    const v1 = harborRoadV2();
    const gone = byLabel(v1, 'HR-B-04');
    const v2 = structuredClone(v1);
    v2.cables = v2.cables.filter((c) => c.id !== gone.id);
    const back = structuredClone(v2);
    back.cables.push(structuredClone(gone)); // restored: same id, same two ports
    expect(cable(assignStableLabels(back, labelHistory([v1, v2])), gone.id).label).toBe('HR-B-04');
    const other = structuredClone(v2);
    other.cables.push({ ...structuredClone(gone), a: 'wms-db-1.card-2.p2' }); // same id, another port
    expect(cable(assignStableLabels(other, labelHistory([v1, v2])), gone.id).label).toBe('HR-B-11');
  });

  it('keep one label per cable: a duplicate gets the next free one, the cable that had it keeps it', () => {
    const v1 = harborRoadV2();
    const v2 = withNewCable(v1, { label: 'HR-A-03' });
    v2.cables.unshift(v2.cables.pop()!); // first in the document, still not the owner
    const saved = assignStableLabels(v2, labelHistory([v1]));
    expect(cable(saved, 'cable-new').label).toBe('HR-A-11');
    expect(byLabel(saved, 'HR-A-03').id).toBe(byLabel(v1, 'HR-A-03').id);
  });

  it('keep labels swapped by hand between two cables that are both still there', () => {
    const v1 = harborRoadV2();
    const v2 = structuredClone(v1);
    const [x, y] = [byLabel(v2, 'HR-A-01'), byLabel(v2, 'HR-A-02')];
    [x.label, y.label] = [y.label, x.label];
    expect(assignStableLabels(v2, labelHistory([v1]))).toBe(v2);
  });

  it('follow the canvas’s own C-numbers in a design labelled by the canvas', () => {
    const doc = new Draft().switch('sw').host('h', { c1: 3 }).link('h.c1.1', 'sw', { label: 'C007' }).link('h.c1.2', 'sw', { label: 'C012' }).link('h.c1.3', 'sw').build();
    expect(cable(assignStableLabels(doc, NO_LABEL_HISTORY), 'k3').label).toBe('C013');
  });

  it('start a scheme from the network names when a design has no labels yet', () => {
    const d = new Draft()
      .network('na', '198.51.100.0/24', { name: 'fabric A' }) // RFC 5737 §3
      .network('nm', '192.0.2.0/24', { name: 'management', purpose: 'management' }) // RFC 5737 §3
      .switch('sw')
      .switch('sw2')
      .switch('core-1')
      .switch('core-2')
      .host('h', { c1: [{ networkId: 'na' }, { networkId: 'na' }], m: [{ networkId: 'nm', role: 'management' }] })
      .link('h.c1.1', 'sw')
      .link('h.c1.2', 'sw')
      .link('h.m.1', 'sw2')
      .link('sw', 'core-1') // belongs to sw's fabric
      .link('core-1', 'core-2'); // no fabric to go by
    const saved = assignStableLabels(d.build(), NO_LABEL_HISTORY);
    expect(saved.cables.map((c) => c.label)).toEqual(['A-01', 'A-02', 'M-01', 'A-03', 'X-01']);
  });
});
