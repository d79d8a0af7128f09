// Outside check of the metric library against general-purpose reference libraries. The
// values come from test/reference/metrics.py (its header says which library computes what;
// the versions below are read from the committed JSON): networkx 2.8.8, python-igraph
// 0.10.2 and NumPy 1.24.2 (LAPACK eigvalsh) under Debian's python3. Graphs are rebuilt from
// the edge lists in the JSON, so the check does not depend on netbrace's parsers.
// Tolerances: 1e-9 relative for combinatorial metrics and for spectra from the dense
// solver; 1e-6 for values from thick-restart Lanczos (the tolerance for iterative
// spectral metrics); the seeded trace estimators above 300 nodes are checked at the error
// their files document, and their exact path (denseLimit: Infinity) at 1e-9.

import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { getMetric } from '../../src/metrics/registry.js';
import { EXTREMAL_DENSE_LIMIT, TRACE_DENSE_LIMIT } from '../../src/metrics/kernels/spectral-survivors.js';
import { NATURAL_DENSE_LIMIT } from '../../src/metrics/natural-connectivity.js';
import type { MetricOptions } from '../../src/metrics/types.js';
import type { Topology } from '../../src/topology/model.js';

interface Value {
  value: number | null;
  normalized: number;
}
interface DemandCase {
  demands: [number, number, number][];
  removedLinks: number[];
  latencyBudget: number;
  served: Value;
  servedWithinBudget: Value;
}
interface RefGraph {
  name: string;
  source: string;
  n: number;
  edges: [number, number][];
  weights?: number[];
  weightKind?: 'length' | 'latency' | 'weight';
  coords?: [number, number][];
  values: Record<string, Value>;
  demandCase?: DemandCase;
}

const file = path.resolve(__dirname, 'metrics.json');
const ref = JSON.parse(readFileSync(file, 'utf8')) as { libraries: Record<string, string>; graphs: RefGraph[] };
const libs = `networkx ${ref.libraries.networkx}, python-igraph ${ref.libraries['python-igraph']}, NumPy ${ref.libraries.numpy}`;

/** The design as a topology with link costs, coordinates and demands, as the parsers would give it. */
function designOf(r: RefGraph, demands: DemandCase | null, budget: number | undefined): CompactGraph {
  const pos = { line: 0, column: 0 };
  const t: Topology = {
    file: r.name,
    format: 'csv',
    nodes: Array.from({ length: r.n }, (_, i) => ({
      id: String(i),
      hardened: false,
      pos,
      attrs: {},
      ...(r.coords ? { lat: r.coords[i][0], lon: r.coords[i][1] } : {}),
    })),
    links: r.edges.map(([a, b], e) => ({
      id: `e${e}`,
      key: `${a}-${b}`,
      source: String(a),
      target: String(b),
      riskGroups: [],
      hardened: false,
      pos,
      attrs: {},
      ...(r.weights && r.weightKind ? { [r.weightKind]: r.weights[e] } : {}),
    })),
    riskGroups: [],
    demands: (demands?.demands ?? []).map(([s, d, v]) => ({ source: String(s), target: String(d), volume: v, pos })),
    metadata: {},
    warnings: [],
    ...(budget !== undefined ? { latencyBudget: budget } : {}),
  };
  return compileTopology(t);
}

function close(actual: number, expected: number | null, tol: number, what: string): void {
  if (expected === null) {
    expect(actual, what).toBe(Infinity);
    return;
  }
  const err = Math.abs(actual - expected);
  const ok = err <= tol * Math.abs(expected) || err <= 1e-12;
  expect(ok, `${what}: expected ${expected}, got ${actual} (relative ${err / Math.abs(expected)})`).toBe(true);
}

/** Which tolerance applies to a metric on a graph of n nodes with default options. */
function tolerance(id: string, n: number): number | 'estimate' {
  if ((id === 'algebraic_connectivity' || id === 'spectral_radius') && n > EXTREMAL_DENSE_LIMIT) return 1e-6;
  if (id === 'effective_resistance' && n > TRACE_DENSE_LIMIT) return 'estimate';
  if (id === 'natural_connectivity' && n > NATURAL_DENSE_LIMIT) return 'estimate';
  return 1e-9;
}

describe(`metrics against ${libs} (test/reference/metrics.json)`, () => {
  it('covers the datasets the issue asks for', () => {
    const names = ref.graphs.map((g) => g.name);
    expect(names).toEqual(expect.arrayContaining(['karate', 'les_miserables', 'florentine']));
    expect(names.filter((n) => n.startsWith('zoo:')).length).toBeGreaterThanOrEqual(40);
    for (const prefix of ['er_', 'ba_', 'ws_', 'rgg_']) expect(names.some((n) => n.startsWith(prefix))).toBe(true);
    // docs/METHODS.md §10.2 (networkx, V): the unweighted karate club.
    const karate = ref.graphs.find((g) => g.name === 'karate')!.values;
    expect(karate.algebraic_connectivity.value).toBeCloseTo(0.468525226701, 9);
    expect(karate.effective_resistance.value).toBeCloseTo(470.268185, 5);
  });

  for (const r of ref.graphs) {
    it(`${r.name} (${r.n} nodes, ${r.edges.length} links; ${r.source})`, () => {
      const g = graphFromEdges(r.n, r.edges);
      const mask = createMask(g);
      for (const [id, expected] of Object.entries(r.values)) {
        const m = getMetric(id);
        const design = id === 'weighted_efficiency' ? designOf(r, null, undefined) : g;
        expect(m.appliesTo(design), id).toBe(true);
        const tol = tolerance(id, r.n);
        if (tol === 'estimate') {
          // Seeded estimator: the documented error, then the exact path.
          const v = m.create(design)(mask);
          close(v.raw, expected.value, 2e-2, `${id} estimate`);
          const exact = m.create(design, { denseLimit: Infinity })(mask);
          close(exact.raw, expected.value, 1e-9, `${id} raw (exact path)`);
          close(exact.normalized, expected.normalized, 1e-9, `${id} normalized (exact path)`);
          continue;
        }
        const v = m.create(design)(mask);
        close(v.raw, expected.value, tol, `${id} raw`);
        close(v.normalized, expected.normalized, tol, `${id} normalized`);
      }
    });
  }

  it('hop metrics of the largest component are absent from the JSON only where it has < 2 nodes', () => {
    for (const r of ref.graphs) expect(r.values.average_hop, r.name).toBeDefined();
  });
});

describe(`demand_served against networkx ${ref.libraries.networkx} shortest paths`, () => {
  const cases = ref.graphs.filter((g) => g.demandCase);
  it('has cases with hop counts, lengths, latencies and generic weights', () => {
    expect(cases.length).toBeGreaterThanOrEqual(4);
    expect(new Set(cases.map((c) => c.weightKind ?? 'hops')).size).toBeGreaterThanOrEqual(3);
  });
  for (const r of cases) {
    const c = r.demandCase!;
    it(`${r.name}: ${c.demands.length} demands, ${c.removedLinks.length} links removed, budget ${c.latencyBudget}`, () => {
      const options: MetricOptions = { latencyBudget: c.latencyBudget };
      const plain = designOf(r, c, undefined);
      const mask = createMask(plain);
      // Reference edge e is link "e<e>" (the compact graph numbers links by their ends).
      for (const e of c.removedLinks) mask.link[plain.linkIndex.get(`e${e}`)!] = 1;
      const served = getMetric('demand_served').create(plain)(mask);
      close(served.raw, c.served.value, 1e-12, 'served volume');
      close(served.normalized, c.served.normalized, 1e-12, 'served share');
      const within = getMetric('demand_served').create(plain, options)(mask);
      close(within.raw, c.servedWithinBudget.value, 1e-12, 'served within budget');
      // The design's own latencyBudget gives the same answer as the option.
      const budgeted = designOf(r, c, c.latencyBudget);
      expect(getMetric('demand_served').create(budgeted)(mask)).toEqual(within);
    });
  }
});
