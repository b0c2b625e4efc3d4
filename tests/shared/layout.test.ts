import { layoutBands, MAX_BAND_WIDTH } from '@/shared/layout/bands';
import { deviceShape } from '@/shared/layout/shape';
import v1 from '@/shared/fixtures/harbor-road-v1.json';
import { directAttach, dualFabric, dualFabricWithManagement } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';

type Box = { id: string; x: number; y: number; width: number; height: number };

function boxes(doc: Topology): Box[] {
  return doc.devices.map((device) => {
    const at = doc.layout![device.id];
    const { width, height } = deviceShape(device);
    return { id: device.id, x: at.x, y: at.y, width, height };
  });
}

function overlaps(list: Box[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < list.length; i += 1) {
    for (let j = i + 1; j < list.length; j += 1) {
      const [a, b] = [list[i], list[j]];
      if (a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height) out.push(`${a.id}/${b.id}`);
    }
  }
  return out;
}

const designs: [string, Topology][] = [
  ['direct attach, 4 hosts', directAttach({ hosts: 4 })],
  ['direct attach, 2 hosts of 3 cards × 4 ports', directAttach({ hosts: 2, cardsPerHost: 3, portsPerCard: 4 })],
  ['dual fabric, 12 hosts', dualFabric({ hosts: 12 })],
  ['dual fabric with management, 40 hosts', dualFabricWithManagement({ hosts: 40 })],
  ['the Harbor Road demo', v1 as Topology],
];

describe('pattern layouts', () => {
  it.each(designs)('places every box of %s without overlap, by its drawn size', (_, doc) => {
    const list = boxes(doc);
    expect(list).toHaveLength(doc.devices.length);
    expect(overlaps(list)).toEqual([]);
  });

  it.each(designs)('puts hosts above switches above arrays in %s', (_, doc) => {
    const list = boxes(doc);
    const kind = new Map(doc.devices.map((d) => [d.id, d.kind]));
    const lowest = (k: string) => Math.max(...list.filter((b) => kind.get(b.id) === k).map((b) => b.y + b.height));
    const highest = (k: string) => Math.min(...list.filter((b) => kind.get(b.id) === k).map((b) => b.y));
    if (list.some((b) => kind.get(b.id) === 'switch')) {
      expect(lowest('host')).toBeLessThanOrEqual(highest('switch'));
      expect(lowest('switch')).toBeLessThanOrEqual(highest('array'));
    } else {
      expect(lowest('host')).toBeLessThanOrEqual(highest('array'));
    }
  });

  it('wraps a long band onto more rows, each within the band width', () => {
    const doc = dualFabricWithManagement({ hosts: 40 });
    const hosts = boxes(doc).filter((b) => b.id.startsWith('host') || doc.devices.find((d) => d.id === b.id)?.kind === 'host');
    const rows = new Set(hosts.map((b) => b.y));
    expect(rows.size).toBeGreaterThan(1);
    for (const y of rows) {
      const row = hosts.filter((b) => b.y === y);
      const right = Math.max(...row.map((b) => b.x + b.width));
      const left = Math.min(...row.map((b) => b.x));
      expect(right - left).toBeLessThanOrEqual(MAX_BAND_WIDTH);
    }
  });

  it('snaps every position to the 20 px grid', () => {
    const layout = layoutBands([dualFabric({ hosts: 3 }).devices]);
    for (const { x, y } of Object.values(layout)) expect([x % 20, y % 20]).toEqual([0, 0]);
  });
});
