// Components, bridges and cut nodes checked against networkx (Debian python3-networkx 2.8.8,
// the version named in structure.json), on every Internet Topology Zoo network and on seeded
// generated graphs. The values were produced by test/reference/structure.py (command and
// conventions are recorded in the JSON); CI reads the committed file and needs no Python.
// Zoo: Knight et al., IEEE JSAC 29(9):1765–1775, 2011; CC BY 4.0.
// Parallel links: networkx's `bridges` needs a simple graph, so the script counts a bridge
// of the simple graph only when it has no parallel twin — netbrace's rule (structure.ts).
// The convention matters here: 96 zoo networks have parallel links (654 extra links), and
// 181 of the simple graphs' bridges have a twin (counted with the same script's reader).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { findComponents, findCutElements } from '../../src/graph/structure.js';
import { parseDesign } from '../../src/topology/parse.js';
import { repoRoot } from '../topology/helpers.js';

interface Facts {
  nodes: number;
  links: number;
  components: number;
  bridges: [string, string][];
  cut_nodes: string[];
  isolated: string[];
}

const ref = JSON.parse(readFileSync(path.join(repoRoot, 'test', 'reference', 'structure.json'), 'utf8')) as {
  library: string;
  zoo: (Facts & { file: string })[];
  zoo_unreadable_by_networkx: unknown[];
  generated: (Facts & { name: string; n: number; edges: [number, number][] })[];
};
const ZOO = path.resolve(repoRoot, 'fixtures', 'topology-zoo', 'gml');

/** The same facts, computed by netbrace, in the reference's shape. */
function facts(g: CompactGraph): Facts {
  const { bridges, cutNodes } = findCutElements(g);
  const isolated: string[] = [];
  for (let v = 0; v < g.n; v++) if (g.offsets[v + 1] === g.offsets[v]) isolated.push(g.nodeIds[v]);
  return {
    nodes: g.n,
    links: g.m,
    components: findComponents(g).sizes.length,
    bridges: bridges
      .map((e) => [g.nodeIds[g.linkSource[e]], g.nodeIds[g.linkTarget[e]]].sort() as [string, string])
      .sort((a, b) => (a[0] === b[0] ? (a[1] < b[1] ? -1 : 1) : a[0] < b[0] ? -1 : 1)),
    cut_nodes: cutNodes.map((v) => g.nodeIds[v]).sort(),
    isolated: isolated.sort(),
  };
}

/** The reference sorts with Python's default string order; so do we (code-unit order). */
const pick = ({ nodes, links, components, bridges, cut_nodes, isolated }: Facts): Facts => ({
  nodes,
  links,
  components,
  bridges,
  cut_nodes,
  isolated,
});

describe(`structure agrees with ${ref.library}`, () => {
  it('the reference covers at least 30 zoo networks and networkx read them all', () => {
    expect(ref.library).toBe('networkx 2.8.8');
    expect(ref.zoo.length).toBeGreaterThanOrEqual(30);
    expect(ref.zoo_unreadable_by_networkx).toEqual([]);
  });

  it('every zoo network: node and link counts, components, bridges, cut nodes, isolated nodes', () => {
    let bridges = 0;
    let cuts = 0;
    for (const r of ref.zoo) {
      const t = parseDesign(readFileSync(path.join(ZOO, r.file), 'utf8'), r.file);
      expect(facts(compileTopology(t)), r.file).toEqual(pick(r));
      bridges += r.bridges.length;
      cuts += r.cut_nodes.length;
    }
    // The sample is not trivial: thousands of bridges and cut nodes were compared.
    expect(bridges).toBeGreaterThan(1000);
    expect(cuts).toBeGreaterThan(1000);
  });

  it('seeded generated graphs, including one with doubled links', () => {
    expect(ref.generated.length).toBeGreaterThanOrEqual(5);
    for (const r of ref.generated) {
      expect(facts(graphFromEdges(r.n, r.edges)), r.name).toEqual(pick(r));
    }
  });
});
