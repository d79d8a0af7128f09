// natural_connectivity: λ̄ = ln((1/N') Σ_i e^{λ_i}) over the adjacency eigenvalues of the
// SURVIVING graph (Wu et al., Chin. Phys. Lett. 27:078902, 2010; docs/METHODS.md §3.1), simple
// graph (parallel links merged). Computed in log space per component — λ̄ = ln Σ_c Σ_i
// e^{λ_i} − ln N' with each component's sum scaled by its own e^{λ₁} — so nothing
// overflows for large N. Isolated survivors contribute e⁰ = 1 each. Normalisation:
// λ̄ / λ̄(K_{N0}) with λ̄(K_N) = ln((e^{N−1} + (N−1)e^{−1})/N), the most a graph on N0 nodes
// can reach (Wu et al.: adding a link raises λ̄). An empty survivor set scores 0.
// Solvers: components of up to `denseLimit` nodes (default NATURAL_DENSE_LIMIT = 2,000) get
// the exact dense spectrum, O(N³): about a second at 1,000 nodes and several at 2,000 on one
// core. Larger ones: the top 8 eigenpairs by thick-restart Lanczos, added exactly, and the
// remaining trace Σ e^{λ_i − λ₁} by stochastic Lanczos quadrature on the deflated operator
// (docs/METHODS.md §8.5), Rademacher probes keyed by node id, of up to 40 steps, in blocks of
// 32 until the stated error 2·se(λ̄) is at most STATED_ERROR·λ̄ or MAX_PROBES are used. This is
// an ESTIMATE and says so: `se` is its standard error (the probes' spread over √probes, carried
// to λ̄ by the delta method). Measured against the exact value on 300–2,000-node graphs
// (test/metrics/natural-error.test.ts), se is honest, but reaching 1e-3 would take thousands of
// probes there (Erdős–Rényi spectra leave almost everything to the probes): at those sizes the
// stated error is 2–4e-3, which is why they are solved exactly by default. Use denseLimit:
// Infinity for the exact value at any size.

import { createDenseSpectrum } from './kernels/dense-spectrum.js';
import { createLanczos } from './kernels/lanczos.js';
import { createAdjacencyOperator } from './kernels/operators.js';
import { createTraceEstimator } from './kernels/slq.js';
import { createSpectralSurvivors } from './kernels/spectral-survivors.js';
import type { Metric } from './types.js';

const DEFLATE = 8;
/** Probes per block; blocks continue until the stated error meets STATED_ERROR or MAX_PROBES. */
const PROBES = 32;
const MAX_PROBES = 256;
/** Components up to this many nodes are solved exactly (dense) by default. */
export const NATURAL_DENSE_LIMIT = 2000;
const STEPS = 40;
/** The stated error (2 se, about 95 %) aimed at, relative to λ̄. */
export const STATED_ERROR = 1e-3;

/** λ̄ of the complete graph K_N, in log space. */
export function naturalConnectivityOfComplete(n: number): number {
  if (n <= 1) return 0;
  return n - 1 + Math.log1p((n - 1) * Math.exp(-n)) - Math.log(n);
}

/** ln(e^a + e^b) without overflow. */
function logAdd(a: number, b: number): number {
  if (a === -Infinity) return b;
  if (b === -Infinity) return a;
  const hi = Math.max(a, b);
  return hi + Math.log1p(Math.exp(Math.min(a, b) - hi));
}

export const naturalConnectivity: Metric = {
  id: 'natural_connectivity',
  description: 'Natural connectivity: log of the mean of e^λ over the adjacency spectrum of the surviving graph.',
  normalization: 'λ̄ / λ̄(K_N0), the value of the complete graph on the original node count.',
  cost: 'spectral',
  appliesTo: () => true,
  create(g, options = {}) {
    const limit = Math.min(g.n, options.denseLimit ?? NATURAL_DENSE_LIMIT);
    const spectral = createSpectralSurvivors(g);
    const dense = createDenseSpectrum(limit);
    const big = g.n > limit;
    const lanczos = big ? createLanczos(g.n, DEFLATE) : null;
    const slq = big ? createTraceEstimator(g.n, STEPS) : null;
    const op = createAdjacencyOperator();
    const deflation = big ? new Float64Array(DEFLATE * g.n) : new Float64Array(0);
    const best = naturalConnectivityOfComplete(g.n);
    const relSe = new Float64Array(big ? g.n : 0);
    const logOf = new Float64Array(big ? g.n : 0);
    return (mask) => {
      const local = spectral.survivors(mask);
      if (local.n === 0) return { raw: 0, normalized: 0 };
      const comps = spectral.components(local);
      let logTotal = -Infinity;
      let isolated = 0;
      // Estimated components: log of each one's scaled sum and the se of that sum, relative.
      let estimated = 0;
      for (let c = 0; c < comps.count; c++) {
        const size = comps.start[c + 1] - comps.start[c];
        if (size === 1) {
          isolated++;
          continue;
        }
        const part = spectral.component(local, comps, c);
        let logPart: number;
        if (size <= limit) {
          const d = dense.adjacency(part);
          const top = d[size - 1];
          let s = 0;
          for (let i = 0; i < size; i++) s += Math.exp(d[i] - top);
          logPart = top + Math.log(s);
        } else {
          op.bind(part);
          const k = Math.min(DEFLATE, size);
          const r = lanczos!.solve(op, { which: 'largest', count: k, keys: spectral.keysOf(part) });
          const top = r.values[0];
          let s = 0;
          for (let j = 0; j < r.found; j++) {
            s += Math.exp(r.values[j] - top);
            deflation.set(r.vectors.subarray(j * r.stride, j * r.stride + size), j * size);
          }
          const exact = s;
          // Aim: 2·se(λ̄) ≤ STATED_ERROR·λ̄, with λ̄ of this component as the guide
          // (se(λ̄) = se(sum)/sum by the delta method; the others only dilute it).
          const est = slq!.estimateWithError(op, (x) => Math.exp(x - top), spectral.keysOf(part), deflation, r.found, {
            probes: PROBES,
            maxProbes: MAX_PROBES,
            steps: STEPS,
            tol: 1e-10,
            targetSe: (mean) => {
              const sum = exact + mean;
              const guess = Math.max(1e-6, top + Math.log(sum) - Math.log(local.n));
              return (STATED_ERROR / 2) * guess * sum;
            },
          });
          s += est.mean;
          logPart = top + Math.log(s);
          relSe[estimated] = est.se / s;
          logOf[estimated++] = logPart;
        }
        logTotal = logAdd(logTotal, logPart);
      }
      if (isolated > 0) logTotal = logAdd(logTotal, Math.log(isolated));
      const lambda = Math.max(0, logTotal - Math.log(local.n));
      const normalized = best > 0 ? Math.min(1, lambda / best) : 0;
      if (estimated === 0) return { raw: lambda, normalized };
      // se(λ̄) = se(total)/total: each estimated component's share of the total times its relative se.
      let v = 0;
      for (let i = 0; i < estimated; i++) v += (Math.exp(logOf[i] - logTotal) * relSe[i]) ** 2;
      return { raw: lambda, normalized, se: Math.sqrt(v) };
    };
  },
};
