// Canonical element order: ids in natural order, and a design listed in any order compiles to
// the same graph, so that every challenge gives the same numbers (the rule "an unchanged
// topology, in any order, gives Δ exactly 0").
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compareCodePoints, compareIds } from '../../src/graph/canonical.js';
import { compileTopology, graphFromEdges } from '../../src/graph/compact.js';
import { evaluateDesign, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { Xoshiro128 } from '../../src/random.js';
import type { ChallengeName } from '../../src/challenges/types.js';
import { parseDesign } from '../../src/topology/parse.js';
import type { Topology } from '../../src/topology/model.js';

const repoRoot = path.resolve(import.meta.dirname, '..', '..');

describe('natural order of ids', () => {
  it('whole numbers by value, beyond 2^53 too; leading zeros tie-broken by code point', () => {
    const ids = ['10', '2', '9007199254740993', '9007199254740992', '007', '7', '100000000000000000000', '1'];
    expect([...ids].sort(compareIds)).toEqual([
      '1',
      '2',
      '007',
      '7',
      '10',
      '9007199254740992',
      '9007199254740993',
      '100000000000000000000',
    ]);
  });

  it('other ids by code point, after the whole numbers', () => {
    // U+1F600 (a surrogate pair in UTF-16) comes after U+FF5E in code point order, though
    // JavaScript's default string order puts it first.
    const astral = '\u{1F600}';
    const fullwidth = '\uFF5E';
    expect(astral < fullwidth).toBe(true);
    expect(compareCodePoints(astral, fullwidth)).toBeGreaterThan(0);
    const ids = [astral, 'b', 'a10', 'a2', '3', fullwidth, 'A', '-1'];
    expect([...ids].sort(compareIds)).toEqual(['3', '-1', 'A', 'a10', 'a2', 'b', fullwidth, astral]);
  });

  it('generated graphs with ids 0…n−1 keep their node order; links follow their ends', () => {
    const g = graphFromEdges(12, [
      [11, 10],
      [0, 11],
      [2, 1],
      [10, 2],
    ]);
    expect(g.nodeIds).toEqual(Array.from({ length: 12 }, (_, i) => String(i)));
    expect(Array.from(g.linkSource)).toEqual([0, 1, 2, 10]);
    expect(Array.from(g.linkTarget)).toEqual([11, 2, 10, 11]);
  });
});

/** A seeded permutation of a list. */
function shuffle<T>(list: readonly T[], rng: Xoshiro128): T[] {
  const out = [...list];
  for (let i = out.length - 1; i > 0; i--) {
    const j = rng.nextInt(i + 1);
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}

/** The same design with every list in another order and some links written end to start. */
function reordered(t: Topology, seed: number): Topology {
  const rng = new Xoshiro128(seed, 3);
  return {
    ...t,
    nodes: shuffle(t.nodes, rng),
    links: shuffle(t.links, rng).map((l) =>
      rng.nextInt(2) === 1 ? { ...l, source: l.target, target: l.source, riskGroups: shuffle(l.riskGroups, rng) } : l,
    ),
    riskGroups: shuffle(t.riskGroups, rng),
    demands: shuffle(t.demands, rng),
  };
}

function withoutLines(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutLines);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value)
        .filter(([k]) => k !== 'line')
        .map(([k, v]) => [k, withoutLines(v)]),
    );
  }
  return value;
}

describe('a design listed in another order', () => {
  const file = path.join(repoRoot, 'fixtures', 'demo', 'base', 'designs', 'lunmere-backbone.net.yaml');
  const t = parseDesign(readFileSync(file, 'utf8'), 'lunmere-backbone.net.yaml');
  const all: ChallengeName[] = [
    'random-nodes',
    'random-links',
    'degree',
    'degree-adaptive',
    'betweenness',
    'betweenness-adaptive',
    'eigenvector',
    'closeness',
    'link-betweenness',
    'link-betweenness-adaptive',
    'risk-groups',
    'risk-groups-worst',
    'regional',
    'n-1',
  ];
  const spec: EvaluationSpec = {
    r: {
      metrics: [
        { id: 'pair_connectivity', weight: 1 },
        { id: 'weighted_efficiency', weight: 1 },
        { id: 'demand_served', weight: 1 },
      ],
      combine: 'mean',
    },
    seed: 42,
    challenges: [
      ...all.map((challenge) => ({
        challenge,
        realizations: 12,
        points: 4,
        ...(challenge === 'regional' ? { until: 60 } : { until: 0.15 }),
        ...(challenge === 'random-nodes' ? { worstCase: 3 } : challenge === 'random-links' ? { worstCase: 2 } : {}),
      })),
      { challenge: 'n-2', element: 'node' },
    ],
  };

  it('compiles to the same graph, and every challenge gives the same evaluation', () => {
    const a = compileTopology(t);
    const ref = evaluateDesign(a, spec);
    const kinds = ref.evaluation;
    expect(kinds.envelopes.map((e) => e.challenge)).toEqual([
      'random-nodes',
      'random-links',
      'risk-groups',
      'regional',
    ]);
    expect(kinds.attacks).toHaveLength(9);
    expect(kinds.contingencies).toHaveLength(2);
    for (const seed of [1, 2]) {
      const u = reordered(t, seed);
      expect(u.nodes.map((v) => v.id)).not.toEqual(t.nodes.map((v) => v.id));
      const b = compileTopology(u);
      expect(b.nodeIds).toEqual(a.nodeIds);
      expect(b.linkIds).toEqual(a.linkIds);
      expect(b.linkKeys).toEqual(a.linkKeys);
      expect(b.groupIds).toEqual(a.groupIds);
      expect(Array.from(b.neighbors)).toEqual(Array.from(a.neighbors));
      expect(Array.from(b.demandSource)).toEqual(Array.from(a.demandSource));
      const ev = evaluateDesign(b, spec);
      expect(withoutLines(ev.evaluation)).toEqual(withoutLines(ref.evaluation));
      expect(ev.samples).toEqual(ref.samples);
      expect(ev.labels).toEqual(ref.labels);
    }
  });

  it('parallel links are ordered by what they carry, not by where the file lists them', () => {
    const text = (first: number, second: number) =>
      [
        'nodes: [{id: a}, {id: b}, {id: c}]',
        'links:',
        `  - {between: [a, b], length_km: ${first}}`,
        `  - {between: [b, a], length_km: ${second}}`,
        '  - {between: [b, c], length_km: 5}',
        '  - {between: [c, a], length_km: 9}',
        '',
      ].join('\n');
    const g1 = compileTopology(parseDesign(text(30, 10), 'x.net.yaml'));
    const g2 = compileTopology(parseDesign(text(10, 30), 'x.net.yaml'));
    expect(Array.from(g1.length!)).toEqual([10, 30, 9, 5]);
    expect(Array.from(g2.length!)).toEqual([10, 30, 9, 5]);
    expect(g1.linkKeys).toEqual(g2.linkKeys);
    // The lines stay with their links: the 10 km link is on line 4 in the first file, line 3 in the second.
    expect(Array.from(g1.linkLine)).toEqual([4, 3, 6, 5]);
    expect(Array.from(g2.linkLine)).toEqual([3, 4, 6, 5]);
  });
});
