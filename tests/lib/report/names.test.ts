import { createNamer, cutOffPhrases } from '@/lib/report/names';
import { failureUnits, searchHint, searchUnits } from '@/lib/report/units';
import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1 } from '@/shared/fixtures/harbor-road';
import { directAttach } from '@/shared/patterns';

// Harbor Road v1: cam-rec-2 ==card-1== HR-A-10 == fab-a == vault-1 (its fab-b cable was never run).
const doc = harborRoadV1();
const namer = createNamer(doc);

describe('failure unit names', () => {
  it('names a cable by its label and both ends as an installer reads them', () => {
    const cable = doc.cables.find((c) => c.a === 'cam-rec-2.card-1.p1' || c.b === 'cam-rec-2.card-1.p1')!;
    const switchPort = cable.a === 'cam-rec-2.card-1.p1' ? cable.b : cable.a;
    const portName = switchPort.split('.').pop();
    expect(namer.unit(cable.id)).toBe(`cable ${cable.label} (cam-rec-2 card-1 p1 → fab-a ${portName})`);
  });

  it('names a card by its host, a switch and a controller by their kind', () => {
    expect(namer.unit('cam-rec-2.card-1')).toBe('card-1 of cam-rec-2');
    expect(namer.unit('fab-a')).toBe('switch fab-a');
    expect(namer.unit('vault-1.ctl-b')).toBe('controller ctl-b of vault-1');
    expect(namer.kindOf('vault-1.ctl-b')).toBe('controller');
    expect(namer.kindOf('cam-rec-2')).toBeNull();
  });

  it('names every other subject of a finding and falls back to the id for unknown ones', () => {
    expect(namer.name('vault-1.ctl-b.mgmt')).toBe('vault-1 ctl-b mgmt');
    expect(namer.name('net-fabric-a')).toBe('network fabric A');
    expect(namer.name('cam-rec-2')).toBe('cam-rec-2');
    expect(namer.name('no-such-thing')).toBe('no-such-thing');
    expect(namer.unit('no-such-thing')).toBe('no-such-thing');
  });

  it('falls back to the id for a cable without a label', () => {
    const unlabelled = directAttach({ hosts: 1, labelPrefix: '' });
    for (const cable of unlabelled.cables) delete cable.label;
    const n = createNamer(unlabelled);
    expect(n.unit(unlabelled.cables[0].id)).toMatch(new RegExp(`^cable ${unlabelled.cables[0].id} \\(`));
  });

  it('says whom each single failure cuts off, from the report', () => {
    const report = analyze(doc);
    const fabA = report.failures.find((f) => f.unit === 'fab-a')!;
    expect(cutOffPhrases(namer, fabA)).toEqual(fabA.cutsOff.map((p) => `${p.host} from ${p.array}`));
  });
});

describe('what-if unit search', () => {
  const units = failureUnits(doc);

  it('lists every cable, data card, switch and controller once, switches first', () => {
    const ids = units.map((u) => u.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(units[0].kind).toBe('switch');
    expect(units.filter((u) => u.kind === 'cable')).toHaveLength(doc.cables.length);
    expect(units.filter((u) => u.kind === 'switch').map((u) => u.id)).toEqual(['fab-a', 'fab-b', 'oob-1']);
    expect(units.filter((u) => u.kind === 'controller').map((u) => u.id)).toEqual(['vault-1.ctl-a', 'vault-1.ctl-b']);
    // An onboard group with only a management port is on no data path.
    expect(ids).not.toContain('cam-rec-2.onboard');
  });

  it('matches every word of the query against names, labels and owners', () => {
    const found = searchUnits(units, 'cam-rec-2 card-1').map((u) => u.id);
    expect(found).toContain('cam-rec-2.card-1');
    expect(found).toContain('cable-a-10');
    expect(found).not.toContain('cam-rec-2.card-2');
    expect(searchUnits(units, 'HR-A-10').map((u) => u.id)).toEqual(['cable-a-10']);
  });

  it('finds nothing for an empty query and caps a broad one', () => {
    expect(searchUnits(units, '   ')).toEqual([]);
    expect(searchUnits(units, 'cable', 5)).toHaveLength(5);
  });
});

describe('the what-if search hint', () => {
  it('gives examples from the open design, each of which finds a unit to fail', () => {
    for (const design of [doc, directAttach({ hosts: 3 })]) {
      const hint = searchHint(design);
      const examples = hint.replace(/^A name, label or host, such as /, '').split(', ');
      expect(examples).toHaveLength(design.devices.some((d) => d.kind === 'switch') ? 3 : 2);
      const units = failureUnits(design);
      for (const example of examples) expect(searchUnits(units, example).length).toBeGreaterThan(0);
    }
    expect(searchHint(directAttach({ hosts: 3 }))).not.toMatch(/fab-a|HR-/);
  });
});
