// What one evaluation of R costs, in the budget's unit of work (policy/budget.ts: 5e7 units
// are about one second of engine time on one core of the machine the rates were measured on).
// The estimate follows what the kernels do on the surviving graph, not a flat "passes × (N + L)":
// - linear metrics (union–find, component counts): one scan of the design, N + 2L entries;
// - all-pairs by hop count (metrics/kernels/bit-bfs.ts): the survivor build and a breadth-first
//   renumbering, then per component one plain search from its first node, whose eccentricity
//   e decides the rest: e ≥ LONG_GRAPH_ECCENTRICITY → one plain search per source (n_c·(n_c +
//   e_c) visits); otherwise batches of 256 sources (8 words per node; a last one of ≤ 64 takes
//   2 words), each about LEVELS_PER_ECCENTRICITY · (e + 1) level sweeps of its component;
// - all-pairs by weighted distance (Dijkstra) and flow metrics: one plain search per node;
// - spectral metrics (spectralCost), per metric as its solver works, from the survivors' shape
//   alone (no solving): the survivor build and its components (SPECTRAL_BUILD_PASSES); then
//   μ₂ and the effective resistance only when the survivors are connected; dense spectra
//   (DENSE_CUBE · n³) for components up to the metric's dense limit; above it, Lanczos sweeps
//   of the component, more on long components for the extremal values (FIEDLER_PASSES,
//   RADIUS_PASSES, each plus a share per level of the first node's eccentricity, since the
//   gaps at the ends of the spectrum close with the diameter) and a fixed count for the
//   trace estimates (NATURAL_PASSES, RESISTANCE_PASSES); the effective resistance's banded
//   factorisation (BANDED_UNIT · n·(b + 2)², the band b read as the widest breadth-first level).
// Removals matter: a ring or a grid that loses a fifth of its sites falls into short pieces
// and its searches get ten to a hundred times cheaper, so bands and attacks are costed on the
// survivors of their own removal orders (evaluate.ts), not on the intact design.
// The weights were fitted on 2026-12-03 (one core of the 2-core development VM, Node 20, shared,
// load 2–5) to the operations counted by metrics/kernels/work-count.ts and wall time:
//   Barabási–Albert 250–4,000 nodes, G(n, L) 1,000/2,000, 32 × 32 grid, ring of 1,000, and the
//   Topology Zoo's Kdl, Cogentco and Colt (Knight et al., IEEE JSAC 2011), intact and with a
//   fifth of the sites removed. The spectral weights were fitted the same day to the time of
//   single evaluations (intact, 2 %, 10 % and 20 % of the sites removed) on Barabási–Albert
//   250–4,000, the grid, the ring and Kdl. test/bench/budget.bench.ts prints estimate against time. The
//   same machine idle runs the engine about 2× faster than under that load, so the
//   estimate reads high there; the weights sit between the two.

import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import { LONG_GRAPH_ECCENTRICITY, THIN_LEVEL } from '../metrics/kernels/bit-bfs.js';
import { getMetric } from '../metrics/registry.js';
import type { MetricId } from '../metrics/types.js';
import type { RValueSpec } from './types.js';
import { EXTREMAL_DENSE_LIMIT, TRACE_DENSE_LIMIT } from '../metrics/kernels/spectral-survivors.js';
import { NATURAL_DENSE_LIMIT } from '../metrics/natural-connectivity.js';
import { DEFAULT_EXACT_WORK } from '../metrics/effective-resistance.js';
import { samplesSources } from './r-value.js';

/** Units per node or adjacency entry a plain pass touches (a queue search, a scan, a build). */
export const PLAIN_VISIT = 0.35;
/** Units per node or entry a bit-parallel level sweep touches, per 32-bit word of sources. */
export const WORD_VISIT = 0.18;
/** Level sweeps of one batch per level of the first source's eccentricity (+1). */
export const LEVELS_PER_ECCENTRICITY = 1;
/** Share of a long component's levels swept in full beyond a batch's span (fitted on grids of 20–50 a side). */
export const FRONTIER_SHARE = 0.45;
/** Fixed units of one evaluation of an all-pairs metric (scratch resets, histogram). */
export const ALL_PAIRS_OVERHEAD = 2000;
/** Plain passes of every evaluation's structure summary (components, bridges and cut nodes). */
export const STRUCTURE_PASSES = 4;
/** Passes of every spectral evaluation: the simple survivor graph and its components. */
export const SPECTRAL_BUILD_PASSES = 1.3;
/** Units per n³ of a dense symmetric eigenvalue solve (reduction and QL), natural_connectivity at 750–1,000 nodes. */
export const DENSE_CUBE = 0.05;
/** μ₂ by the plain Lanczos recurrence: component sweeps, base, per node and per level of eccentricity. */
export const FIEDLER_PASSES = 120;
export const FIEDLER_PASSES_PER_NODE = 0.06;
export const FIEDLER_PASSES_PER_LEVEL = 0.5;
/** λ₁ by thick-restart Lanczos (with its reorthogonalisation): component sweeps, base and per level. */
export const RADIUS_PASSES = 20;
export const RADIUS_PASSES_PER_LEVEL = 10;
/** natural_connectivity above its dense limit: top eigenpairs and 32–256 quadrature probes, in sweeps. */
export const NATURAL_PASSES = 1500;
/** effective_resistance above its exact limits: 32 probes of up to 120 Lanczos steps, in sweeps. */
export const RESISTANCE_PASSES = 1500;
/** Units per n·(b + 2)² of the banded factorisation and Takahashi's recurrence. */
export const BANDED_UNIT = 0.15;
/** Sweeps of the reverse Cuthill–McKee ordering and the band's set-up before it. */
export const BANDED_PASSES = 10;

/** Hop-count metrics that run the bit-parallel kernel. */
const HOP_METRICS: ReadonlySet<MetricId> = new Set(['efficiency', 'average_hop', 'diameter']);

/** The surviving graph's components, each with its size, adjacency entries and first node's eccentricity. */
export interface SurvivorShape {
  /** Nodes and adjacency entries of the whole design (what a survivor build scans). */
  designEntries: number;
  sizes: number[];
  entries: number[];
  eccentricities: number[];
  /**
   * Nodes in the widest breadth-first level from a far node (the first node's last one, as a
   * Cuthill–McKee ordering starts from a peripheral node): about that ordering's band. Only
   * with `bands`; otherwise from the first node.
   */
  widths: number[];
}

/** Scratch for shapes of one graph (allocated once per graph). */
const scratch = new WeakMap<
  CompactGraph,
  { dist: Int32Array; queue: Int32Array; far: Int32Array; farQueue: Int32Array }
>();

/** Components of the survivors of `mask` (none removed when absent), in the kernel's order. */
export function survivorShape(g: CompactGraph, mask?: Mask, bands = false): SurvivorShape {
  let s = scratch.get(g);
  if (!s)
    scratch.set(
      g,
      (s = {
        dist: new Int32Array(g.n),
        queue: new Int32Array(g.n),
        far: new Int32Array(g.n).fill(-1),
        farQueue: new Int32Array(g.n),
      }),
    );
  const { dist, queue, far, farQueue } = s;
  dist.fill(-1);
  const deadNode = mask?.node;
  const deadLink = mask?.link;
  const { offsets, neighbors, linkOf } = g;
  const out: SurvivorShape = {
    designEntries: g.n + offsets[g.n],
    sizes: [],
    entries: [],
    eccentricities: [],
    widths: [],
  };
  for (let root = 0; root < g.n; root++) {
    if (dist[root] >= 0 || (deadNode && deadNode[root])) continue;
    dist[root] = 0;
    queue[0] = root;
    let tail = 1;
    let entries = 0;
    let ecc = 0;
    let level = 0;
    let inLevel = 0;
    let width = 1;
    for (let head = 0; head < tail; head++) {
      const v = queue[head];
      if (dist[v] !== level) {
        level = dist[v];
        inLevel = 0;
      }
      if (++inLevel > width) width = inLevel;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (w === v || (deadNode && deadNode[w]) || (deadLink && deadLink[linkOf[p]])) continue;
        entries++;
        if (dist[w] >= 0) continue;
        dist[w] = dist[v] + 1;
        if (dist[w] > ecc) ecc = dist[w];
        queue[tail++] = w;
      }
    }
    out.sizes.push(tail);
    out.entries.push(entries);
    out.eccentricities.push(ecc);
    if (bands && tail > 2) {
      // A second search from the last node reached, counting its widest level.
      const start = queue[tail - 1];
      far[start] = 0;
      farQueue[0] = start;
      let farTail = 1;
      level = 0;
      inLevel = 0;
      width = 1;
      for (let head = 0; head < farTail; head++) {
        const v = farQueue[head];
        if (far[v] !== level) {
          level = far[v];
          inLevel = 0;
        }
        if (++inLevel > width) width = inLevel;
        for (let p = offsets[v]; p < offsets[v + 1]; p++) {
          const w = neighbors[p];
          if (far[w] >= 0 || (deadNode && deadNode[w]) || (deadLink && deadLink[linkOf[p]])) continue;
          far[w] = far[v] + 1;
          farQueue[farTail++] = w;
        }
      }
      for (let i = 0; i < farTail; i++) far[farQueue[i]] = -1;
    }
    out.widths.push(width);
  }
  return out;
}

/** Whether costing R needs the survivors' band widths (survivorShape's `bands`). */
export function needsBands(spec: RValueSpec): boolean {
  return spec.metrics.some((m) => m.id === 'effective_resistance');
}

/**
 * Units of one all-pairs hop search from every survivor (bit-bfs.ts), on a shape; with `share`
 * < 1 from that share of them (a source sample, spread over the components as the sites are).
 */
export function hopSearchCost(shape: SurvivorShape, share = 1): number {
  let plain = shape.designEntries;
  let words = 0;
  for (let c = 0; c < shape.sizes.length; c++) {
    const n = shape.sizes[c];
    const sweep = n + shape.entries[c];
    plain += sweep; // renumbering
    if (n < 2) continue;
    // A sample leaves a small component without a source about as often as n · share < 1 says;
    // the kernel searches only components that hold one (n · share of them on average).
    const expected = share < 1 ? n * share : n;
    plain += Math.min(1, expected) * sweep; // the first source's plain search
    // The kernel's own test (bit-bfs.ts): one source at a time only on long, thin components.
    const ecc = shape.eccentricities[c];
    const sources = Math.ceil(Math.max(0, expected - 1));
    if (ecc >= LONG_GRAPH_ECCENTRICITY && n < THIN_LEVEL * (ecc + 1)) {
      plain += sources * sweep;
      continue;
    }
    const levels = LEVELS_PER_ECCENTRICITY * (ecc + 1);
    let left = sources;
    while (left > 0) {
      const width = left > 64 ? Math.min(256, left) : left;
      // All sources of a component are consecutive in breadth-first order, so a batch spans
      // about width · (e + 1) / n levels; on a long component the kernel then sweeps only the
      // frontier on levels where it is under a quarter of the component (long ones: e at least
      // LONG_GRAPH_ECCENTRICITY), which costs about
      // span + FRONTIER_SHARE · (e + 1) full sweeps in all. A sample's sources are spread out.
      const span = share < 1 || ecc < LONG_GRAPH_ECCENTRICITY ? Infinity : (width * (ecc + 1)) / n;
      words += (width > 64 ? 8 : 2) * Math.min(levels, span + FRONTIER_SHARE * (ecc + 1)) * sweep;
      left -= width;
    }
  }
  return Math.ceil(ALL_PAIRS_OVERHEAD + PLAIN_VISIT * plain + WORD_VISIT * words);
}

/** Units of one evaluation of R on the survivors described by `shape`. */
export function rCost(g: CompactGraph, spec: RValueSpec, shape: SurvivorShape): number {
  const scan = passCost(g);
  let total = 0;
  for (const m of spec.metrics) {
    const cost = getMetric(m.id).cost;
    if (HOP_METRICS.has(m.id))
      total += hopSearchCost(shape, m.id === 'efficiency' && samplesSources(g, spec) ? spec.sources! / g.n : 1);
    else if (cost === 'linear') total += scan;
    else if (cost === 'spectral') total += spectralCost(m.id, shape);
    else total += scan * Math.max(1, g.n); // Dijkstra per source, max-flow per node
  }
  return total;
}

/** Units of one evaluation of a spectral metric on the survivors described by `shape` (see the header). */
export function spectralCost(id: MetricId, shape: SurvivorShape): number {
  const sweep = (c: number) => PLAIN_VISIT * (shape.sizes[c] + shape.entries[c]);
  const dense = (n: number) => DENSE_CUBE * n * n * n;
  let total = SPECTRAL_BUILD_PASSES * PLAIN_VISIT * shape.designEntries;
  const comps = shape.sizes.length;
  const connected = comps === 1 && shape.sizes[0] >= 2;
  if (id === 'algebraic_connectivity' || id === 'effective_resistance') {
    if (!connected) return Math.ceil(total);
    const n = shape.sizes[0];
    const ecc = shape.eccentricities[0];
    if (id === 'algebraic_connectivity')
      total +=
        n <= EXTREMAL_DENSE_LIMIT
          ? dense(n)
          : (FIEDLER_PASSES + FIEDLER_PASSES_PER_NODE * n + FIEDLER_PASSES_PER_LEVEL * (ecc + 1)) * sweep(0);
    else {
      const b = shape.widths[0];
      total += BANDED_PASSES * sweep(0);
      total +=
        n <= TRACE_DENSE_LIMIT || n * b * b <= DEFAULT_EXACT_WORK
          ? BANDED_UNIT * n * (b + 2) * (b + 2)
          : RESISTANCE_PASSES * sweep(0);
    }
    return Math.ceil(total);
  }
  // λ₁ skips a component that cannot beat the best so far; its mean degree is a lower bound on
  // its λ₁, so this skips no more than the kernel does.
  let best = 0;
  for (let c = 0; c < comps; c++) {
    const n = shape.sizes[c];
    if (n < 2) continue;
    if (id === 'natural_connectivity') {
      total += n <= NATURAL_DENSE_LIMIT ? dense(n) : NATURAL_PASSES * sweep(c);
      continue;
    }
    if (n - 1 <= best || n === 2) continue;
    best = Math.max(best, shape.entries[c] / n);
    total +=
      n <= EXTREMAL_DENSE_LIMIT
        ? dense(n)
        : (RADIUS_PASSES + RADIUS_PASSES_PER_LEVEL * (shape.eccentricities[c] + 1)) * sweep(c);
  }
  return Math.ceil(total);
}

/**
 * A seeded removal order of `units` elements (hashes of their ids, sorted): half a pass per
 * doubling, fitted on a 20,000-node G(n, L), where it is most of a union–find realization.
 */
export function orderCost(g: CompactGraph, units: number): number {
  return Math.ceil((passCost(g) * Math.log2(Math.max(2, units))) / 2);
}

/** One plain pass over the design, in whole units (rankings, union–find curves, removal orders, linear metrics). */
export function passCost(g: CompactGraph): number {
  return Math.ceil(PLAIN_VISIT * (g.n + g.offsets[g.n]));
}
