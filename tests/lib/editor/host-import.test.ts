import { createEditorStore } from '@/lib/editor/store';
import { IMPORT_COLUMNS, previewHostImport, SAMPLE_CSV } from '@/lib/editor/host-import';
import { expectValid, smallDesign } from '@/tests/lib/editor/helpers/editor';

/** Host inventory import: preview with an error per bad cell, then every host in one undo step. */
const HEADER = IMPORT_COLUMNS.join(',');

describe('previewing an inventory file', () => {
  it('reads the sample file without errors', () => {
    const preview = previewHostImport(SAMPLE_CSV);
    expect(preview.errors).toEqual([]);
    expect(preview.hosts.map((h) => h.name)).toEqual(['wms-db-3', 'wms-app-3', 'cam-rec-3']);
    expect(preview.hosts[0]).toMatchObject({ cards: 2, portsPerCard: 2, speedGbps: 25, connector: 'sfp', rack: 'A01', ru: 20 });
  });

  it('reports each bad row by its number (header is row 1) and column, and keeps the good ones', () => {
    const csv = [
      HEADER,
      'ok-1,iqn.2026-11.example.tidewater:ok-1,2,2,10,sfp,A01,10',
      // RFC 3720 §3.2.6.3.1: an iqn name needs a date (yyyy-mm) after "iqn.".
      'bad-iqn,iqn.example:no-date,2,2,10,sfp,,',
      'bad-cards,,zero,2,10,sfp,,',
      'bad-speed,,2,2,7,sfp,,',
      'bad-connector,,2,2,10,lc,,',
      'ok-1,,1,1,10,rj45,,',
      'no-rack,,1,1,10,rj45,,12',
      ',,1,1,10,rj45,,',
    ].join('\n');
    const preview = previewHostImport(csv);
    expect(preview.hosts.map((h) => h.name)).toEqual(['ok-1']);
    expect(preview.errors.map((e) => [e.row, e.column])).toEqual([
      [3, 'initiator name'],
      [4, 'cards'],
      [5, 'speed'],
      [6, 'connector'],
      [7, 'name'],
      [8, 'rack'],
      [9, 'name'],
    ]);
    expect(preview.errors[4].message).toContain('row 2');
  });

  it('names a missing column on the header row', () => {
    const preview = previewHostImport('name,cards\nh1,2\n');
    expect(preview.hosts).toEqual([]);
    expect(preview.errors.map((e) => e.column)).toEqual(['initiator name', 'ports per card', 'speed', 'connector']);
    expect(preview.errors.every((e) => e.row === 1)).toBe(true);
  });
});

describe('confirming an import', () => {
  it('adds nothing on preview, then every host in one undo step', () => {
    const store = createEditorStore();
    store.getState().load(smallDesign(), { designId: 7, baseVersion: 2 });
    const before = store.getState().doc;
    const preview = previewHostImport(SAMPLE_CSV);
    expect(store.getState().doc).toBe(before);
    const result = store.getState().run('importHosts', { hosts: preview.hosts });
    expect(result.ok).toBe(true);
    const doc = expectValid(store.getState().doc);
    expect(doc.devices.length).toBe(before.devices.length + 3);
    const db = doc.devices.find((d) => d.name === 'wms-db-3')!;
    expect(db.kind === 'host' && db.adapters.flatMap((a) => a.ports).filter((p) => p.role === 'data').length).toBe(4);
    expect(db.kind === 'host' && db.iqn).toBe('iqn.2026-11.example.tidewater:wms-db-3');
    expect(doc.racks?.find((r) => r.id === db.placement?.rackId)?.name).toBe('A01');
    expect(db.placement?.ru).toBe(20);
    expect(store.temporal.getState().pastStates.length).toBe(1);
    store.getState().undo();
    expect(store.getState().doc.devices.length).toBe(before.devices.length);
  });
});
