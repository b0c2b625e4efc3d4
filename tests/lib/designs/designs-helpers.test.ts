import { cableRows, deviceViews, networkRows } from '@/lib/designs/document-view';
import { changeText, countsText, diffHeadline } from '@/lib/designs/diff-words';
import { positiveInt } from '@/lib/designs/links';
import { hostsLine, summaryPhrases, summaryText } from '@/lib/designs/summary';
import { jsonFileText, versionFileName } from '@/lib/designs/files';
import { readTopologyText } from '@/lib/designs/read-document';
import { diffTopologies } from '@/shared/diff';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';

describe('summary phrases', () => {
  it('says how many hosts are redundant, then errors, single points and warnings', () => {
    const summary = { errors: 2, warnings: 1, singlePointsOfFailure: 3, hosts: 6, redundantHosts: 5 };
    expect(summaryPhrases(summary)).toEqual(['5 of 6 hosts redundant', '2 errors', '3 single points of failure', '1 warning']);
    expect(summaryText({ errors: 0, warnings: 0, singlePointsOfFailure: 0, hosts: 1, redundantHosts: 1 })).toBe('1 of 1 host redundant · no errors');
    expect(summaryPhrases({ errors: 1, warnings: 0, singlePointsOfFailure: 1, hosts: 2, redundantHosts: 1 })).toEqual(['1 of 2 hosts redundant', '1 error', '1 single point of failure']);
    expect(hostsLine({ errors: 0, warnings: 0, singlePointsOfFailure: 0, hosts: 0, redundantHosts: 0 })).toBe('No storage hosts yet');
  });
});

describe('files', () => {
  it('names a download after the design and version in plain lower-case letters', () => {
    expect(versionFileName('Harbor Road storage', 2)).toBe('harbor-road-storage-v2.json');
    expect(versionFileName('  Kühlhaus Nord / Rack 3 ', 11)).toBe('kuhlhaus-nord-rack-3-v11.json');
    expect(versionFileName('***', 1)).toBe('design-v1.json');
  });

  it('writes the document indented, and reading it back gives the same document', () => {
    const doc = harborRoadV2();
    const text = jsonFileText(doc);
    expect(text.split('\n')[1]).toMatch(/^ {2}"format"/);
    const read = readTopologyText('harbor.json', text);
    expect(read.ok && read.doc).toEqual(doc);
  });

  it('gives a file that is JSON but not a document every problem with its path', () => {
    const read = readTopologyText('x.json', JSON.stringify({ format: 'cablewright.topology/1', name: 'x', devices: [{ id: 'h', kind: 'host', name: 'h', adapters: 'none' }], cables: [], networks: [] }));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.issues.map((i) => i.path)).toContain('devices.0.adapters');
  });
});

describe('route parameters', () => {
  it('accepts only positive whole numbers', () => {
    expect(positiveInt('12')).toBe(12);
    for (const bad of ['0', '-1', '2.5', 'abc', '', '01', undefined, ['1', '2']]) expect(positiveInt(bad as string)).toBeNull();
  });
});

describe('read-only document rows', () => {
  const doc = harborRoadV2();

  it('shows each port with its network, address and the far end of its cable', () => {
    const vault = deviceViews(doc).find((d) => d.id === 'vault-1')!;
    expect(vault.kind).toBe('Storage array');
    const p1 = vault.groups[0].ports[0];
    const cable = doc.cables.find((c) => c.a === 'vault-1.ctl-a.p1' || c.b === 'vault-1.ctl-a.p1')!;
    expect(p1).toMatchObject({ name: 'p1', role: 'data', network: 'fabric A', cabledTo: `fab-a p1 (${cable.label})` });
    // docs/demo.md: fabric A is 198.51.100.0/24 (RFC 5737).
    expect(p1.address).toMatch(/^198\.51\.100\.\d+$/);
  });

  it('lists cables with both ends, media in words and length, and networks with VLAN and MTU', () => {
    const rows = cableRows(doc);
    expect(rows).toHaveLength(doc.cables.length);
    expect(rows[0].media).toBe('Cat 6A copper');
    expect(rows[0].length).toBe(`${doc.cables[0].lengthM} m`);
    // docs/demo.md: fabric A VLAN 110 MTU 9000; management VLAN 10 MTU 1500.
    expect(networkRows(doc).map((n) => [n.name, n.vlan, n.mtu])).toEqual([
      ['fabric A', '110', '9000'],
      ['fabric B', '120', '9000'],
      ['management', '10', '1500'],
    ]);
  });
});

describe('diff words', () => {
  it('says a diff in sentences: a changed field before and after, counts per section', () => {
    const diff = diffTopologies(harborRoadV1(), harborRoadV2());
    expect(diffHeadline(diff)).toBe(`${diff.counts.total} differences.`);
    expect(changeText({ field: 'speedGbps', before: 10, after: 25 }, 'changed')).toBe('speed (Gb/s): 10 → 25');
    expect(changeText({ field: 'lengthM', before: null, after: 7 }, 'added')).toBe('length (m): 7');
    expect(changeText({ field: 'vlan', before: 110, after: null }, 'removed')).toBe('VLAN: was 110');
    expect(countsText({ added: 1, removed: 0, changed: 2 })).toBe('1 added, 2 changed');
    expect(diffHeadline(diffTopologies(harborRoadV2(), harborRoadV2()))).toBe('No differences in the design.');
  });
});
