// Closed-form values from docs/METHODS.md §9 (the table's tags: "M" = standard result
// quoted from memory there, "derived" = derived in that table, "V" = checked numerically
// there). Each check names its source; all agree to 1e-9 relative.

import { describe, it } from 'vitest';
import type { CompactGraph } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { getMetric } from '../../src/metrics/registry.js';
import type { MetricOptions } from '../../src/metrics/types.js';
import {
  complete,
  completeBipartite,
  cycle,
  dodecahedron,
  expectRelative,
  grid,
  hypercube,
  path,
  petersen,
  star,
  wheel,
} from './families.js';

const raw = (id: string, g: CompactGraph, options?: MetricOptions) =>
  getMetric(id).create(g, options)(createMask(g)).raw;
const binom = (n: number, k: number) => {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return r;
};

// Both solver paths: the dense solver and (denseLimit 0) Lanczos.
const paths: [string, MetricOptions][] = [
  ['dense', {}],
  ['Lanczos', { denseLimit: 0 }],
];

describe('algebraic connectivity (docs/METHODS.md §9.1; Fiedler 1973, standard spectra, M)', () => {
  for (const [name, opt] of paths) {
    it(`${name}: paths 2(1−cos(π/n)), cycles 2(1−cos(2π/n)), K_n = n (M)`, () => {
      expectRelative(raw('algebraic_connectivity', path(5), opt), 0.381966011, 1e-8);
      expectRelative(raw('algebraic_connectivity', path(10), opt), 0.097886967, 1e-8);
      for (const n of [3, 7, 30, 90])
        expectRelative(raw('algebraic_connectivity', path(n), opt), 2 * (1 - Math.cos(Math.PI / n)));
      expectRelative(raw('algebraic_connectivity', cycle(10), opt), 0.381966011, 1e-8);
      for (const n of [5, 64, 101])
        expectRelative(raw('algebraic_connectivity', cycle(n), opt), 2 * (1 - Math.cos((2 * Math.PI) / n)));
      for (const n of [2, 10, 60]) expectRelative(raw('algebraic_connectivity', complete(n), opt), n);
    });
    it(`${name}: star 1, hypercube Q_d 2, K_{m,n} min(m,n), Petersen 2 (M)`, () => {
      for (const n of [3, 10, 80]) expectRelative(raw('algebraic_connectivity', star(n), opt), 1);
      for (const d of [2, 3, 4, 5, 7]) expectRelative(raw('algebraic_connectivity', hypercube(d), opt), 2);
      expectRelative(raw('algebraic_connectivity', completeBipartite(4, 7), opt), 4);
      expectRelative(raw('algebraic_connectivity', completeBipartite(30, 41), opt), 30);
      expectRelative(raw('algebraic_connectivity', petersen(), opt), 2);
    });
    it(`${name}: wheel 1+2(1−cos(2π/(n−1))) (derived), grid min(a(P_m), a(P_k)) (M), dodecahedron 3−√5 (V)`, () => {
      expectRelative(raw('algebraic_connectivity', wheel(8), opt), 1.753020396, 1e-8);
      for (const n of [6, 50])
        expectRelative(raw('algebraic_connectivity', wheel(n), opt), 1 + 2 * (1 - Math.cos((2 * Math.PI) / (n - 1))));
      expectRelative(raw('algebraic_connectivity', grid(4, 6), opt), 0.267949192, 1e-8);
      expectRelative(raw('algebraic_connectivity', grid(9, 13), opt), 2 * (1 - Math.cos(Math.PI / 13)));
      expectRelative(raw('algebraic_connectivity', dodecahedron(), opt), 3 - Math.sqrt(5));
    });
  }
});

describe('spectral radius (docs/METHODS.md §9.4, M)', () => {
  for (const [name, opt] of paths) {
    it(`${name}: K_N, star, P_N, C_N, K_{m,n}, Q_d`, () => {
      for (const n of [3, 10, 70]) expectRelative(raw('spectral_radius', complete(n), opt), n - 1);
      expectRelative(raw('spectral_radius', star(10), opt), 3);
      expectRelative(raw('spectral_radius', star(65), opt), 8);
      expectRelative(raw('spectral_radius', path(10), opt), 1.918985947, 1e-8);
      for (const n of [4, 60]) expectRelative(raw('spectral_radius', path(n), opt), 2 * Math.cos(Math.PI / (n + 1)));
      for (const n of [5, 80]) expectRelative(raw('spectral_radius', cycle(n), opt), 2);
      expectRelative(raw('spectral_radius', completeBipartite(4, 5), opt), 4.472135955, 1e-9);
      expectRelative(raw('spectral_radius', completeBipartite(20, 45), opt), 30);
      for (const d of [3, 6]) expectRelative(raw('spectral_radius', hypercube(d), opt), d);
    });
  }
});

describe('effective graph resistance R_G (docs/METHODS.md §9.3)', () => {
  it('K_N = N−1 (Ellens 2011, S); P_N = (N³−N)/6 (Klein–Randić, M); C_N = (N³−N)/12 (M); star (N−1)² (M)', () => {
    expectRelative(raw('effective_resistance', complete(10)), 9);
    expectRelative(raw('effective_resistance', path(10)), 165);
    expectRelative(raw('effective_resistance', path(57)), (57 ** 3 - 57) / 6);
    expectRelative(raw('effective_resistance', cycle(10)), 82.5);
    expectRelative(raw('effective_resistance', cycle(41)), (41 ** 3 - 41) / 12);
    expectRelative(raw('effective_resistance', star(10)), 81);
  });
  it('K_{m,n} = N((n−1)/m + (m−1)/n + 1/N) and Q_d = 2^d Σ C(d,j)/(2j) (derived); Petersen 33, dodecahedron 548/3 (V)', () => {
    expectRelative(raw('effective_resistance', completeBipartite(2, 3)), 7.666667, 1e-6);
    const kmn = (m: number, n: number) => (m + n) * ((n - 1) / m + (m - 1) / n + 1 / (m + n));
    expectRelative(raw('effective_resistance', completeBipartite(6, 11)), kmn(6, 11));
    expectRelative(raw('effective_resistance', hypercube(3)), 19.333333, 1e-6);
    expectRelative(raw('effective_resistance', hypercube(4)), 68.666667, 1e-6);
    for (const d of [5, 6]) {
      let s = 0;
      for (let j = 1; j <= d; j++) s += binom(d, j) / (2 * j);
      expectRelative(raw('effective_resistance', hypercube(d)), 2 ** d * s);
    }
    expectRelative(raw('effective_resistance', petersen()), 33);
    expectRelative(raw('effective_resistance', dodecahedron()), 548 / 3);
  });
});

describe('natural connectivity (docs/METHODS.md §9.4, derived; Wu et al. 2010)', () => {
  it('K_N = ln((e^{N−1}+(N−1)e^{−1})/N), star = ln((2cosh√(N−1)+N−2)/N)', () => {
    expectRelative(raw('natural_connectivity', complete(10)), 6.697823423, 1e-9);
    expectRelative(raw('natural_connectivity', complete(5)), 2.417157073, 1e-9);
    expectRelative(raw('natural_connectivity', star(10)), 1.034440775, 1e-9);
    const n = 50;
    expectRelative(raw('natural_connectivity', star(n)), Math.log((2 * Math.cosh(Math.sqrt(n - 1)) + n - 2) / n));
  });
  it('is computed in log space: K_720 (e^719 overflows a double) ≈ N−1−ln N', () => {
    const n = 720;
    // The iterative path: the top eigenpair is deflated and the rest of K_N's spectrum is flat
    // (all −1), so the quadrature is exact here whatever the probes.
    expectRelative(
      raw('natural_connectivity', complete(n), { denseLimit: 0 }),
      n - 1 + Math.log1p((n - 1) * Math.exp(-n)) - Math.log(n),
    );
  });
});

describe('hop metrics (docs/METHODS.md §9.2, derived)', () => {
  it('average hop H: P_N (N+1)/3, star 2(N−1)/N, C_N odd (N+1)/4, even N²/(4(N−1))', () => {
    for (const n of [2, 9, 40]) expectRelative(raw('average_hop', path(n)), (n + 1) / 3);
    for (const n of [3, 10, 50]) expectRelative(raw('average_hop', star(n)), (2 * (n - 1)) / n);
    for (const n of [7, 33]) expectRelative(raw('average_hop', cycle(n)), (n + 1) / 4);
    expectRelative(raw('average_hop', cycle(10)), 2.777778, 1e-6);
    for (const n of [10, 64]) expectRelative(raw('average_hop', cycle(n)), (n * n) / (4 * (n - 1)));
  });
  it('diameter: P_N N−1, C_N ⌊N/2⌋, K_N 1, Q_d d, Petersen 2 (standard, common practice)', () => {
    expectRelative(raw('diameter', path(17)), 16);
    expectRelative(raw('diameter', cycle(17)), 8);
    expectRelative(raw('diameter', cycle(18)), 9);
    expectRelative(raw('diameter', complete(9)), 1);
    expectRelative(raw('diameter', hypercube(6)), 6);
    expectRelative(raw('diameter', petersen()), 2);
  });
});

describe('node and link connectivity (docs/METHODS.md §9.5, M; Whitney κ ≤ λ ≤ δ)', () => {
  it('κ: K_N N−1, Q_d d, Petersen 3, C_N 2, K_{m,n} min(m,n); λ(Q4) = 4', () => {
    for (const n of [2, 6, 25]) expectRelative(raw('node_connectivity', complete(n)), n - 1);
    for (const d of [2, 3, 4, 5]) expectRelative(raw('node_connectivity', hypercube(d)), d);
    expectRelative(raw('node_connectivity', petersen()), 3);
    expectRelative(raw('node_connectivity', cycle(12)), 2);
    expectRelative(raw('node_connectivity', completeBipartite(3, 8)), 3);
    expectRelative(raw('link_connectivity', hypercube(4)), 4);
    expectRelative(raw('link_connectivity', petersen()), 3);
    expectRelative(raw('link_connectivity', completeBipartite(3, 8)), 3);
    for (const n of [2, 7]) expectRelative(raw('link_connectivity', complete(n)), n - 1);
  });
  it('paths, stars and trees have κ = λ = 1 (common practice)', () => {
    for (const id of ['node_connectivity', 'link_connectivity']) {
      expectRelative(raw(id, path(9)), 1);
      expectRelative(raw(id, star(9)), 1);
    }
  });
});

describe('bridges and cut nodes (standard facts, common practice)', () => {
  it('P_N has N−1 bridges and N−2 cut nodes; a star N−1 and 1; a cycle none', () => {
    expectRelative(raw('bridges', path(9)), 8);
    expectRelative(raw('cut_nodes', path(9)), 7);
    expectRelative(raw('bridges', star(9)), 8);
    expectRelative(raw('cut_nodes', star(9)), 1);
    expectRelative(raw('bridges', cycle(9)) + 1, 1);
    expectRelative(raw('cut_nodes', cycle(9)) + 1, 1);
  });
});
