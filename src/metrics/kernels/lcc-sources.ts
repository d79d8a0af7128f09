// The hop histogram of the largest component: the distance metrics defined on it
// (average_hop, diameter) run the bit-parallel BFS only from its nodes.

import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
import { createHopHistogram, type HopHistogram } from './bit-bfs.js';
import { createSurvivorBuilder, type LocalGraph } from './subgraph.js';
import { createComponentCounter, findRoot } from './union-find.js';

export function createLargestComponentSources(
  g: CompactGraph,
): (mask: Mask, local: LocalGraph) => { sources: Int32Array; count: number } {
  const counter = createComponentCounter(g);
  const sources = new Int32Array(g.n);
  const out = { sources, count: 0 };
  return (mask, local) => {
    const s = counter.run(mask);
    out.count = 0;
    if (s.largestRoot < 0) return out;
    const root = s.largestRoot;
    const parent = counter.uf.parent;
    for (let i = 0; i < local.n; i++) if (findRoot(parent, local.toOriginal[i]) === root) sources[out.count++] = i;
    return out;
  };
}

/** `(mask) → histogram of the largest component`, with `count` its node count. */
export function createLargestComponentHops(g: CompactGraph): (mask: Mask) => { hops: HopHistogram; count: number } {
  const survivors = createSurvivorBuilder(g, true);
  const lcc = createLargestComponentSources(g);
  const bfs = createHopHistogram(g.n);
  const out = { hops: { hist: new Float64Array(1), maxDistance: 0 } as HopHistogram, count: 0 };
  return (mask) => {
    const local = survivors(mask);
    const { sources, count } = lcc(mask, local);
    out.count = count;
    if (count >= 2) out.hops = bfs.run(local, sources, count);
    return out;
  };
}
