import { analyze } from '@/shared/analysis/analyze';
import { harborRoadV1 } from '@/shared/fixtures/harbor-road';
import { buildSnapshot } from '@/lib/editor/geometry';
import { escapeXml, exportSvg } from '@/lib/editor/export-svg';
import { computeMarks } from '@/lib/editor/marks';
import { runCommand } from '@/lib/editor/commands';
import { blank } from '@/tests/lib/editor/helpers/editor';

function count(text: string, pattern: RegExp): number {
  return (text.match(pattern) ?? []).length;
}

describe('SVG export', () => {
  const doc = runCommand(harborRoadV1(), 'autoArrange', {});
  const snapshot = buildSnapshot(doc);
  const svg = exportSvg(snapshot, { marks: computeMarks(doc, analyze(doc)) });

  it('is a standalone SVG document with every device and cable of the design', () => {
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
    expect(count(svg, /<g id="device-/g)).toBe(doc.devices.length);
    expect(count(svg, /<g id="cable-/g)).toBe(doc.cables.length);
    for (const device of doc.devices) expect(svg).toContain(`>${device.name}</text>`);
  });

  it('references fonts by family name and fetches nothing', () => {
    expect(svg).toContain('font-family="Inter,');
    expect(svg).not.toMatch(/@font-face|href="http|url\(http/);
  });

  it('draws version 1’s single points of failure with the hatch and a marker, and names them in the legend', () => {
    // fab-a, cam-rec-2's card-1 and its one fab-a cable (the seed's review of version 1).
    expect(count(svg, /fill="url\(#cw-spof-hatch\)"/g)).toBe(2);
    expect(svg).toContain('single point of failure');
    expect(svg).toContain('Cat 6A copper');
  });

  it('escapes names so a design cannot break the file', () => {
    expect(escapeXml('<a & "b">')).toBe('&lt;a &amp; &quot;b&quot;&gt;');
    let odd = runCommand(blank('R&D <lab>'), 'addDevice', { template: 'host', name: 'x<y>&"z"' });
    odd = runCommand(odd, 'autoArrange', {});
    const out = exportSvg(buildSnapshot(odd));
    expect(out).toContain('x&lt;y&gt;&amp;&quot;z&quot;');
    expect(out).toContain('<title>R&amp;D &lt;lab&gt;</title>');
  });
});
