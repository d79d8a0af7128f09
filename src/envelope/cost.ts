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
// - spectral metrics: SPECTRAL_PRODUCTS sparse products over the links.
// Removals matter: a ring or a grid that loses a fifth of its sites falls into short pieces
// and its searches get ten to a hundred times cheaper, so bands and attacks are costed on the
// survivors of their own removal orders (evaluate.ts), not on the intact design.
// The weights were fitted on 2026-12-03 (one core of the 2-core development VM, Node 20, shared,
// load 2–5) to the operations counted by metrics/kernels/work-count.ts and wall time:
//   Barabási–Albert 250–4,000 nodes, G(n, L) 1,000/2,000, 32 × 32 grid, ring of 1,000, and the
//   Topology Zoo's Kdl, Cogentco and Colt (Knight et al., IEEE JSAC 2011), intact and with a
//   fifth of the sites removed. test/bench/budget.bench.ts prints estimate against time. The
//   same machine idle runs the engine about 2× faster than under that load, so the
//   estimate reads high there; the weights sit between the two.

import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import { LONG_GRAPH_ECCENTRICITY, THIN_LEVEL } from '../metrics/kernels/bit-bfs.js';
import { getMetric } from '../metrics/registry.js';
import type { MetricId } from '../metrics/types.js';
import type { RValueSpec } from './types.js';
import { samplesSources } from './r-value.js';

/** Units per node or adjacency entry a plain pass touches (a queue search, a scan, a build). */
export const PLAIN_VISIT = 0.35;
/** Units per node or entry a bit-parallel level sweep touches, per 32-bit word of sources. */
export const WORD_VISIT = 0.18;
/** Level sweeps of one batch per level of the first source's eccentricity (+1). */
export const LEVELS_PER_ECCENTRICITY = 1;
/** Fixed units of one evaluation of an all-pairs metric (scratch resets, histogram). */
export const ALL_PAIRS_OVERHEAD = 2000;
/** Plain passes of every evaluation's structure summary (components, bridges and cut nodes). */
export const STRUCTURE_PASSES = 4;
/** Sparse products of a spectral metric's iterative solver, each over every adjacency entry. */
export const SPECTRAL_PRODUCTS = 50;

/** Hop-count metrics that run the bit-parallel kernel. */
const HOP_METRICS: ReadonlySet<MetricId> = new Set(['efficiency', 'average_hop', 'diameter']);

/** The surviving graph's components, each with its size, adjacency entries and first node's eccentricity. */
export interface SurvivorShape {
  /** Nodes and adjacency entries of the whole design (what a survivor build scans). */
  designEntries: number;
  sizes: number[];
  entries: number[];
  eccentricities: number[];
}

/** Scratch for shapes of one graph (allocated once per graph). */
const scratch = new WeakMap<CompactGraph, { dist: Int32Array; queue: Int32Array }>();

/** Components of the survivors of `mask` (none removed when absent), in the kernel's order. */
export function survivorShape(g: CompactGraph, mask?: Mask): SurvivorShape {
  let s = scratch.get(g);
  if (!s) scratch.set(g, (s = { dist: new Int32Array(g.n), queue: new Int32Array(g.n) }));
  const { dist, queue } = s;
  dist.fill(-1);
  const deadNode = mask?.node;
  const deadLink = mask?.link;
  const { offsets, neighbors, linkOf } = g;
  const out: SurvivorShape = { designEntries: g.n + offsets[g.n], sizes: [], entries: [], eccentricities: [] };
  for (let root = 0; root < g.n; root++) {
    if (dist[root] >= 0 || (deadNode && deadNode[root])) continue;
    dist[root] = 0;
    queue[0] = root;
    let tail = 1;
    let entries = 0;
    let ecc = 0;
    for (let head = 0; head < tail; head++) {
      const v = queue[head];
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
  }
  return out;
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
    plain += sweep; // the first source's plain search
    // The kernel's own test (bit-bfs.ts): one source at a time only on long, thin components.
    const ecc = shape.eccentricities[c];
    const sources = share < 1 ? Math.ceil((n - 1) * share) : n - 1;
    if (ecc >= LONG_GRAPH_ECCENTRICITY && n < THIN_LEVEL * (ecc + 1)) {
      plain += sources * sweep;
      continue;
    }
    const levels = LEVELS_PER_ECCENTRICITY * (shape.eccentricities[c] + 1);
    let left = sources;
    while (left > 0) {
      const width = left > 64 ? Math.min(256, left) : left;
      words += (width > 64 ? 8 : 2) * levels * sweep;
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
    else if (cost === 'spectral') total += scan * SPECTRAL_PRODUCTS;
    else total += scan * Math.max(1, g.n); // Dijkstra per source, max-flow per node
  }
  return total;
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
