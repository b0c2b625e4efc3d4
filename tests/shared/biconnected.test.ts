import cytoscape from 'cytoscape';
import { analyze } from '@/shared/analysis/analyze';
import type { Topology } from '@/shared/topology/schema';
import { Draft } from './helpers/draft';
import { mulberry32 } from './helpers/random-design';

/**
 * Cross-check with a reference library: cytoscape's hopcroftTarjanBiconnected() (Hopcroft & Tarjan,
 * "Algorithm 447", CACM 16(6):372–378, 1973) on random connected switch graphs.
 *
 * Where the notions coincide: every switch gets one host with one single-port card, and two arrays
 * of one controller each hang on two different switches r1 and r2. A switch s is a cut vertex of the
 * switch graph exactly when, for a root r ≠ s, it cuts off some host that is not on s itself; an
 * inter-switch cable is a bridge exactly when it cuts off some host.
 */
function randomSwitchGraph(seed: number) {
  const rnd = mulberry32(seed);
  const n = 3 + Math.floor(rnd() * 9);
  const edges = new Set<string>();
  for (let s = 1; s < n; s += 1) edges.add(`${Math.floor(rnd() * s)}-${s}`); // a random spanning tree
  const extra = Math.floor(rnd() * n);
  for (let k = 0; k < extra; k += 1) {
    const a = Math.floor(rnd() * n);
    const b = Math.floor(rnd() * n);
    if (a !== b) edges.add(`${Math.min(a, b)}-${Math.max(a, b)}`);
  }
  return { n, edges: [...edges].map((e) => e.split('-').map(Number) as [number, number]), r1: 0, r2: n - 1 };
}

function design({ n, edges, r1, r2 }: ReturnType<typeof randomSwitchGraph>): Topology {
  const d = new Draft();
  d.array('v1', { a: 1 }).array('v2', { a: 1 });
  for (let s = 0; s < n; s += 1) d.switch(`s${s}`, 'data', 24);
  for (let s = 0; s < n; s += 1) d.host(`h${s}`, { c: 1 });
  d.link('v1.a.1', `s${r1}`).link('v2.a.1', `s${r2}`);
  for (let s = 0; s < n; s += 1) d.link(`h${s}.c.1`, `s${s}`);
  for (const [a, b] of edges) d.link(`s${a}`, `s${b}`, { id: `isl-${a}-${b}` });
  return d.build();
}

function reference({ n, edges }: ReturnType<typeof randomSwitchGraph>) {
  const cy = cytoscape({
    headless: true,
    elements: [
      ...Array.from({ length: n }, (_, s) => ({ data: { id: `s${s}` } })),
      ...edges.map(([a, b]) => ({ data: { id: `isl-${a}-${b}`, source: `s${a}`, target: `s${b}` } })),
    ],
  });
  const { cut, components } = cy.elements().hopcroftTarjanBiconnected();
  const cutVertices = cut.map((node) => node.id()).sort();
  // A block that is a single edge is a bridge.
  const bridges = components
    .filter((component) => component.edges().length === 1)
    .map((component) => component.edges()[0].id())
    .sort();
  return { cutVertices, bridges };
}

describe('single points of failure against cytoscape hopcroftTarjanBiconnected()', () => {
  it('agrees on cut vertices and bridges of 200 random switch graphs', () => {
    let cutsSeen = 0;
    for (let seed = 1; seed <= 200; seed += 1) {
      const graph = randomSwitchGraph(seed);
      const report = analyze(design(graph));
      const rootOf = { v1: `s${graph.r1}`, v2: `s${graph.r2}` } as Record<string, string>;
      const cutVertices = new Set<string>();
      const bridges = new Set<string>();
      for (const failure of report.failures) {
        for (const { host, array } of failure.cutsOff) {
          const hostSwitch = `s${host.slice(1)}`;
          if (failure.kind === 'switch' && failure.unit !== rootOf[array] && failure.unit !== hostSwitch) cutVertices.add(failure.unit);
          if (failure.kind === 'cable' && failure.unit.startsWith('isl-')) bridges.add(failure.unit);
        }
      }
      const expected = reference(graph);
      expect({ seed, cut: [...cutVertices].sort(), bridges: [...bridges].sort() }).toEqual({ seed, cut: expected.cutVertices, bridges: expected.bridges });
      cutsSeen += expected.cutVertices.length;
    }
    expect(cutsSeen).toBeGreaterThan(50); // the graphs must actually have cut vertices to compare
  });
});
