import { compileGraph, ANY_NETWORK } from '@/shared/analysis/compile';
import { createContext } from '@/shared/analysis/context';
import { DominatorSolver } from '@/shared/analysis/dominators';
import { buildDataPathGraph } from '@/shared/analysis/graph';
import { analyze } from '@/shared/analysis/analyze';
import { managementSwitchInPath, oneSwitch, twoArrays } from './helpers/topologies';
import { randomDesign } from './helpers/random-design';

describe('the data-path graph', () => {
  it('makes hosts and cards sinks and enters controllers only from their array', () => {
    const graph = buildDataPathGraph(createContext(twoArrays()), { withHosts: true });
    expect(graph.successors('h1')).toEqual([]);
    expect(graph.successors('h1.c1')).toEqual(['h1']);
    expect(graph.predecessors('v1.a')).toEqual(['v1']);
    expect(graph.node('fa')).toEqual({ kind: 'switch' });
  });

  it('leaves management switches out', () => {
    const graph = buildDataPathGraph(createContext(managementSwitchInPath()), { withHosts: true });
    expect(graph.hasNode('oob')).toBe(false);
    expect(graph.hasNode('fa')).toBe(true);
  });

  it('keeps the host side out of the core graph the analysis runs on', () => {
    const graph = buildDataPathGraph(createContext(oneSwitch()));
    expect(graph.nodes().sort()).toEqual(['fa', 'k1', 'k2', 'v', 'v.a', 'v.b']);
  });

  it('gives the same host dominators on the whole graph as the analysis gets from attachments', () => {
    // Documents without networks: one dominator run per array over the whole graph decides it.
    let compared = 0;
    for (let seed = 1; seed <= 400; seed += 1) {
      const doc = randomDesign(seed);
      if (doc.networks.length > 0) continue;
      const graph = compileGraph(buildDataPathGraph(createContext(doc), { withHosts: true }));
      const solver = new DominatorSolver(graph);
      for (const pair of analyze(doc).hosts) {
        const run = solver.run(graph.indexOf.get(pair.array)!, ANY_NETWORK);
        const units: string[] = [];
        for (let d = run.idom[run.numberOf[graph.indexOf.get(pair.host)!]]; d > 0; d = run.idom[d]) {
          if (graph.kinds[run.nodes[d]] !== 'array') units.push(graph.ids[run.nodes[d]]);
        }
        expect({ seed, units: units.sort() }).toEqual({ seed, units: pair.singlePointsOfFailure });
        compared += 1;
      }
    }
    expect(compared).toBeGreaterThan(50);
  });
});
