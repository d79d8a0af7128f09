// The plain (unreorthogonalised) Lanczos kernel for one extremal eigenvalue, against
// ml-matrix's EigenvalueDecomposition (the JAMA/EISPACK algorithm, a reference library) on
// seeded random graphs, and against closed-form Laplacian spectra on graphs where the wanted
// value is tiny, clustered or highly repeated — the hard cases for an unrestarted recurrence.
// Closed forms (standard, quoted from memory, as in docs/METHODS.md §9.1): μ(P_n) =
// 2−2cos(πk/n), μ(C_n) = 2−2cos(2πk/n) (each value twice), Q_d: 2k with multiplicity C(d, k),
// K_n: n (n−1 times), star K_{1,n−1}: 1 (n−2 times), and a grid's spectrum is the sum of its
// two paths' (Cartesian product); e.g. Brouwer & Haemers, Spectra of Graphs (2012), §1.4.

import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findComponents } from '../../src/graph/structure.js';
import { createExtremalLanczos } from '../../src/metrics/kernels/extremal-lanczos.js';
import { createAdjacencyOperator, createLaplacianOperator } from '../../src/metrics/kernels/operators.js';
import { createSpectralSurvivors } from '../../src/metrics/kernels/spectral-survivors.js';
import { complete, cycle, expectRelative, grid, hypercube, path, randomEdges, star } from './families.js';

/** The largest component of g as a local graph, its keys, and both operators bound to it. */
function prepare(g: CompactGraph) {
  const c = findComponents(g);
  const mask = createMask(g);
  for (let v = 0; v < g.n; v++) mask.node[v] = c.label[v] === c.largest ? 0 : 1;
  const spectral = createSpectralSurvivors(g);
  const local = spectral.survivors(mask);
  const laplacian = createLaplacianOperator();
  laplacian.bind(local);
  const adjacency = createAdjacencyOperator();
  adjacency.bind(local);
  const one = new Float64Array(local.n).fill(1 / Math.sqrt(local.n));
  return { local, keys: spectral.keysOf(local), laplacian, adjacency, one };
}

function referenceDecomposition(local: ReturnType<typeof prepare>['local'], laplacian: boolean) {
  const n = local.n;
  const a = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++)
    for (let p = local.offsets[i]; p < local.offsets[i + 1]; p++) {
      a.set(i, local.neighbors[p], laplacian ? -1 : 1);
      if (laplacian) a.set(i, i, a.get(i, i) + 1);
    }
  return new EigenvalueDecomposition(a, { assumeSymmetric: true });
}

const referenceSpectrum = (local: ReturnType<typeof prepare>['local'], laplacian: boolean): number[] =>
  referenceDecomposition(local, laplacian).realEigenvalues.sort((x, y) => x - y);

describe('plain Lanczos for one extremal eigenvalue', () => {
  for (const [name, n, m, seed] of [
    ['ER(300, 900)', 300, 900, 11],
    ['ER(350, 500), sparse', 350, 500, 12],
  ] as const) {
    it(`${name}: μ₂ and λ₁ agree with ml-matrix's EigenvalueDecomposition to 1e-10`, () => {
      const p = prepare(graphFromEdges(n, randomEdges(n, m, seed)));
      const solver = createExtremalLanczos(n);
      const fiedler = solver.solve(p.laplacian, {
        which: 'smallest',
        deflate: p.one,
        keys: p.keys,
      });
      expect(fiedler.converged).toBe(true);
      expectRelative(fiedler.value, referenceSpectrum(p.local, true)[1], 1e-10);
      const radius = solver.solve(p.adjacency, { which: 'largest', keys: p.keys });
      expect(radius.converged).toBe(true);
      expectRelative(radius.value, referenceSpectrum(p.local, false)[p.local.n - 1], 1e-10);
    });
  }

  const cases: [string, CompactGraph, number][] = [
    ['path P_2000 (μ₂ ≈ 2.5e-6)', path(2000), 2 - 2 * Math.cos(Math.PI / 2000)],
    ['cycle C_1001 (μ₂ double)', cycle(1001), 2 - 2 * Math.cos((2 * Math.PI) / 1001)],
    ['grid 40 × 60', grid(40, 60), 2 - 2 * Math.cos(Math.PI / 60)],
    ['hypercube Q_10 (μ₂ = 2, ten times)', hypercube(10), 2],
    ['star K_{1,299} (μ₂ = 1, 298 times)', star(300), 1],
    ['complete K_120 (μ₂ = 120, 119 times)', complete(120), 120],
  ];
  for (const [name, g, exact] of cases)
    it(`${name}: μ₂ to 1e-10 and a unit eigenvector orthogonal to 1 with residual ≤ 1e-10·‖L‖`, () => {
      const p = prepare(g);
      const n = p.local.n;
      const r = createExtremalLanczos(n).solve(p.laplacian, {
        which: 'smallest',
        deflate: p.one,
        keys: p.keys,
        wantVector: true,
      });
      expect(r.converged).toBe(true);
      expectRelative(r.value, exact, 1e-10);
      const y = new Float64Array(n);
      p.laplacian.apply(r.vector, y);
      let res = 0;
      let sum = 0;
      let norm = 0;
      for (let i = 0; i < n; i++) {
        res += (y[i] - r.value * r.vector[i]) ** 2;
        sum += r.vector[i];
        norm += r.vector[i] ** 2;
      }
      expect(Math.sqrt(res)).toBeLessThan(1e-10 * p.laplacian.normBound);
      expect(Math.abs(sum) / Math.sqrt(n)).toBeLessThan(1e-12);
      expect(Math.abs(Math.sqrt(norm) - 1)).toBeLessThan(1e-12);
    });

  it('a start that is an exact eigenvector of μ₃, μ₄ or μ₁₁ (from ml-matrix) still gives μ₂', () => {
    const p = prepare(graphFromEdges(400, randomEdges(400, 1200, 5)));
    const d = referenceDecomposition(p.local, true);
    const order = d.realEigenvalues.map((v, i) => [v, i]).sort((x, y) => x[0] - y[0]);
    const solver = createExtremalLanczos(p.local.n);
    for (const k of [2, 3, 10]) {
      const start = Float64Array.from(d.eigenvectorMatrix.getColumn(order[k][1]));
      const r = solver.solve(p.laplacian, { which: 'smallest', deflate: p.one, start });
      expectRelative(r.value, order[1][0], 1e-10);
    }
  });

  it('is a pure function of operator and keys: bit-identical after other solves; the vector pass leaves the value alone; a start from the vector converges sooner to the same value', () => {
    const a = prepare(graphFromEdges(400, randomEdges(400, 1000, 21)));
    const b = prepare(grid(30, 30));
    const solver = createExtremalLanczos(900);
    const req = { which: 'smallest' as const, deflate: a.one, keys: a.keys };
    const first = solver.solve(a.laplacian, req).value;
    const steps = solver.result.steps;
    solver.solve(b.laplacian, { which: 'smallest', deflate: b.one, keys: b.keys });
    expect(solver.solve(a.laplacian, req).value).toBe(first);
    expect(solver.solve(a.laplacian, { ...req, wantVector: true }).value).toBe(first);
    const start = solver.result.vector.slice(0, a.local.n);
    const warm = solver.solve(a.laplacian, { ...req, start });
    expectRelative(warm.value, first, 1e-10);
    expect(warm.steps).toBeLessThan(steps);
  });
});
