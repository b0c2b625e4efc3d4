import { cleanText, isCleanText } from '@/shared/text/clean';
import { validateTopology } from '@/shared/topology/validate';
import { harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { analyze } from '@/shared/analysis/analyze';
import type { Topology } from '@/shared/topology/schema';

const hex = (text: string) => [...text].map((c) => c.codePointAt(0)!.toString(16)).join(' ');

describe('cleanText', () => {
  it('removes every C0 and C1 control character that does not space words', () => {
    // Unicode general category Cc: U+0000–U+001F and U+007F–U+009F.
    const spacing = new Set([0x09, 0x0a, 0x0b, 0x0c, 0x0d, 0x85]);
    for (let code = 0; code <= 0x9f; code += 1) {
      if (code > 0x1f && code < 0x7f) continue;
      const c = String.fromCharCode(code);
      expect({ code: code.toString(16), clean: cleanText(`a${c}b`) }).toEqual({ code: code.toString(16), clean: spacing.has(code) ? 'a b' : 'ab' });
    }
  });

  it('removes the bidirectional formatting characters', () => {
    // The Bidi_Control property of Unicode Standard Annex #9: ALM, LRM, RLM, LRE, RLE, PDF, LRO, RLO, LRI, RLI, FSI, PDI.
    const bidi = [0x061c, 0x200e, 0x200f, 0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069];
    for (const code of bidi) expect(hex(cleanText(`fab${String.fromCharCode(code)}-a`))).toBe(hex('fab-a'));
    // A right-to-left override that would show "cable 01-A" reversed on screen.
    expect(cleanText('cable \u202eA-10')).toBe('cable A-10');
  });

  it('turns line and paragraph separators into spaces and drops the deprecated format characters', () => {
    expect(cleanText('Harbor\u2028Road\u2029room')).toBe('Harbor Road room');
    expect(cleanText('a\u206ab\u206fc\ufff9d\ufffbe')).toBe('abcde');
  });

  it('leaves ordinary text alone, joiners and other scripts included', () => {
    const texts = ['Harbor Road storage', 'wms-db-1', 'Kühlhaus Süd', 'مخزن', '倉庫 1', 'fam 👨\u200d👩\u200d👧', 'क्\u200dष', ''];
    for (const text of texts) {
      expect(cleanText(text)).toBe(text);
      expect(isCleanText(text)).toBe(true);
    }
    expect(isCleanText('a\u0000')).toBe(false);
  });

  it('is idempotent', () => {
    const dirty = '\u202e\u0000x\ty\u2066z\u2069\r\n';
    expect(cleanText(cleanText(dirty))).toBe(cleanText(dirty));
    expect(cleanText(dirty)).toBe('x yz  ');
  });
});

describe('names and labels of a validated document', () => {
  function dirtyDocument(): Topology {
    const doc = harborRoadV2();
    doc.name = 'Harbor\u202e Road';
    for (const device of doc.devices) {
      device.name = `\u2066${device.name}\u0000`;
      for (const psu of device.psus ?? []) psu.name = `${psu.name}\u202e`;
      const groups = device.kind === 'switch' ? [] : device.kind === 'array' ? device.controllers : device.adapters;
      for (const group of groups) group.name = `${group.name}\u200f`;
      const ports = device.kind === 'switch' ? device.ports : groups.flatMap((g) => g.ports);
      for (const port of ports) port.name = `\u202d${port.name}`;
    }
    for (const cable of doc.cables) cable.label = `${cable.label}\u202e`;
    for (const network of doc.networks) network.name = `${network.name}\n`;
    for (const rack of doc.racks ?? []) {
      rack.name = `A\u0007${rack.name.slice(1)}`;
      rack.row = `\u202e${rack.row ?? ''}`;
    }
    return doc;
  }

  it('comes back with control and bidi characters removed everywhere, ids untouched', () => {
    const checked = validateTopology(JSON.parse(JSON.stringify(dirtyDocument())));
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    const clean = harborRoadV2();
    expect(checked.doc.name).toBe('Harbor Road');
    expect(checked.doc.devices.map((d) => d.name)).toEqual(clean.devices.map((d) => d.name));
    expect(checked.doc.racks?.map((r) => [r.name, r.row])).toEqual(clean.racks?.map((r) => [r.name, r.row ?? '']));
    expect(checked.doc.racks?.length).toBeGreaterThan(0);
    expect(checked.doc.cables.map((c) => c.label)).toEqual(clean.cables.map((c) => c.label));
    expect(checked.doc.networks.map((n) => n.name)).toEqual(clean.networks.map((n) => `${n.name} `));
    expect(checked.doc.devices.map((d) => d.id)).toEqual(clean.devices.map((d) => d.id));
    const names: string[] = [];
    JSON.stringify(checked.doc, (key, value) => {
      if ((key === 'name' || key === 'label' || key === 'row') && typeof value === 'string') names.push(value);
      return value;
    });
    expect(names.length).toBeGreaterThan(100);
    expect(names.filter((name) => !isCleanText(name))).toEqual([]);
    // Messages quote names, so none of them holds such a character either.
    expect(analyze(checked.doc).findings.filter((f) => !isCleanText(f.message))).toEqual([]);
  });

  it('keeps ids with control characters exactly, since they are references', () => {
    const doc = harborRoadV2();
    const old = doc.networks[0].id;
    doc.networks[0].id = 'fabric\u202eA';
    for (const device of doc.devices) {
      const ports = device.kind === 'switch' ? device.ports : (device.kind === 'array' ? device.controllers : device.adapters).flatMap((g) => g.ports);
      for (const port of ports) if (port.networkId === old) port.networkId = 'fabric\u202eA';
    }
    const checked = validateTopology(JSON.parse(JSON.stringify(doc)));
    expect(checked.ok).toBe(true);
    if (checked.ok) expect(checked.doc.networks[0].id).toBe('fabric\u202eA');
  });
});
