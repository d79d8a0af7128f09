// Multi-source bit-parallel breadth-first search (Then et al., "The More the Merrier:
// Efficient Multi-Source Graph Traversal", PVLDB 8(4):449, 2014). Each node carries W
// 32-bit words, one bit per source of the current batch of 32·W sources, so one sweep over
// the CSR advances 32·W searches by one level. The level sweep "pulls": a node's next bits
// are the OR of its neighbours' frontier bits minus the bits it has already seen, and a
// node every source of the batch has reached is skipped.
//
// The output is the hop histogram: hist[d] = number of ordered (source, target) pairs at
// distance d ≥ 1. Efficiency, average hop count and diameter are sums over it.
// Cost per batch: O(levels · (2L + N) · W) word operations; all scratch is allocated once.

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
  const seen = new Uint32Array(Math.max(1, capacity * maxWords));
  let frontier = new Uint32Array(seen.length);
  let next = new Uint32Array(seen.length);
  const done = new Uint8Array(Math.max(1, capacity));
  const full = new Uint32Array(maxWords);
  const acc = new Uint32Array(maxWords);
  const result: HopHistogram = { hist: new Float64Array(capacity + 1), maxDistance: 0 };

  return {
    run(graph, sources, count) {
      const n = graph.n;
      const { offsets, neighbors } = graph;
      const hist = result.hist;
      hist.fill(0, 0, result.maxDistance + 1);
      result.maxDistance = 0;
      const W = wordsFor(count);
      const batch = 32 * W;
      for (let start = 0; start < count; start += batch) {
        const width = Math.min(batch, count - start);
        const used = n * W;
        seen.fill(0, 0, used);
        frontier.fill(0, 0, used);
        done.fill(0, 0, n);
        for (let w = 0; w < W; w++) {
          const bits = width - 32 * w;
          full[w] = bits >= 32 ? 0xffffffff : bits <= 0 ? 0 : ((1 << bits) - 1) >>> 0;
        }
        for (let i = 0; i < width; i++) {
          const at = sources[start + i] * W + (i >>> 5);
          const bit = 1 << (i & 31);
          seen[at] |= bit;
          frontier[at] |= bit;
        }
        for (let d = 1; ; d++) {
          let reached = 0;
          if (W === 1) {
            // The common case for designs of up to 32 nodes per batch, kept branch-light.
            for (let v = 0; v < n; v++) {
              if (done[v]) {
                next[v] = 0;
                continue;
              }
              let a = 0;
              for (let p = offsets[v]; p < offsets[v + 1]; p++) a |= frontier[neighbors[p]];
              const s = seen[v];
              const x = a & ~s;
              next[v] = x;
              if (x !== 0) {
                const t = s | x;
                seen[v] = t;
                reached += popcount32(x);
                if (t >>> 0 === full[0]) done[v] = 1;
              }
            }
          } else {
            for (let v = 0; v < n; v++) {
              const base = v * W;
              if (done[v]) {
                for (let w = 0; w < W; w++) next[base + w] = 0;
                continue;
              }
              acc.fill(0, 0, W);
              for (let p = offsets[v]; p < offsets[v + 1]; p++) {
                const ub = neighbors[p] * W;
                for (let w = 0; w < W; w++) acc[w] |= frontier[ub + w];
              }
              let complete = true;
              for (let w = 0; w < W; w++) {
                const s = seen[base + w];
                const x = acc[w] & ~s;
                next[base + w] = x;
                if (x !== 0) {
                  seen[base + w] = s | x;
                  reached += popcount32(x);
                }
                if ((seen[base + w] >>> 0) !== full[w]) complete = false;
              }
              if (complete) done[v] = 1;
            }
          }
          if (reached === 0) break;
          hist[d] += reached;
          if (d > result.maxDistance) result.maxDistance = d;
          const t = frontier;
          frontier = next;
          next = t;
        }
      }
      return result;
    },
  };
}
