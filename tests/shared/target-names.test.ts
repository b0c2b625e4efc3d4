import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { directAttach, dualFabric, dualFabricWithManagement } from '@/shared/patterns';
import { checkIscsiName } from '@/shared/rules/iqn';
import type { ArrayDevice, Topology } from '@/shared/topology/schema';

/** Target names (format 2: `iqn` on arrays, optionally per controller), judged like initiator names. */
const arrayOf = (doc: Topology) => doc.devices.find((d): d is ArrayDevice => d.kind === 'array')!;
const naming = (doc: Topology) => analyze(doc).findings.filter((f) => f.rule.startsWith('iqn-'));

/** Harbor Road v2 with a second array, vault-2, a copy of vault-1 under new ids. */
function withSecondArray(iqn: string | undefined): Topology {
  const doc = harborRoadV2();
  const copy = structuredClone(arrayOf(doc));
  copy.id = 'vault-2';
  copy.name = 'vault-2';
  delete copy.placement;
  if (iqn === undefined) delete copy.iqn;
  else copy.iqn = iqn;
  copy.controllers = copy.controllers.map((c) => ({ ...c, id: `vault-2.${c.name}`, ports: c.ports.map((p) => ({ ...p, id: `vault-2.${c.name}.${p.name}`, address: undefined })) }));
  doc.devices.push(copy);
  return doc;
}

describe('target names', () => {
  it('accepts the demo’s target name and reports nothing about names', () => {
    const doc = harborRoadV2();
    expect(checkIscsiName(arrayOf(doc).iqn!).ok).toBe(true); // RFC 7143 §4.2.7.4 iqn form
    expect(naming(doc)).toEqual([]);
  });

  it('reports an invalid target name on the array and on a controller, naming the holder', () => {
    const doc = harborRoadV2();
    const array = arrayOf(doc);
    array.iqn = 'iqn.2026-13.example.tidewater:vault'; // RFC 7143 §4.2.7.4: month 01–12
    array.controllers[1].iqn = 'iqn.2026-01.example.tidewater:storage_ctl-b'; // RFC 7143 §4.2.7.2: "_" prohibited
    const invalid = naming(doc).filter((f) => f.rule === 'iqn-invalid');
    expect(invalid.map((f) => f.subjects)).toEqual([[array.id], [array.controllers[1].id]].sort());
    expect(invalid.find((f) => f.subjects[0] === array.id)!.message).toMatch(/target name of vault-1 .*month "13"/);
    expect(invalid.every((f) => f.severity === 'error')).toBe(true);
  });

  it('finds two arrays with one target name, compared after case folding', () => {
    const doc = withSecondArray('IQN.2026-01.EXAMPLE.TIDEWATER:STORAGE.VAULT-1'); // RFC 3722 §4: names fold to lowercase
    const dup = naming(doc).filter((f) => f.rule === 'iqn-duplicate');
    expect(dup).toHaveLength(1);
    expect(dup[0].subjects.sort()).toEqual(['vault-1', 'vault-2']);
    expect(dup[0].message).toMatch(/share the target name iqn\.2026-01\.example\.tidewater:storage\.vault-1/);
  });

  it('finds a controller that takes another array’s name, and a host that takes a target’s', () => {
    const doc = withSecondArray('iqn.2026-01.example.tidewater:storage.vault-2');
    const second = doc.devices.find((d): d is ArrayDevice => d.id === 'vault-2')!;
    second.controllers[0].iqn = arrayOf(doc).iqn;
    const host = doc.devices.find((d) => d.kind === 'host')!;
    if (host.kind === 'host') host.iqn = 'iqn.2026-01.example.tidewater:storage.vault-2';
    const dup = naming(doc).filter((f) => f.rule === 'iqn-duplicate');
    expect(dup.map((f) => f.subjects.slice().sort())).toEqual(
      [['vault-1', 'vault-2.ctl-a'], ['vault-2', host.id].sort()].sort(),
    );
    expect(dup.find((f) => f.subjects.includes(host.id))!.message).toMatch(/every initiator and every target needs a name of its own/);
  });

  it('lets the controllers of one array repeat its own name: one target, several portals', () => {
    const doc = harborRoadV2();
    const array = arrayOf(doc);
    for (const controller of array.controllers) controller.iqn = array.iqn!.toUpperCase();
    expect(naming(doc)).toEqual([]);
  });
});

describe('patterns fill a target name', () => {
  it.each([
    ['direct attach', directAttach],
    ['dual fabric', dualFabric],
    ['dual fabric with management', dualFabricWithManagement],
  ] as const)('%s: <prefix>:storage.<array>, valid and unlike every initiator name', (_, pattern) => {
    const doc = pattern({ hosts: 3, iqnPrefix: 'iqn.2026-01.example.tidewater', arrayName: 'Vault 7' });
    const target = arrayOf(doc).iqn!;
    expect(target).toBe('iqn.2026-01.example.tidewater:storage.vault-7');
    expect(checkIscsiName(target).ok).toBe(true); // RFC 7143 §4.2.7.4
    expect(naming(doc)).toEqual([]);
  });

  it('leaves it out without a prefix, as it does initiator names', () => {
    expect(arrayOf(dualFabric({ hosts: 2 })).iqn).toBeUndefined();
  });
});
