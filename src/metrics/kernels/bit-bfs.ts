// Multi-source bit-parallel breadth-first search (Then et al., "The More the Merrier:
// Efficient Multi-Source Graph Traversal", PVLDB 8(4):449, 2014). Each node carries W
// 32-bit words, one bit per source of the current batch of 32·W sources, so one sweep
// advances 32·W searches by one level. Each level is either
// - a "pull" over all nodes: a node's new bits are the OR of its neighbours' frontier bits
//   minus what it has seen (nodes every source has reached are skipped), or
// - a "push" from the nodes on the frontier only, when their links are few compared with the
//   whole graph (direction-optimising BFS, Beamer, Asanović & Patterson, SC 2012) — this is
//   what keeps long, sparse networks (diameters of 30 and more) from paying a full sweep per
//   level.
// Long, thin graphs (the first source's eccentricity at least LONG_GRAPH_ECCENTRICITY) are
// searched one source at a time with a plain queue instead, which is cheaper there.
// The output is the hop histogram: hist[d] = number of ordered (source, target) pairs at
// distance d ≥ 1. Efficiency, average hop count and diameter are sums over it.
// Cost per batch: O(levels · (2L + N) · W) word operations at worst; scratch allocated once.

import type { LocalGraph } from './subgraph.js';

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

/** From this eccentricity of the first source on, searches run one source at a time. */
export const LONG_GRAPH_ECCENTRICITY = 12;

/** Words per node: enough for the sources, at most 8 (256 sources per sweep). */
function wordsFor(sources: number): number {
  return Math.max(1, Math.min(8, Math.ceil(sources / 32)));
}

/**
 * A histogram kernel for graphs of up to `capacity` nodes. `run(graph, sources, count)`
 * searches from `sources[0..count)` (local indices) and returns the shared histogram.
 */
export function createHopHistogram(capacity: number): {
  run(graph: LocalGraph, sources: Int32Array, count: number): HopHistogram;
} {
  const maxWords = wordsFor(capacity);
  const size = Math.max(1, capacity * maxWords);
  const seen = new Uint32Array(size);
  let frontier = new Uint32Array(size);
  let next = new Uint32Array(size);
  const done = new Uint8Array(Math.max(1, capacity));
  const listed = new Uint8Array(Math.max(1, capacity));
  let active = new Int32Array(Math.max(1, capacity));
  let nextActive = new Int32Array(Math.max(1, capacity));
  const full = new Uint32Array(maxWords);
  const acc = new Uint32Array(maxWords);
  const result: HopHistogram = { hist: new Float64Array(capacity + 1), maxDistance: 0 };
  const dist = new Int32Array(Math.max(1, capacity));
  const queue = new Int32Array(Math.max(1, capacity));

  /** Plain BFS from s, adding its distances to the histogram; returns the eccentricity. */
  function single(graph: LocalGraph, s: number): number {
    const { offsets, neighbors } = graph;
    dist.fill(-1, 0, graph.n);
    dist[s] = 0;
    queue[0] = s;
    let head = 0;
    let tail = 1;
    let ecc = 0;
    const hist = result.hist;
    while (head < tail) {
      const v = queue[head++];
      const dv = dist[v] + 1;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (dist[w] >= 0) continue;
        dist[w] = dv;
        queue[tail++] = w;
        hist[dv]++;
        if (dv > ecc) ecc = dv;
      }
    }
    if (ecc > result.maxDistance) result.maxDistance = ecc;
    return ecc;
  }

  return {
    run(graph, sources, count) {
      const n = graph.n;
      const { offsets, neighbors } = graph;
      const hist = result.hist;
      hist.fill(0, 0, result.maxDistance + 1);
      result.maxDistance = 0;
      if (count === 0) return result;
      // A level sweep costs the whole graph; on long, thin graphs (many levels) one plain BFS
      // per source is cheaper. The first source's eccentricity decides (the threshold is a
      // rough crossover seen on zoo networks; timings on a shared machine were noisy).
      const ecc = single(graph, sources[0]);
      if (ecc >= LONG_GRAPH_ECCENTRICITY) {
        for (let i = 1; i < count; i++) single(graph, sources[i]);
        return result;
      }
      hist.fill(0, 0, result.maxDistance + 1);
      result.maxDistance = 0;
      const W = wordsFor(count);
      const batch = 32 * W;
      const sweepWork = n + offsets[n];
      for (let start = 0; start < count; start += batch) {
        const width = Math.min(batch, count - start);
        const used = n * W;
        seen.fill(0, 0, used);
        frontier.fill(0, 0, used);
        next.fill(0, 0, used);
        done.fill(0, 0, n);
        for (let w = 0; w < W; w++) {
          const bits = width - 32 * w;
          full[w] = bits >= 32 ? 0xffffffff : bits <= 0 ? 0 : ((1 << bits) - 1) >>> 0;
        }
        let activeCount = 0;
        for (let i = 0; i < width; i++) {
          const s = sources[start + i];
          const at = s * W + (i >>> 5);
          const bit = 1 << (i & 31);
          seen[at] |= bit;
          frontier[at] |= bit;
          if (!listed[s]) {
            listed[s] = 1;
            active[activeCount++] = s;
          }
        }
        for (let i = 0; i < activeCount; i++) listed[active[i]] = 0;
        for (let d = 1; activeCount > 0; d++) {
          let frontierWork = 0;
          for (let i = 0; i < activeCount; i++) frontierWork += offsets[active[i] + 1] - offsets[active[i]];
          let reached = 0;
          let nextCount = 0;
          if (4 * frontierWork < sweepWork) {
            // Push: OR each frontier node's bits into its neighbours.
            for (let i = 0; i < activeCount; i++) {
              const v = active[i];
              const vb = v * W;
              for (let p = offsets[v]; p < offsets[v + 1]; p++) {
                const u = neighbors[p];
                if (done[u]) continue;
                const ub = u * W;
                let any = 0;
                for (let w = 0; w < W; w++) {
                  const x = frontier[vb + w] & ~seen[ub + w];
                  next[ub + w] |= x;
                  any |= x;
                }
                if (any !== 0 && !listed[u]) {
                  listed[u] = 1;
                  nextActive[nextCount++] = u;
                }
              }
            }
            for (let i = 0; i < nextCount; i++) {
              const u = nextActive[i];
              listed[u] = 0;
              const ub = u * W;
              let complete = true;
              for (let w = 0; w < W; w++) {
                const x = next[ub + w];
                reached += popcount32(x);
                const t = (seen[ub + w] | x) >>> 0;
                seen[ub + w] = t;
                if (t !== full[w]) complete = false;
              }
              if (complete) done[u] = 1;
            }
          } else {
            // Pull: every node not yet reached by all sources gathers from its neighbours.
            for (let v = 0; v < n; v++) {
              if (done[v]) continue;
              const base = v * W;
              for (let w = 0; w < W; w++) acc[w] = 0;
              for (let p = offsets[v]; p < offsets[v + 1]; p++) {
                const ub = neighbors[p] * W;
                for (let w = 0; w < W; w++) acc[w] |= frontier[ub + w];
              }
              let any = 0;
              let complete = true;
              for (let w = 0; w < W; w++) {
                const s = seen[base + w];
                const x = acc[w] & ~s;
                next[base + w] = x;
                any |= x;
                const t = (s | x) >>> 0;
                seen[base + w] = t;
                if (t !== full[w]) complete = false;
                if (x !== 0) reached += popcount32(x);
              }
              if (any !== 0) nextActive[nextCount++] = v;
              if (complete) done[v] = 1;
            }
          }
          if (reached > 0) {
            hist[d] += reached;
            if (d > result.maxDistance) result.maxDistance = d;
          }
          // The old frontier becomes the next "next": clear the entries it holds.
          for (let i = 0; i < activeCount; i++) {
            const vb = active[i] * W;
            for (let w = 0; w < W; w++) frontier[vb + w] = 0;
          }
          const f = frontier;
          frontier = next;
          next = f;
          const a = active;
          active = nextActive;
          nextActive = a;
          activeCount = nextCount;
        }
      }
      return result;
    },
  };
}
