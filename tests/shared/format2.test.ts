import { analyze } from '@/shared/analysis/analyze';
import { TOPOLOGY_FORMAT, type Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import { jsonFileText } from '@/lib/designs/files';
import { readTopologyText } from '@/lib/designs/read-document';
import { Draft } from './helpers/draft';

/**
 * Format 2 (docs/topology-format.md): site, racks, power feeds, placements, PSUs and target names, every
 * one optional; references to racks and feeds resolve like any other; ids unique across all of it.
 *
 *   rack rk-1 (A, 1): fa U40 ; v U20–21 ; h1 U10     v ==v.a/v.b== fa == h1 (two cards)
 *   feeds fd-a, fd-b: fa on both, v on both, h1 on fd-a only
 */
function roomy(): Topology {
  const doc = new Draft()
    .network('na', '198.51.100.0/24') // RFC 5737 §3 documentation range
    .array('v', { a: 1, b: 1 })
    .switch('fa')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'fa')
    .link('v.b.1', 'fa')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fa')
    .rack('rk-1', { name: 'A01', row: 'A', position: 1, heightU: 42 })
    .place('fa', 'rk-1', 40, 1)
    .place('v', 'rk-1', 20, 2)
    .place('h1', 'rk-1', 10)
    .build();
  doc.site = { rackPitchMm: 600, rowPitchMm: 1200, slackM: 0.5 };
  doc.powerFeeds = [{ id: 'fd-a', name: 'Feed A' }, { id: 'fd-b', name: 'Feed B' }];
  const [array, sw, host] = doc.devices;
  array.psus = [{ id: 'v.psu1', name: 'PSU 1', feedId: 'fd-a' }, { id: 'v.psu2', name: 'PSU 2', feedId: 'fd-b' }];
  sw.psus = [{ id: 'fa.psu1', name: 'PSU 1', feedId: 'fd-a' }, { id: 'fa.psu2', name: 'PSU 2', feedId: 'fd-b' }];
  host.psus = [{ id: 'h1.psu1', name: 'PSU 1', feedId: 'fd-a' }, { id: 'h1.psu2', name: 'PSU 2' }];
  if (array.kind === 'array') {
    array.iqn = 'iqn.2001-04.com.example:storage:diskarrays-sn-a8675309'; // RFC 7143 §4.2.7.4 example
    array.controllers[0].iqn = 'iqn.2001-04.com.example:storage.tape1.sys1.xyz'; // RFC 7143 §4.2.7.4 example
  }
  return doc;
}

function issuesOf(input: unknown) {
  const result = validateTopology(input);
  if (result.ok) throw new Error('expected the document to be rejected');
  return result.issues;
}

describe('format 2 documents', () => {
  it('accepts site, racks, feeds, placements, PSUs and target names, and returns the document unchanged', () => {
    const doc = roomy();
    const result = validateTopology(doc);
    expect(result).toEqual({ ok: true, doc, from: 2 });
    expect(doc.format).toBe(TOPOLOGY_FORMAT);
  });

  it('accepts a document with none of the additions (each is optional)', () => {
    const doc = new Draft().array('v', { a: 1 }).build();
    expect(validateTopology(doc).ok).toBe(true);
  });

  it('rejects a placement naming no rack, or naming something that is not a rack', () => {
    const doc = roomy();
    doc.devices[0].placement = { rackId: 'rk-9', ru: 20 };
    doc.devices[1].placement = { rackId: 'fd-a', ru: 40 };
    expect(issuesOf(doc)).toEqual([
      { path: 'devices.0.placement.rackId', message: 'No rack has the id "rk-9".' },
      { path: 'devices.1.placement.rackId', message: '"fd-a" is a power feed, not a rack.' },
    ]);
  });

  it('rejects a PSU on a feed that does not exist', () => {
    const doc = roomy();
    doc.devices[2].psus![1].feedId = 'fd-c';
    expect(issuesOf(doc)).toEqual([{ path: 'devices.2.psus.1.feedId', message: 'No power feed has the id "fd-c".' }]);
  });

  it('keeps ids unique across racks, feeds and PSUs as well', () => {
    const doc = roomy();
    doc.powerFeeds![1].id = 'rk-1';
    doc.devices[2].psus![0].id = 'h1.c1'; // a card's id
    const issues = issuesOf(doc);
    // fd-b is gone, so the second PSUs of v and fa now name no feed at all.
    expect(issues.map((i) => i.path)).toEqual(['powerFeeds.1.id', 'devices.2.adapters.0.id', 'devices.0.psus.1.feedId', 'devices.1.psus.1.feedId']);
    expect(issues[0].message).toContain('already used by the rack at racks.0');
    expect(issues[1].message).toContain('already used by the PSU at devices.2.psus.0');
  });

  it('rejects unreadable values with field paths: a unit below 1, a negative slack, a fractional height', () => {
    const doc = roomy() as unknown as Record<string, any>;
    doc.devices[0].placement.ru = 0;
    doc.site.slackM = -1;
    doc.racks[0].heightU = 42.5;
    const issues = issuesOf(doc);
    expect(issues.map((i) => i.path).sort()).toEqual(['devices.0.placement.ru', 'racks.0.heightU', 'site.slackM']);
    expect(issues.find((i) => i.path === 'devices.0.placement.ru')!.message).toBe('The rack unit must be at least 1.');
  });

  it('points a format 1 rack field in a format 2 document at placement', () => {
    const doc = roomy() as unknown as Record<string, any>;
    doc.devices[2].rack = 'A01';
    expect(issuesOf(doc)).toEqual([{ path: 'devices.2.rack', message: expect.stringContaining('"placement": {"rackId", "ru"}') }]);
  });

  it('names the formats it reads when the format is unknown', () => {
    const doc = { ...roomy(), format: 'cablewright.topology/3' };
    expect(issuesOf(doc)).toEqual([
      { path: 'format', message: 'The format must be one of "cablewright.topology/1" or "cablewright.topology/2".' },
    ]);
  });

  it('round-trips through the export file and import unchanged', () => {
    // As stored: the server keeps what the gate returns (fields in the format's order).
    const stored = validateTopology(roomy());
    if (!stored.ok) throw new Error('roomy() is a valid document');
    const doc = stored.doc;
    const read = readTopologyText('roomy-v1.json', jsonFileText(doc));
    expect(read).toEqual({ ok: true, fileName: 'roomy-v1.json', doc });
    expect(jsonFileText(read.ok && read.doc)).toBe(jsonFileText(doc));
  });
});
