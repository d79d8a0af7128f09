// What weak points cost (sites cut off from the largest part, demands that lose every path)
// and which shared-risk groups strand sites, checked against networkx (the version named in
// consequence.json) on seeded generated graphs: connected components and bridges come from
// networkx, the definitions are written out again in test/reference/consequence.py (command
// recorded in the JSON); CI reads the committed file and needs no Python.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology, type CompactGraph } from '../../src/graph/compact.js';
import { removalCost } from '../../src/graph/consequence.js';
import { createMask } from '../../src/graph/mask.js';
import { findStrandingGroups } from '../../src/graph/structure.js';
import { linkKey } from '../../src/topology/model.js';
import { repoRoot } from '../topology/helpers.js';

interface Case {
  name: string;
  n: number;
  edges: [number, number][];
  groups: number[][];
  stranding_groups: number[];
  demands: [number, number][];
  removals: { nodes: number[]; links: number[]; stranded: number[]; demands_lost: number[] }[];
}

const ref = JSON.parse(readFileSync(path.join(repoRoot, 'test', 'reference', 'consequence.json'), 'utf8')) as {
  library: string;
  cases: Case[];
};

/** The generated graph as a design: nodes "0".."n-1", links in order, group g<k>, demands of volume d + 1. */
function design(c: Case): CompactGraph {
  const pos = { line: 1, column: 1 };
  const seen = new Map<string, number>();
  const groupsOf = c.edges.map(() => [] as string[]);
  c.groups.forEach((members, k) => members.forEach((e) => groupsOf[e].push(`g${k}`)));
  return compileTopology({
    file: c.name,
    format: 'csv',
    nodes: Array.from({ length: c.n }, (_, i) => ({ id: String(i), hardened: false, pos, attrs: {} })),
    links: c.edges.map(([a, b], e) => {
      const base = linkKey(String(a), String(b), 1);
      const k = (seen.get(base) ?? 0) + 1;
      seen.set(base, k);
      return {
        id: `e${e}`,
        key: linkKey(String(a), String(b), k),
        source: String(a),
        target: String(b),
        riskGroups: groupsOf[e],
        hardened: false,
        pos,
        attrs: {},
      };
    }),
    riskGroups: c.groups.map((_, k) => ({ id: `g${k}`, pos })),
    demands: c.demands.map(([s, t], d) => ({ source: String(s), target: String(t), volume: d + 1, pos })),
    metadata: {},
    warnings: [],
  });
}

describe(`weak-point costs agree with ${ref.library}`, () => {
  it('the reference is not trivial: groups that strand and removals that cut sites off', () => {
    expect(ref.library).toMatch(/^networkx /);
    expect(ref.cases.length).toBeGreaterThanOrEqual(4);
    expect(ref.cases.reduce((s, c) => s + c.stranding_groups.length, 0)).toBeGreaterThanOrEqual(5);
    expect(
      ref.cases.reduce((s, c) => s + c.removals.filter((r) => r.stranded.length > 0).length, 0),
    ).toBeGreaterThanOrEqual(30);
  });

  for (const c of ref.cases) {
    it(`${c.name}: stranding groups, sites cut off and demands lost`, () => {
      const g = design(c);
      // The compact graph numbers elements in id order (graph/canonical.ts); the reference in
      // its own order: translate by id (nodes "0".."n-1" keep their numbers, links e<k>, groups
      // g<k>, demands by their volume d + 1).
      const link = (e: number) => g.linkIndex.get(`e${e}`)!;
      const groupRef = (k: number) => Number(g.groupIds[k].slice(1));
      const demandRef = (d: number) => g.demandVolume[d] - 1;
      const sorted = (l: number[]) => [...l].sort((a, b) => a - b);
      expect(sorted(findStrandingGroups(g, false).map(groupRef)), 'stranding groups').toEqual(
        sorted(c.stranding_groups),
      );
      for (const r of c.removals) {
        const mask = createMask(g);
        for (const v of r.nodes) mask.node[v] = 1;
        for (const e of r.links) mask.link[link(e)] = 1;
        const cost = removalCost(g, mask);
        const what = `nodes ${r.nodes} links ${r.links}`;
        expect(sorted(cost.stranded), what).toEqual(sorted(r.stranded));
        expect(sorted(cost.demandsLost.map(demandRef)), what).toEqual(sorted(r.demands_lost));
        expect(cost.volumeLost, what).toBe(r.demands_lost.reduce((s, d) => s + d + 1, 0));
      }
    });
  }
});
