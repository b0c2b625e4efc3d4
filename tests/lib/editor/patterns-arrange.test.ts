import { computeArrangement } from '@/lib/editor/arrange';
import { buildSnapshot, overlappingDevices } from '@/lib/editor/geometry';
import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import type { Topology } from '@/shared/topology/schema';
import { allPorts, apply, blank, device, smallDesign } from '@/tests/lib/editor/helpers/editor';

function bandOf(doc: Topology, id: string): number {
  return doc.layout![id].y;
}

describe('applying a pattern', () => {
  it.each(['direct-attach', 'dual-fabric', 'dual-fabric-management'] as const)('replaces the drawing with %s: valid, arranged, no overlapping boxes', (pattern) => {
    const doc = apply(smallDesign(), 'applyPattern', { pattern, mode: 'replace', options: { hosts: 4 } });
    expect(doc.name).toBe('test design');
    expect(doc.devices.some((d) => d.id === 'switch-1')).toBe(false);
    expect(Object.keys(doc.layout!).sort()).toEqual(doc.devices.map((d) => d.id).sort());
    expect(overlappingDevices(buildSnapshot(doc))).toEqual([]);
  });

  it('keeps the pattern redundant: every host reaches both controllers after replace', () => {
    const doc = apply(blank(), 'applyPattern', { pattern: 'dual-fabric-management', mode: 'replace', options: { hosts: 3 } });
    const report = analyze(doc);
    expect(report.hosts.map((h) => [h.host, h.redundant, h.controllersReached.length])).toEqual([
      ['host-1', true, 2],
      ['host-2', true, 2],
      ['host-3', true, 2],
    ]);
  });

  it('merges beside the drawing: clashing names renumbered, equal blocks joined, addresses not reused', () => {
    let doc = apply(smallDesign(), 'addNetwork', { name: 'fabric A', purpose: 'data', cidr: '198.51.100.0/24' }); // RFC 5737
    doc = apply(doc, 'setPort', { id: 'host-1-card-1-p1', networkId: 'net-fabric-a', address: { mode: 'static', ip: '198.51.100.1' } });
    doc = apply(doc, 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-1-p1' });
    const merged = apply(doc, 'applyPattern', { pattern: 'dual-fabric', mode: 'merge', options: { hosts: 2 } });

    // host-1, host-2 and array-1 exist, so the pattern's become host-3, host-4 and array-2.
    expect(merged.devices.map((d) => d.name)).toEqual(['array-1', 'switch-1', 'switch-2', 'host-1', 'host-2', 'array-2', 'fab-a', 'fab-b', 'host-3', 'host-4']);
    // The pattern's fabric A has the same block as ours, so it joins it; fabric B is new.
    expect(merged.networks.map((n) => `${n.id} ${n.cidr}`)).toEqual(['net-fabric-a 198.51.100.0/24', 'net-fabric-b 203.0.113.0/24']);
    const ips = allPorts(merged).flatMap((p) => (p.port.address?.mode === 'static' ? [p.port.address.ip] : []));
    expect(new Set(ips).size).toBe(ips.length);
    expect(ips.filter((ip) => ip === '198.51.100.1')).toHaveLength(1);
    // The existing drawing did not move; the new part sits under it.
    expect(merged.layout!['host-1']).toEqual(doc.layout!['host-1']);
    const bottom = Math.max(...doc.devices.map((d) => buildSnapshot(doc).devices.get(d.id)!.rect.y + buildSnapshot(doc).devices.get(d.id)!.rect.height));
    expect(Math.min(...['array-2', 'fab-a', 'host-3'].map((id) => merged.layout![id].y))).toBeGreaterThan(bottom);
    expect(overlappingDevices(buildSnapshot(merged))).toEqual([]);
    // Cable labels stay unique.
    const labels = merged.cables.map((c) => c.label);
    expect(new Set(labels).size).toBe(labels.length);
  });

  it('merges the same pattern twice without a single clashing id (numbered names take the next number)', () => {
    let doc = apply(blank(), 'applyPattern', { pattern: 'dual-fabric-management', mode: 'merge', options: { hosts: 2 } });
    doc = apply(doc, 'applyPattern', { pattern: 'dual-fabric-management', mode: 'merge', options: { hosts: 2 } });
    expect(doc.devices.filter((d) => d.kind === 'switch').map((d) => d.name)).toEqual(['fab-a', 'fab-b', 'oob-1', 'fab-a-2', 'fab-b-2', 'oob-2']);
    expect(device(doc, 'host-4').kind).toBe('host');
  });
});

describe('auto-arrange', () => {
  it('puts hosts, switches and arrays in bands from top to bottom, management switch at the right', () => {
    const doc = apply(harborRoadV2(), 'autoArrange', {});
    const hostY = bandOf(doc, 'wms-db-1');
    const switchY = bandOf(doc, 'fab-a');
    expect(doc.devices.filter((d) => d.kind === 'host').every((d) => bandOf(doc, d.id) === hostY)).toBe(true);
    expect([bandOf(doc, 'fab-b'), bandOf(doc, 'oob-1')]).toEqual([switchY, switchY]);
    expect(hostY).toBeLessThan(switchY);
    expect(switchY).toBeLessThan(bandOf(doc, 'vault-1'));
    expect(doc.layout!['oob-1'].x).toBeGreaterThan(Math.max(doc.layout!['fab-a'].x, doc.layout!['fab-b'].x));
  });

  it('changes only positions, on the grid, with no two boxes overlapping', () => {
    // Every device stacked on one spot, as a hand-edited file might have them.
    const before = { ...harborRoadV2(), layout: Object.fromEntries(harborRoadV2().devices.map((d) => [d.id, { x: 100, y: 100 }])) };
    const doc = apply(before, 'autoArrange', {});
    expect({ ...doc, layout: undefined }).toEqual({ ...before, layout: undefined });
    for (const p of Object.values(doc.layout!)) expect([p.x % 20, p.y % 20]).toEqual([0, 0]);
    expect(overlappingDevices(buildSnapshot(before)).length).toBeGreaterThan(0);
    expect(overlappingDevices(buildSnapshot(doc))).toEqual([]);
  });

  it('is deterministic and handles an empty design and devices without cables', () => {
    const doc = smallDesign();
    expect(computeArrangement(doc)).toEqual(computeArrangement(doc));
    expect(computeArrangement(blank())).toEqual({});
    expect(overlappingDevices(buildSnapshot(apply(doc, 'autoArrange', {})))).toEqual([]);
  });

  it('orders a band to follow the cabling, so a host sits over the switch it uses', () => {
    // host-1 == switch-2 only, host-2 == switch-1 only: the hosts' order should follow the switches'.
    let doc = apply(smallDesign(), 'cablePorts', { a: 'host-1-card-1-p1', b: 'switch-2-p1' });
    doc = apply(doc, 'cablePorts', { a: 'host-2-card-1-p1', b: 'switch-1-p1' });
    const arranged = apply(doc, 'autoArrange', {});
    const hostsLeftToRight = ['host-1', 'host-2'].sort((a, b) => arranged.layout![a].x - arranged.layout![b].x);
    const switchesLeftToRight = ['switch-2', 'switch-1'].sort((a, b) => arranged.layout![a].x - arranged.layout![b].x);
    expect(hostsLeftToRight.indexOf('host-1')).toBe(switchesLeftToRight.indexOf('switch-2'));
  });
});

describe('a pattern in a room', () => {
  it('keeps the racks, feeds and site distances when it replaces the drawing', () => {
    let doc = apply(smallDesign(), 'setDevice', { id: 'switch-1', rack: 'A01', ru: 40 });
    doc = { ...doc, site: { rackPitchMm: 800 }, powerFeeds: [{ id: 'feed-a', name: 'Feed A' }] };
    const replaced = apply(doc, 'applyPattern', { pattern: 'dual-fabric', mode: 'replace', options: { hosts: 2 } });
    expect(replaced.racks).toEqual(doc.racks);
    expect(replaced.site).toEqual({ rackPitchMm: 800 });
    expect(replaced.powerFeeds).toEqual([{ id: 'feed-a', name: 'Feed A' }]);
    expect(replaced.devices.some((d) => d.placement)).toBe(false);
  });
});
