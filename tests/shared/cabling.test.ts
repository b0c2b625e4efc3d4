import { analyze } from '@/shared/analysis/analyze';
import { Draft } from './helpers/draft';

const only = (doc: ReturnType<Draft['build']>, rule: string) => analyze(doc).findings.filter((f) => f.rule === rule);

describe('cables that join two ports no data path can use', () => {
  it('warns about a cable from one host straight to another: hosts do not forward', () => {
    // h1.c1.1 == h2.c1.1
    const doc = new Draft().array('v', { a: 1, b: 1 }).host('h1', { c1: 1 }).host('h2', { c1: 1 }).link('h1.c1.1', 'h2.c1.1').build();
    expect(only(doc, 'cable-between-endpoints')).toEqual([
      {
        rule: 'cable-between-endpoints',
        severity: 'warning',
        subjects: ['k1', 'h1.c1.1', 'h2.c1.1'],
        message: 'Cable k1 joins h1 c1 1 to h2 c1 1; hosts do not forward, so it carries no storage path.',
      },
    ]);
    expect(analyze(doc).hosts).toEqual([]);
  });

  it('warns about a cable between two controllers', () => {
    // v.a.1 == v.b.1
    const doc = new Draft().array('v', { a: 1, b: 1 }).link('v.a.1', 'v.b.1').build();
    expect(only(doc, 'cable-between-endpoints')[0].message).toContain('controllers do not forward');
  });

  it('reports a data port cabled straight to a management port', () => {
    // h1.c1.1 (data) == v.a.2 (management)
    const doc = new Draft()
      .array('v', { a: [{}, { role: 'management', speedGbps: 1 }], b: 1 })
      .host('h1', { c1: 1 })
      .link('h1.c1.1', 'v.a.2')
      .build();
    expect(only(doc, 'port-role-mismatch').map((f) => [f.severity, f.subjects])).toEqual([['error', ['k1', 'h1.c1.1', 'v.a.2']]]);
    expect(analyze(doc).hosts).toEqual([]);
  });

  it('says nothing about direct attach, host data port to controller data port', () => {
    const doc = new Draft().array('v', { a: 1, b: 1 }).host('h1', { c1: 1, c2: 1 }).link('h1.c1.1', 'v.a.1').link('h1.c2.1', 'v.b.1').build();
    expect([...only(doc, 'cable-between-endpoints'), ...only(doc, 'port-role-mismatch')]).toEqual([]);
  });
});

describe('cable messages name the media as the trade does', () => {
  it('writes Category 6 and the reach with its source', () => {
    const d = new Draft().array('v', { a: 1 }).switch('fa').link('v.a.1', 'fa').media('k1', 'cat6', 60);
    const [finding] = only(d.build(), 'cable-too-long');
    // IEEE 802.3an: 10GBASE-T reaches 55 m on Category 6
    expect(finding.message).toBe(
      'Cable k1 is 60 m of Category 6, longer than the 55 m it reaches at 10 Gb/s (IEEE 802.3an clause 55; TIA TSB-155; unshielded, and alien crosstalk may cut it).',
    );
  });
});
