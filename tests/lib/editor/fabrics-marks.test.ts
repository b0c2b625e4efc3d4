import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { runCommand } from '@/lib/editor/commands';
import { computeFabrics, networkTags, tagFromName } from '@/lib/editor/fabrics';
import { computeMarks, NO_MARKS } from '@/lib/editor/marks';
import { splitIds } from '@/shared/keys/tuple';
import { smallDesign } from '@/tests/lib/editor/helpers/editor';

describe('fabric tags', () => {
  it('takes a trailing letter or number from a name, else its first letter', () => {
    expect([tagFromName('fabric A'), tagFromName('fab-b'), tagFromName('management'), tagFromName('storage 12'), tagFromName('')]).toEqual(['A', 'B', 'M', '12', '?']);
  });

  it('numbers a tag two networks would share', () => {
    const tags = networkTags([
      { id: 'n1', name: 'storage', purpose: 'data', cidr: '198.51.100.0/24' },
      { id: 'n2', name: 'switching', purpose: 'data', cidr: '203.0.113.0/24' },
    ]);
    expect([tags.get('n1')!.tag, tags.get('n2')!.tag]).toEqual(['S', 'S2']);
  });

  it('tags Harbor Road cables by the network of their host or controller end, and switches by their endpoints', () => {
    const doc = harborRoadV2();
    const fabrics = computeFabrics(doc);
    const tagOf = (id: string) => fabrics.bySwitch.get(id)?.tag;
    expect([tagOf('fab-a'), tagOf('fab-b'), tagOf('oob-1')]).toEqual(['A', 'B', 'M']);
    const toFabB = doc.cables.filter((c) => c.b.startsWith('fab-b') || c.a.startsWith('fab-b'));
    expect(toFabB.length).toBeGreaterThan(0);
    expect(new Set(toFabB.map((c) => fabrics.byCable.get(c.id)?.tag))).toEqual(new Set(['B']));
  });

  it('falls back to the switch name in a design without networks, and gives an unchanged cable the same tag object', () => {
    let doc = runCommand(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-2-p1' });
    const first = computeFabrics(doc);
    expect(first.byCable.get('cable-1')!.tag).toBe('2');
    doc = runCommand(doc, 'renameDevice', { id: 'host-1', name: 'wms-db-1' });
    expect(computeFabrics(doc).byCable.get('cable-1')).toBe(first.byCable.get('cable-1'));
  });
});

describe('canvas marks from the report', () => {
  it('marks version 1’s single points of failure for cam-rec-2 and its badge as not redundant', () => {
    const doc = harborRoadV1();
    const marks = computeMarks(doc, analyze(doc));
    // The seed's review names these three for cam-rec-2: fab-a, its card-1 and its one fab-a cable.
    expect(marks.devices.get('fab-a')!.spof).toBe(true);
    expect(splitIds(marks.devices.get('cam-rec-2')!.spofGroups)).toEqual(['cam-rec-2.card-1']);
    expect(marks.spofCables.size).toBe(1);
    expect(marks.devices.get('cam-rec-2')!.badge).toMatchObject({ redundant: false, sessions: 4 });
    expect(marks.devices.get('cam-rec-1')!.badge).toMatchObject({ redundant: true, sessions: 8, text: '8 sessions' });
  });

  it('clears every mark in version 2 and keeps equal marks identical across reports', () => {
    const doc = harborRoadV2();
    const first = computeMarks(doc, analyze(doc));
    expect(first.spofUnits.size).toBe(0);
    expect(first.devices.get('fab-a')).toBe(NO_MARKS);
    const renamed = runCommand(doc, 'renameDevice', { id: 'vault-1', name: 'vault-one' });
    const second = computeMarks(renamed, analyze(renamed), first);
    expect(second.devices.get('wms-db-1')).toBe(first.devices.get('wms-db-1'));
  });

  it('gives a host with data ports and no path a "no sessions" badge', () => {
    const doc = smallDesign();
    const marks = computeMarks(doc, analyze(doc));
    expect(marks.devices.get('host-1')!.badge).toMatchObject({ sessions: 0, redundant: false, text: 'no sessions' });
    expect(marks.findingsBySubject.get('host-1')!.map((f) => f.rule)).toContain('host-unreachable');
  });
});
