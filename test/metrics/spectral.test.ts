// The iterative spectral paths against the exact dense path of the same code (both are
// also checked against NumPy in test/reference/metrics.test.ts), on seeded graphs above the
// dense-size limits; and the dense solver against ml-matrix's EigenvalueDecomposition.

import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findComponents } from '../../src/graph/structure.js';
import { symmetricEigen, symmetricEigenvalues } from '../../src/metrics/kernels/symmetric-eigen.js';
import { getMetric } from '../../src/metrics/registry.js';
import { expectRelative, randomEdges, rng, type Edge } from './families.js';

/** Barabási–Albert preferential attachment, seeded (m links per new node). */
function barabasiAlbert(n: number, m: number, seed: number): Edge[] {
  const r = rng(seed);
  const edges: Edge[] = [];
  const ends: number[] = [];
  for (let v = 0; v <= m; v++)
    for (let u = 0; u < v; u++) {
      edges.push([u, v]);
      ends.push(u, v);
    }
  for (let v = m + 1; v < n; v++) {
    const chosen = new Set<number>();
    while (chosen.size < m) chosen.add(ends[Math.floor(r() * ends.length)]);
    for (const u of chosen) {
      edges.push([u, v]);
      ends.push(u, v);
    }
  }
  return edges;
}

/** The largest component of a graph, as a mask. */
function lccMask(g: CompactGraph) {
  const c = findComponents(g);
  const mask = createMask(g);
  for (let v = 0; v < g.n; v++) mask.node[v] = c.label[v] === c.largest ? 0 : 1;
  return mask;
}

const er = graphFromEdges(420, randomEdges(420, 1260, 17));
const ba = graphFromEdges(520, barabasiAlbert(520, 3, 23));

describe('dense values-only solver', () => {
  it('matches ml-matrix EigenvalueDecomposition (the JAMA algorithm) to 1e-12 on random symmetric matrices', () => {
    const r = rng(5);
    for (const n of [1, 2, 7, 40, 90]) {
      const a = Matrix.zeros(n, n);
      for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) (a.set(i, j, r() - 0.5), a.set(j, i, a.get(i, j)));
      const expected = new EigenvalueDecomposition(a, { assumeSymmetric: true }).realEigenvalues.sort((x, y) => x - y);
      const flat = Float64Array.from(a.to1DArray());
      const d = new Float64Array(n);
      const e = new Float64Array(n);
      symmetricEigenvalues(flat.slice(), n, d, e);
      for (let i = 0; i < n; i++) expect(Math.abs(d[i] - expected[i])).toBeLessThan(1e-12);
      // With vectors: A v = λ v for every pair.
      const v = flat.slice();
      symmetricEigen(v, n, d, e);
      for (let k = 0; k < n; k++) {
        for (let i = 0; i < n; i++) {
          let s = 0;
          for (let j = 0; j < n; j++) s += flat[i * n + j] * v[j * n + k];
          expect(Math.abs(s - d[k] * v[i * n + k])).toBeLessThan(1e-11);
        }
      }
    }
  });
});

describe('thick-restart Lanczos (algebraic connectivity, spectral radius)', () => {
  for (const [name, g] of [
    ['ER(420, 1260)', er],
    ['BA(520, 3)', ba],
  ] as const) {
    it(`${name}: agrees with the dense path to 1e-9`, () => {
      const mask = lccMask(g);
      for (const id of ['algebraic_connectivity', 'spectral_radius']) {
        const fast = getMetric(id).create(g)(mask).raw;
        const exact = getMetric(id).create(g, { denseLimit: Infinity })(mask).raw;
        expectRelative(fast, exact, 1e-9);
      }
    });
  }
  it('a warm start gives the same value as a cold one (to 1e-9) over a sequence of masks', () => {
    const cold = getMetric('algebraic_connectivity').create(ba);
    const warm = getMetric('algebraic_connectivity').create(ba, { warmStart: true });
    const coldR = getMetric('spectral_radius').create(ba);
    const warmR = getMetric('spectral_radius').create(ba, { warmStart: true });
    const mask = createMask(ba);
    const r = rng(3);
    for (let step = 0; step < 6; step++) {
      for (let k = 0; k < 5; k++) mask.link[Math.floor(r() * ba.m)] = 1;
      const c = cold(mask).raw;
      if (c > 0) expectRelative(warm(mask).raw, c, 1e-9);
      expectRelative(warmR(mask).raw, coldR(mask).raw, 1e-9);
    }
  });
  it('is deterministic: the same mask gives the bit-identical value after other masks', () => {
    const evaluate = getMetric('algebraic_connectivity').create(ba);
    const mask = createMask(ba);
    const first = evaluate(mask).raw;
    const other = createMask(ba);
    other.link.fill(1, 0, 40);
    evaluate(other);
    expect(evaluate(mask).raw).toBe(first);
  });
});

describe('exact effective resistance of long sparse graphs above the dense limit (banded LDLᵀ + Takahashi)', () => {
  it('C_1000 = (N³−N)/12 (docs/METHODS.md §9.3, M) and the 20×30 grid from its Laplacian spectrum λ_i(P_20)+λ_j(P_30) (Cartesian-product spectra, standard, M)', () => {
    const c = graphFromEdges(
      1000,
      Array.from({ length: 1000 }, (_, i): Edge => [i, (i + 1) % 1000]),
    );
    expectRelative(getMetric('effective_resistance').create(c)(createMask(c)).raw, (1000 ** 3 - 1000) / 12);
    const rows = 20;
    const cols = 30;
    const edges: Edge[] = [];
    for (let r = 0; r < rows; r++)
      for (let k = 0; k < cols; k++) {
        if (k + 1 < cols) edges.push([r * cols + k, r * cols + k + 1]);
        if (r + 1 < rows) edges.push([r * cols + k, (r + 1) * cols + k]);
      }
    const grid = graphFromEdges(rows * cols, edges);
    let sum = 0;
    for (let i = 0; i < rows; i++)
      for (let j = 0; j < cols; j++) {
        if (i === 0 && j === 0) continue;
        sum += 1 / (2 * (1 - Math.cos((Math.PI * i) / rows)) + 2 * (1 - Math.cos((Math.PI * j) / cols)));
      }
    expectRelative(getMetric('effective_resistance').create(grid)(createMask(grid)).raw, rows * cols * sum);
  });
});

describe('seeded trace estimators above the dense limit (effective resistance, natural connectivity)', () => {
  // The documented accuracy (see the metric files): the estimate is within these bounds of
  // the exact value on these seeded graphs; measured values are printed by the bench.
  const bounds: Record<string, number> = { effective_resistance: 2e-2, natural_connectivity: 2e-2 };
  for (const [name, g] of [
    ['ER(420, 1260)', er],
    ['BA(520, 3)', ba],
  ] as const) {
    it(`${name}: within the documented error of the exact value, and deterministic`, () => {
      const mask = lccMask(g);
      for (const id of Object.keys(bounds)) {
        // exactWork 0 and denseLimit 0 keep effective_resistance off its exact banded path.
        const evaluate = getMetric(id).create(g, { exactWork: 0, denseLimit: 0 });
        const estimate = evaluate(mask);
        const exact = getMetric(id).create(g, { denseLimit: Infinity })(mask);
        expectRelative(estimate.raw, exact.raw, bounds[id]);
        expect(estimate.raw).not.toBe(exact.raw); // the estimator path really ran
        expect(evaluate(mask)).toEqual(estimate);
      }
    });
  }
});
