import { DOCUMENT_LIMITS, sizeIssues } from '@/shared/topology/size-limits';
import { validateTopology } from '@/shared/topology/validate';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { syntheticDesign } from '../bench/helpers/synthetic';

const port = (id: string) => ({ id, name: id, role: 'data', speedGbps: 10, connector: 'rj45' });

describe('document size limits', () => {
  it('sit well above the largest design we measure', () => {
    const doc = syntheticDesign(20000);
    let ports = 0;
    for (const d of doc.devices) ports += d.kind === 'switch' ? d.ports.length : (d.kind === 'array' ? d.controllers : d.adapters).reduce((n, g) => n + g.ports.length, 0);
    expect(doc.devices.length * 2).toBeLessThanOrEqual(DOCUMENT_LIMITS.devices);
    expect(ports * 2).toBeLessThanOrEqual(DOCUMENT_LIMITS.ports);
    expect(doc.cables.length * 2).toBeLessThanOrEqual(DOCUMENT_LIMITS.cables);
    expect(sizeIssues(doc)).toEqual([]);
  });

  it('turns away too many devices before reading any of them, with the path of the list', () => {
    // The entries are not even devices: the count alone decides, so nothing else is parsed.
    const doc = { ...harborRoadV2(), devices: Array.from({ length: DOCUMENT_LIMITS.devices + 1 }, () => 42) };
    const result = validateTopology(doc);
    expect(result).toEqual({ ok: false, issues: [{ path: 'devices', message: 'A document may hold at most 50,000 devices; this one has 50,001. Split the design into several documents.' }] });
  });

  it('counts ports across switches, controllers and cards', () => {
    const perSwitch = 50_000;
    const switches = Array.from({ length: 8 }, (_, s) => ({ id: `s${s}`, kind: 'switch', name: `s${s}`, role: 'data', ports: Array.from({ length: perSwitch }, (_, p) => port(`s${s}p${p}`)) }));
    const host = { id: 'h', kind: 'host', name: 'h', adapters: [{ id: 'h.c', name: 'c', ports: [port('h.c.p')] }] };
    const issues = sizeIssues({ devices: [...switches, host], cables: [], networks: [] });
    expect(issues).toEqual([{ path: 'devices', message: 'A document may hold at most 400,000 ports; this one has more than 400,000. Split the design into several documents.' }]);
    expect(sizeIssues({ devices: switches.slice(0, 7), cables: [], networks: [] })).toEqual([]);
  });

  it('limits cables, networks and layout entries too, and reports each list that is over', () => {
    const issues = sizeIssues({
      devices: [],
      cables: new Array(DOCUMENT_LIMITS.cables + 5).fill(0),
      networks: new Array(DOCUMENT_LIMITS.networks + 1).fill(0),
      layout: Object.fromEntries(Array.from({ length: DOCUMENT_LIMITS.layout + 1 }, (_, i) => [`d${i}`, { x: 0, y: 0 }])),
    });
    expect(issues.map((i) => i.path)).toEqual(['cables', 'networks', 'layout']);
    expect(issues[0].message).toBe('A document may hold at most 200,000 cables; this one has 200,005. Split the design into several documents.');
  });

  it('ignores what is not a list (the schema words those mistakes) and never throws', () => {
    for (const input of [null, 7, 'text', [], { devices: 'many' }, { devices: [null, 1, { ports: 'x' }, { controllers: [null] }] }]) {
      expect(sizeIssues(input)).toEqual([]);
    }
  });
});
