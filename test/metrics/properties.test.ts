// Property tests (fast-check, seeded, bounded run counts): monotonicity facts from
// docs/METHODS.md §3.3 and "a mask is the same as rebuilding the graph without the element".

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compileTopology, type CompactGraph } from '../../src/graph/compact.js';
import { createMask, type Mask } from '../../src/graph/mask.js';
import { metrics } from '../../src/metrics/registry.js';
import type { Topology } from '../../src/topology/model.js';

interface Spec {
  n: number;
  edges: [number, number][];
  lengths: number[];
  demands: [number, number, number][];
}

/** A design with link lengths and a few demands, node ids "v0".."v{n-1}". */
function design(
  s: Spec,
  keepNode: (i: number) => boolean = () => true,
  keepLink: (e: number) => boolean = () => true,
): CompactGraph {
  const pos = { line: 0, column: 0 };
  const t: Topology = {
    file: 'prop',
    format: 'csv',
    nodes: [],
    links: [],
    riskGroups: [],
    demands: [],
    metadata: {},
    warnings: [],
    latencyBudget: 1.5,
  };
  for (let i = 0; i < s.n; i++) if (keepNode(i)) t.nodes.push({ id: `v${i}`, hardened: false, pos, attrs: {} });
  s.edges.forEach(([a, b], e) => {
    if (!keepLink(e) || !keepNode(a) || !keepNode(b)) return;
    t.links.push({
      id: `e${e}`,
      key: `e${e}`,
      source: `v${a}`,
      target: `v${b}`,
      length: s.lengths[e],
      riskGroups: [],
      hardened: false,
      pos,
      attrs: {},
    });
  });
  for (const [a, b, v] of s.demands)
    if (keepNode(a) && keepNode(b)) t.demands.push({ source: `v${a}`, target: `v${b}`, volume: v, pos });
  return compileTopology(t);
}

// Small multigraphs (parallel links and self-loops included), so every metric takes its
// exact path and any difference is a real one.
const specArb = fc.integer({ min: 2, max: 22 }).chain((n) =>
  fc
    .array(fc.tuple(fc.integer({ min: 0, max: n - 1 }), fc.integer({ min: 0, max: n - 1 })), {
      minLength: 1,
      maxLength: 3 * n,
    })
    .chain((edges) =>
      fc.record({
        n: fc.constant(n),
        edges: fc.constant(edges as [number, number][]),
        lengths: fc.array(fc.double({ min: 0.5, max: 20, noNaN: true }), {
          minLength: edges.length,
          maxLength: edges.length,
        }),
        demands: fc.array(
          fc.tuple(
            fc.integer({ min: 0, max: n - 1 }),
            fc.integer({ min: 0, max: n - 1 }),
            fc.integer({ min: 1, max: 9 }),
          ),
          {
            minLength: 1,
            maxLength: 6,
          },
        ),
      }),
    ),
);

const applicable = (g: CompactGraph) => metrics.filter((m) => m.appliesTo(g));

describe('removing a link never raises a metric', () => {
  // docs/METHODS.md §3.3: efficiency and LCC/pair fractions with N0 (§2.2); Fiedler (adding a link never
  // lowers a); Rayleigh monotonicity for R_G, so (N−1)/R_G; Wu et al. for natural connectivity;
  // Perron–Frobenius for λ₁ (common practice); connectivity counts; our bridge/cut-node
  // pair shares (a removal cannot create a cycle); served demand.
  const ids = [
    'efficiency',
    'weighted_efficiency',
    'largest_component',
    'pair_connectivity',
    'algebraic_connectivity',
    'effective_resistance',
    'natural_connectivity',
    'spectral_radius',
    'node_connectivity',
    'link_connectivity',
    'bridges',
    'cut_nodes',
    'demand_served',
  ];
  it(`holds for ${ids.join(', ')}`, () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.array(fc.boolean(), { maxLength: 30 }), (spec, pick, pre) => {
        const g = design(spec);
        const before: Mask = createMask(g);
        pre.forEach((off, i) => {
          if (off && i < g.m && i % 3 === 0) before.link[i] = 1;
        });
        const after: Mask = { node: before.node.slice(), link: before.link.slice() };
        after.link[pick % g.m] = 1;
        for (const m of applicable(g)) {
          if (!ids.includes(m.id)) continue;
          const evaluate = m.create(g);
          const a = evaluate(before).normalized;
          const b = evaluate(after).normalized;
          expect(b, `${m.id}: ${a} → ${b}`).toBeLessThanOrEqual(a + 1e-12);
        }
      }),
      { seed: 20240601, numRuns: 120 },
    );
  });

  it('removing a node never raises efficiency, largest_component or pair_connectivity (N0 denominators)', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), (spec, pick) => {
        const g = design(spec);
        const before = createMask(g);
        const after = createMask(g);
        after.node[pick % g.n] = 1;
        for (const id of ['efficiency', 'largest_component', 'pair_connectivity']) {
          const evaluate = metrics.find((m) => m.id === id)!.create(g);
          expect(evaluate(after).normalized).toBeLessThanOrEqual(evaluate(before).normalized + 1e-12);
        }
      }),
      { seed: 7, numRuns: 100 },
    );
  });
});

describe('a mask equals rebuilding the graph without the element', () => {
  it('link removal: every metric, raw and normalised', () => {
    fc.assert(
      fc.property(specArb, fc.array(fc.boolean(), { maxLength: 60 }), (spec, drop) => {
        const g = design(spec);
        const mask = createMask(g);
        // Spec edge e is link "e<e>"; the compact graph numbers links in canonical order.
        const index = (e: number) => g.linkIndex.get(`e${e}`)!;
        drop.forEach((d, e) => {
          if (d && e < g.m) mask.link[index(e)] = 1;
        });
        const rebuilt = design(
          spec,
          () => true,
          (e) => !mask.link[index(e)],
        );
        for (const m of applicable(g)) {
          // weighted_efficiency's ideal uses the intact design's cheapest link (ℓ_min), and
          // demand_served's budget the intact paths: both are defined against the intact
          // design, so only their raw values can be compared with a rebuilt one.
          const v = m.create(g)(mask);
          if (!m.appliesTo(rebuilt)) continue;
          const w = m.create(rebuilt)(createMask(rebuilt));
          if (m.id === 'demand_served') continue;
          if (Number.isNaN(w.raw)) expect(v.raw, m.id).toBeNaN();
          else expect(v.raw, m.id).toBeCloseTo(w.raw, 9);
          if (m.id !== 'weighted_efficiency') expect(v.normalized, m.id).toBeCloseTo(w.normalized, 12);
        }
      }),
      { seed: 99, numRuns: 80 },
    );
  });

  it('node removal: survivor-defined values equal; N0-defined ones equal after rescaling', () => {
    fc.assert(
      fc.property(specArb, fc.array(fc.boolean(), { maxLength: 22 }), (spec, drop) => {
        const g = design(spec);
        const mask = createMask(g);
        // Spec node i is "v<i>"; the compact graph numbers nodes in id order (v10 before v2).
        const index = (i: number) => g.nodeIndex.get(`v${i}`)!;
        drop.forEach((d, i) => {
          if (d && i < g.n) mask.node[index(i)] = 1;
        });
        const rebuilt = design(spec, (i) => !mask.node[index(i)]);
        const n0 = g.n;
        const n1 = rebuilt.n;
        for (const m of applicable(g)) {
          if (m.id === 'demand_served' || m.id === 'weighted_efficiency') continue;
          const v = m.create(g)(mask);
          const w = m.create(rebuilt)(createMask(rebuilt));
          if (m.id === 'efficiency') {
            // Σ 1/d is the same; only the denominators N(N−1) differ.
            expect(v.raw * n0 * (n0 - 1)).toBeCloseTo(w.raw * n1 * (n1 - 1), 9);
          } else if (Number.isNaN(w.raw)) {
            expect(v.raw, m.id).toBeNaN();
          } else {
            expect(v.raw, m.id).toBeCloseTo(w.raw, 9);
          }
        }
      }),
      { seed: 1234, numRuns: 80 },
    );
  });
});
