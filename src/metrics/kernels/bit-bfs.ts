// Multi-source bit-parallel breadth-first search (Then et al., "The More the Merrier:
// Efficient Multi-Source Graph Traversal", PVLDB 8(4):449, 2014). Hand-written on typed
// arrays because it is the hottest loop of the all-pairs metrics (efficiency, average hop,
// diameter): a library BFS per source costs N·(N + L) visits per evaluation, this costs
// about N/64 · levels · (N + 2L) word operations, and no graph library offers it.
// Each node carries two 32-bit words (JavaScript's bit operations are 32-bit), one bit per
// source of the current batch of 64, so one sweep advances 64 searches by one level. The
// two words are handled side by side, unrolled: a variable word count in the inner loop was
// most of the cost of the earlier version. Each level is either
// - a "pull" over the component's nodes: a node's new bits are the OR of its neighbours'
//   frontier bits minus what it has seen (nodes every source has reached are skipped), or
// - a "push" from the nodes on the frontier only, when their links are few compared with the
//   component (direction-optimising BFS, Beamer, Asanović & Patterson, SC 2012) — this keeps
//   long, sparse networks from paying a full sweep per level.
// Before searching, the graph is renumbered in breadth-first order one component after the
// other, and the sources are grouped by component: a batch then sweeps only its own
// component's contiguous range (a fragmented survivor no longer pays for the other pieces),
// and neighbours sit close in memory.
// Long, thin components (the first source's eccentricity at least LONG_GRAPH_ECCENTRICITY)
// are searched one source at a time with a plain queue instead, which is cheaper there.
// Output: the hop histogram hist[d] = ordered (source, target) pairs at distance d ≥ 1
// (efficiency, average hop count and diameter are sums over it) and, on request, each
// source's Σ_t 1/d(s, t) (sampled-source estimators need the per-source terms for their
// variance); those come from bit-sliced counters of the newly reached bits per level.
// Scratch is allocated once per capacity.

import type { LocalGraph } from './subgraph.js';
import { kernelWork } from './work-count.js';

/** Population count of a 32-bit word (Hacker's Delight, §5-1). */
export function popcount32(x: number): number {
  x -= (x >>> 1) & 0x55555555;
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  x = (x + (x >>> 4)) & 0x0f0f0f0f;
  return Math.imul(x, 0x01010101) >>> 24;
}

export interface HopHistogram {
  /** hist[d] for d = 1..maxDistance (index 0 unused). */
  readonly hist: Float64Array;
  /** Largest distance seen (0 when no pair is connected). */
  maxDistance: number;
}

/**
 * Searches run one source at a time in a component where the first source's eccentricity is
 * at least LONG_GRAPH_ECCENTRICITY and its levels are thin: fewer than THIN_LEVEL nodes each
 * on average (component size < THIN_LEVEL · (eccentricity + 1)). Measured crossovers: rings
 * and 10×100 grids favour one source at a time, a 30×30 grid (eccentricity 58) and
 * Barabási–Albert graphs with 60 % of their links cut (eccentricity 19) favour the batches,
 * by 2.5× and 13× — eccentricity alone was the wrong test.
 */
export const LONG_GRAPH_ECCENTRICITY = 12;
export const THIN_LEVEL = 12;

/** Bit planes of the per-source counters: counts up to 2^PLANES − 1 targets per level. */
const PLANES = 24;

export interface HopKernel {
  /**
   * Search from `sources[0..count)` (local indices of `graph`) and return the shared
   * histogram. With `perSource` (length ≥ count), perSource[i] receives Σ_t 1/d(sources[i], t).
   */
  run(graph: LocalGraph, sources: Int32Array, count: number, perSource?: Float64Array): HopHistogram;
}

/** A histogram kernel for graphs of up to `capacity` nodes. */
export function createHopHistogram(capacity: number, longEccentricity = LONG_GRAPH_ECCENTRICITY): HopKernel {
  const cap = Math.max(1, capacity);
  const k = new BfsScratch(cap, longEccentricity);
  return { run: (graph, sources, count, perSource) => k.run(graph, sources, count, perSource) };
}

class BfsScratch {
  // Renumbered graph (breadth-first, component by component).
  readonly newOf: Int32Array;
  readonly order: Int32Array;
  readonly compStart: Int32Array;
  readonly compOf: Int32Array;
  readonly ro: Int32Array;
  rn: Int32Array;
  // Sources grouped by component.
  readonly srcSorted: Int32Array;
  readonly srcIndex: Int32Array;
  readonly compSrcStart: Int32Array;
  // Two words per node.
  readonly seen: Uint32Array;
  frontier: Uint32Array;
  next: Uint32Array;
  readonly done: Uint8Array;
  readonly listed: Uint8Array;
  active: Int32Array;
  nextActive: Int32Array;
  readonly dist: Int32Array;
  readonly queue: Int32Array;
  readonly planes = new Uint32Array(8 * PLANES);
  readonly full = new Uint32Array(8);
  readonly result: HopHistogram;

  constructor(
    cap: number,
    private readonly longEccentricity: number,
  ) {
    this.newOf = new Int32Array(cap);
    this.order = new Int32Array(cap);
    this.compStart = new Int32Array(cap + 1);
    this.compOf = new Int32Array(cap);
    this.ro = new Int32Array(cap + 1);
    this.rn = new Int32Array(16);
    this.srcSorted = new Int32Array(cap);
    this.srcIndex = new Int32Array(cap);
    this.compSrcStart = new Int32Array(cap + 1);
    this.seen = new Uint32Array(8 * cap);
    this.frontier = new Uint32Array(8 * cap);
    this.next = new Uint32Array(8 * cap);
    this.done = new Uint8Array(cap);
    this.listed = new Uint8Array(cap);
    this.active = new Int32Array(cap);
    this.nextActive = new Int32Array(cap);
    this.dist = new Int32Array(cap).fill(-1);
    this.queue = new Int32Array(cap);
    this.result = { hist: new Float64Array(cap + 1), maxDistance: 0 };
  }

  run(graph: LocalGraph, sources: Int32Array, count: number, perSource?: Float64Array): HopHistogram {
    const result = this.result;
    result.hist.fill(0, 0, result.maxDistance + 1);
    result.maxDistance = 0;
    if (perSource) perSource.fill(0, 0, count);
    if (count === 0 || graph.n === 0) return result;
    const comps = this.renumber(graph);
    this.groupSources(sources, count, comps);
    for (let c = 0; c < comps; c++) {
      const s0 = this.compSrcStart[c];
      const s1 = this.compSrcStart[c + 1];
      if (s0 === s1) continue;
      const lo = this.compStart[c];
      const hi = this.compStart[c + 1];
      if (hi - lo < 2) continue;
      // A level sweep costs the whole component; on long, thin ones (many levels of few
      // nodes) one plain BFS per source is cheaper. The first source's search decides.
      const ecc = this.single(this.srcSorted[s0], perSource, this.srcIndex[s0]);
      if (ecc >= this.longEccentricity && hi - lo < THIN_LEVEL * (ecc + 1)) {
        for (let i = s0 + 1; i < s1; i++) this.single(this.srcSorted[i], perSource, this.srcIndex[i]);
        continue;
      }
      // The first source is done; the batches take the rest.
      // Wide batches (256 sources, eight words per node) load each neighbour index once for
      // eight words; narrow ones (64) waste no words on a few sources.
      for (let b = s0 + 1; b < s1;) {
        const left = s1 - b;
        if (left > 64) {
          const width = Math.min(256, left);
          this.batch8(b, width, lo, hi, perSource);
          b += width;
        } else {
          this.batch(b, left, lo, hi, perSource);
          b += left;
        }
      }
    }
    return result;
  }

  /** Breadth-first renumbering, component by component; returns the component count. */
  private renumber(g: LocalGraph): number {
    const n = g.n;
    const { offsets, neighbors } = g;
    const newOf = this.newOf;
    const order = this.order;
    newOf.fill(-1, 0, n);
    let tail = 0;
    let c = 0;
    for (let s = 0; s < n; s++) {
      if (newOf[s] >= 0) continue;
      this.compStart[c] = tail;
      newOf[s] = tail;
      order[tail++] = s;
      for (let head = this.compStart[c]; head < tail; head++) {
        const v = order[head];
        for (let p = offsets[v]; p < offsets[v + 1]; p++) {
          const w = neighbors[p];
          if (newOf[w] < 0) {
            newOf[w] = tail;
            order[tail++] = w;
          }
        }
      }
      for (let i = this.compStart[c]; i < tail; i++) this.compOf[i] = c;
      c++;
    }
    this.compStart[c] = tail;
    const entries = offsets[n];
    if (this.rn.length < entries) this.rn = new Int32Array(Math.max(entries, 2 * this.rn.length));
    const rn = this.rn;
    const ro = this.ro;
    let k = 0;
    for (let i = 0; i < n; i++) {
      ro[i] = k;
      const v = order[i];
      for (let p = offsets[v]; p < offsets[v + 1]; p++) rn[k++] = newOf[neighbors[p]];
    }
    ro[n] = k;
    kernelWork.visits += n + k;
    return c;
  }

  /** Sources by component (counting sort), renumbered, each with its position in the input. */
  private groupSources(sources: Int32Array, count: number, comps: number): void {
    const start = this.compSrcStart;
    start.fill(0, 0, comps + 1);
    for (let i = 0; i < count; i++) start[this.compOf[this.newOf[sources[i]]] + 1]++;
    for (let c = 0; c < comps; c++) start[c + 1] += start[c];
    // Fill using compStart-like cursors kept in `queue` (free at this point).
    const cursor = this.queue;
    for (let c = 0; c < comps; c++) cursor[c] = start[c];
    for (let i = 0; i < count; i++) {
      const v = this.newOf[sources[i]];
      const at = cursor[this.compOf[v]]++;
      this.srcSorted[at] = v;
      this.srcIndex[at] = i;
    }
  }

  /** Plain BFS from s (renumbered), adding its distances; returns the eccentricity. */
  private single(s: number, perSource: Float64Array | undefined, index: number): number {
    const ro = this.ro;
    const rn = this.rn;
    const dist = this.dist;
    const queue = this.queue;
    const hist = this.result.hist;
    dist[s] = 0;
    queue[0] = s;
    let head = 0;
    let tail = 1;
    let ecc = 0;
    let inv = 0;
    let scanned = 0;
    while (head < tail) {
      const v = queue[head++];
      const dv = dist[v] + 1;
      scanned += ro[v + 1] - ro[v];
      for (let p = ro[v]; p < ro[v + 1]; p++) {
        const w = rn[p];
        if (dist[w] >= 0) continue;
        dist[w] = dv;
        queue[tail++] = w;
        hist[dv]++;
        inv += 1 / dv;
        if (dv > ecc) ecc = dv;
      }
    }
    for (let i = 0; i < tail; i++) dist[queue[i]] = -1;
    kernelWork.visits += tail + scanned;
    if (perSource) perSource[index] = inv;
    if (ecc > this.result.maxDistance) this.result.maxDistance = ecc;
    return ecc;
  }

  /** One batch of up to 64 sources (srcSorted[from .. from+width)) in the node range [lo, hi). */
  private batch(from: number, width: number, lo: number, hi: number, perSource: Float64Array | undefined): void {
    const ro = this.ro;
    const rn = this.rn;
    const seen = this.seen;
    const done = this.done;
    const listed = this.listed;
    const hist = this.result.hist;
    const planes = this.planes;
    let frontier = this.frontier;
    let next = this.next;
    let active = this.active;
    let nextActive = this.nextActive;
    const f0 = width >= 32 ? 0xffffffff : ((1 << width) - 1) >>> 0;
    const f1 = width >= 64 ? 0xffffffff : width <= 32 ? 0 : ((1 << (width - 32)) - 1) >>> 0;
    seen.fill(0, 2 * lo, 2 * hi);
    frontier.fill(0, 2 * lo, 2 * hi);
    next.fill(0, 2 * lo, 2 * hi);
    done.fill(0, lo, hi);
    let activeCount = 0;
    for (let i = 0; i < width; i++) {
      const s = this.srcSorted[from + i];
      const at = 2 * s + (i >>> 5);
      const bit = 1 << (i & 31);
      seen[at] |= bit;
      frontier[at] |= bit;
      if (!listed[s]) {
        listed[s] = 1;
        active[activeCount++] = s;
      }
    }
    for (let i = 0; i < activeCount; i++) listed[active[i]] = 0;
    const sweepWork = hi - lo + (ro[hi] - ro[lo]);
    const counting = perSource !== undefined;
    for (let d = 1; activeCount > 0; d++) {
      let frontierWork = 0;
      for (let i = 0; i < activeCount; i++) frontierWork += ro[active[i] + 1] - ro[active[i]];
      let reached = 0;
      let nextCount = 0;
      if (counting) planes.fill(0);
      kernelWork.wordVisits += 2 * (4 * frontierWork < sweepWork ? activeCount + frontierWork : sweepWork);
      if (4 * frontierWork < sweepWork) {
        // Push: OR each frontier node's bits into its neighbours.
        for (let i = 0; i < activeCount; i++) {
          const v = active[i];
          const a0 = frontier[2 * v];
          const a1 = frontier[2 * v + 1];
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = rn[p];
            if (done[u]) continue;
            const x0 = a0 & ~seen[2 * u];
            const x1 = a1 & ~seen[2 * u + 1];
            if ((x0 | x1) === 0) continue;
            next[2 * u] |= x0;
            next[2 * u + 1] |= x1;
            if (!listed[u]) {
              listed[u] = 1;
              nextActive[nextCount++] = u;
            }
          }
        }
        for (let i = 0; i < nextCount; i++) {
          const u = nextActive[i];
          listed[u] = 0;
          const x0 = next[2 * u];
          const x1 = next[2 * u + 1];
          reached += popcount32(x0) + popcount32(x1);
          if (counting) addBits(planes, x0, x1);
          const t0 = (seen[2 * u] | x0) >>> 0;
          const t1 = (seen[2 * u + 1] | x1) >>> 0;
          seen[2 * u] = t0;
          seen[2 * u + 1] = t1;
          if (t0 === f0 && t1 === f1) done[u] = 1;
        }
      } else {
        // Pull: every node of the range not yet reached by all sources gathers from its neighbours.
        for (let v = lo; v < hi; v++) {
          if (done[v]) continue;
          let a0 = 0;
          let a1 = 0;
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = 2 * rn[p];
            a0 |= frontier[u];
            a1 |= frontier[u + 1];
          }
          const s0 = seen[2 * v];
          const s1 = seen[2 * v + 1];
          const x0 = a0 & ~s0;
          const x1 = a1 & ~s1;
          next[2 * v] = x0;
          next[2 * v + 1] = x1;
          if ((x0 | x1) === 0) continue;
          const t0 = (s0 | x0) >>> 0;
          const t1 = (s1 | x1) >>> 0;
          seen[2 * v] = t0;
          seen[2 * v + 1] = t1;
          reached += popcount32(x0) + popcount32(x1);
          if (counting) addBits(planes, x0, x1);
          nextActive[nextCount++] = v;
          if (t0 === f0 && t1 === f1) done[v] = 1;
        }
      }
      if (reached > 0) {
        hist[d] += reached;
        if (d > this.result.maxDistance) this.result.maxDistance = d;
        if (counting) this.drainPlanes(perSource, from, width, 1 / d, 2);
      }
      // The old frontier becomes the next "next": clear the entries it holds.
      for (let i = 0; i < activeCount; i++) {
        const v = active[i];
        frontier[2 * v] = 0;
        frontier[2 * v + 1] = 0;
      }
      const f = frontier;
      frontier = next;
      next = f;
      const a = active;
      active = nextActive;
      nextActive = a;
      activeCount = nextCount;
    }
    // Leave the buffers as the next batch expects them (the swaps may have exchanged them).
    this.frontier = frontier;
    this.next = next;
    this.active = active;
    this.nextActive = nextActive;
  }

  /** One batch of up to 256 sources, eight words per node, unrolled (see batch()). */
  private batch8(from: number, width: number, lo: number, hi: number, perSource: Float64Array | undefined): void {
    const ro = this.ro;
    const rn = this.rn;
    const seen = this.seen;
    const done = this.done;
    const listed = this.listed;
    const hist = this.result.hist;
    const planes = this.planes;
    const full = this.full;
    let frontier = this.frontier;
    let next = this.next;
    let active = this.active;
    let nextActive = this.nextActive;
    for (let w = 0; w < 8; w++) {
      const bits = width - 32 * w;
      full[w] = bits >= 32 ? 0xffffffff : bits <= 0 ? 0 : ((1 << bits) - 1) >>> 0;
    }
    const f0 = full[0],
      f1 = full[1],
      f2 = full[2],
      f3 = full[3],
      f4 = full[4],
      f5 = full[5],
      f6 = full[6],
      f7 = full[7];
    seen.fill(0, 8 * lo, 8 * hi);
    frontier.fill(0, 8 * lo, 8 * hi);
    next.fill(0, 8 * lo, 8 * hi);
    done.fill(0, lo, hi);
    let activeCount = 0;
    for (let i = 0; i < width; i++) {
      const s = this.srcSorted[from + i];
      const at = 8 * s + (i >>> 5);
      const bit = 1 << (i & 31);
      seen[at] |= bit;
      frontier[at] |= bit;
      if (!listed[s]) {
        listed[s] = 1;
        active[activeCount++] = s;
      }
    }
    for (let i = 0; i < activeCount; i++) listed[active[i]] = 0;
    const sweepWork = hi - lo + (ro[hi] - ro[lo]);
    const counting = perSource !== undefined;
    for (let d = 1; activeCount > 0; d++) {
      let frontierWork = 0;
      for (let i = 0; i < activeCount; i++) frontierWork += ro[active[i] + 1] - ro[active[i]];
      let reached = 0;
      let nextCount = 0;
      if (counting) planes.fill(0);
      kernelWork.wordVisits += 8 * (4 * frontierWork < sweepWork ? activeCount + frontierWork : sweepWork);
      if (4 * frontierWork < sweepWork) {
        for (let i = 0; i < activeCount; i++) {
          const v = active[i];
          const vb = 8 * v;
          const a0 = frontier[vb + 0];
          const a1 = frontier[vb + 1];
          const a2 = frontier[vb + 2];
          const a3 = frontier[vb + 3];
          const a4 = frontier[vb + 4];
          const a5 = frontier[vb + 5];
          const a6 = frontier[vb + 6];
          const a7 = frontier[vb + 7];
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = rn[p];
            if (done[u]) continue;
            const ub = 8 * u;
            const x0 = a0 & ~seen[ub + 0];
            const x1 = a1 & ~seen[ub + 1];
            const x2 = a2 & ~seen[ub + 2];
            const x3 = a3 & ~seen[ub + 3];
            const x4 = a4 & ~seen[ub + 4];
            const x5 = a5 & ~seen[ub + 5];
            const x6 = a6 & ~seen[ub + 6];
            const x7 = a7 & ~seen[ub + 7];
            if ((x0 | x1 | x2 | x3 | x4 | x5 | x6 | x7) === 0) continue;
            next[ub + 0] |= x0;
            next[ub + 1] |= x1;
            next[ub + 2] |= x2;
            next[ub + 3] |= x3;
            next[ub + 4] |= x4;
            next[ub + 5] |= x5;
            next[ub + 6] |= x6;
            next[ub + 7] |= x7;
            if (!listed[u]) {
              listed[u] = 1;
              nextActive[nextCount++] = u;
            }
          }
        }
        for (let i = 0; i < nextCount; i++) {
          const u = nextActive[i];
          listed[u] = 0;
          const ub = 8 * u;
          let complete = true;
          for (let w = 0; w < 8; w++) {
            const x = next[ub + w];
            if (x === 0) {
              if (seen[ub + w] !== full[w]) complete = false;
              continue;
            }
            reached += popcount32(x);
            const t = (seen[ub + w] | x) >>> 0;
            seen[ub + w] = t;
            if (t !== full[w]) complete = false;
          }
          if (counting) addBits8(planes, next, ub);
          if (complete) done[u] = 1;
        }
      } else {
        for (let v = lo; v < hi; v++) {
          if (done[v]) continue;
          let a0 = 0,
            a1 = 0,
            a2 = 0,
            a3 = 0,
            a4 = 0,
            a5 = 0,
            a6 = 0,
            a7 = 0;
          for (let p = ro[v]; p < ro[v + 1]; p++) {
            const u = 8 * rn[p];
            a0 |= frontier[u + 0];
            a1 |= frontier[u + 1];
            a2 |= frontier[u + 2];
            a3 |= frontier[u + 3];
            a4 |= frontier[u + 4];
            a5 |= frontier[u + 5];
            a6 |= frontier[u + 6];
            a7 |= frontier[u + 7];
          }
          const vb = 8 * v;
          const x0 = a0 & ~seen[vb + 0];
          const x1 = a1 & ~seen[vb + 1];
          const x2 = a2 & ~seen[vb + 2];
          const x3 = a3 & ~seen[vb + 3];
          const x4 = a4 & ~seen[vb + 4];
          const x5 = a5 & ~seen[vb + 5];
          const x6 = a6 & ~seen[vb + 6];
          const x7 = a7 & ~seen[vb + 7];
          next[vb + 0] = x0;
          next[vb + 1] = x1;
          next[vb + 2] = x2;
          next[vb + 3] = x3;
          next[vb + 4] = x4;
          next[vb + 5] = x5;
          next[vb + 6] = x6;
          next[vb + 7] = x7;
          if ((x0 | x1 | x2 | x3 | x4 | x5 | x6 | x7) === 0) continue;
          const t0 = (seen[vb + 0] | x0) >>> 0;
          const t1 = (seen[vb + 1] | x1) >>> 0;
          const t2 = (seen[vb + 2] | x2) >>> 0;
          const t3 = (seen[vb + 3] | x3) >>> 0;
          const t4 = (seen[vb + 4] | x4) >>> 0;
          const t5 = (seen[vb + 5] | x5) >>> 0;
          const t6 = (seen[vb + 6] | x6) >>> 0;
          const t7 = (seen[vb + 7] | x7) >>> 0;
          seen[vb + 0] = t0;
          seen[vb + 1] = t1;
          seen[vb + 2] = t2;
          seen[vb + 3] = t3;
          seen[vb + 4] = t4;
          seen[vb + 5] = t5;
          seen[vb + 6] = t6;
          seen[vb + 7] = t7;
          reached +=
            popcount32(x0) +
            popcount32(x1) +
            popcount32(x2) +
            popcount32(x3) +
            popcount32(x4) +
            popcount32(x5) +
            popcount32(x6) +
            popcount32(x7);
          if (counting) addBits8(planes, next, vb);
          nextActive[nextCount++] = v;
          if (t0 === f0 && t1 === f1 && t2 === f2 && t3 === f3 && t4 === f4 && t5 === f5 && t6 === f6 && t7 === f7)
            done[v] = 1;
        }
      }
      if (reached > 0) {
        hist[d] += reached;
        if (d > this.result.maxDistance) this.result.maxDistance = d;
        if (counting) this.drainPlanes(perSource, from, width, 1 / d, 8);
      }
      for (let i = 0; i < activeCount; i++) {
        const vb = 8 * active[i];
        for (let w = 0; w < 8; w++) frontier[vb + w] = 0;
      }
      const f = frontier;
      frontier = next;
      next = f;
      const a = active;
      active = nextActive;
      nextActive = a;
      activeCount = nextCount;
    }
    this.frontier = frontier;
    this.next = next;
    this.active = active;
    this.nextActive = nextActive;
  }

  /** Per-source counts of this level (bit-sliced) → perSource += count / d. */
  private drainPlanes(perSource: Float64Array, from: number, width: number, inv: number, words: number): void {
    const planes = this.planes;
    for (let i = 0; i < width; i++) {
      const word = i >>> 5;
      const bit = i & 31;
      let c = 0;
      for (let p = 0; p < PLANES; p++) c += ((planes[words * p + word] >>> bit) & 1) * (1 << p);
      if (c > 0) perSource[this.srcIndex[from + i]] += c * inv;
    }
  }
}

/** addBits for the eight words at next[at ..]. */
function addBits8(planes: Uint32Array, next: Uint32Array, at: number): void {
  for (let w = 0; w < 8; w++) {
    let c = next[at + w];
    for (let p = 0; p < PLANES && c !== 0; p++) {
      const q = planes[8 * p + w];
      planes[8 * p + w] = q ^ c;
      c &= q;
    }
  }
}

/** Add one to the bit-sliced counter of every set bit of (x0, x1): a ripple-carry increment. */
function addBits(planes: Uint32Array, x0: number, x1: number): void {
  let c0 = x0;
  let c1 = x1;
  for (let p = 0; p < PLANES && (c0 | c1) !== 0; p++) {
    const q0 = planes[2 * p];
    const q1 = planes[2 * p + 1];
    planes[2 * p] = q0 ^ c0;
    planes[2 * p + 1] = q1 ^ c1;
    c0 &= q0;
    c1 &= q1;
  }
}
