// The bridge tree and the Eswaran–Tarjan lower bound. Contract every 2-edge-connected piece
// of a design to one vertex: the bridges then form a forest (the bridge tree; a forest when
// the design falls apart). An added link covers the bridges on the forest path between its
// ends' pieces, so each leaf piece needs a new link end in it, and one link serves at most two
// leaves: at least ⌈p/2⌉ links for p leaves, plus one per isolated piece when the design
// must also be joined up. Eswaran & Tarjan (SIAM J. Comput. 5:653–665, 1976) prove that
// ⌈p/2⌉ + q links always suffice when any pair of sites may be joined (forest with more than
// one vertex, p leaves, q isolated vertices). With a restricted candidate list it stays a
// lower bound. The same construction restricted to some bridges (the new ones of a change)
// bounds the links needed to remove just those.

import type { CompactGraph } from '../graph/compact.js';
import { findCutElements } from '../graph/structure.js';
import type { MendBound } from './types.js';

export interface BridgeForest {
  /** Piece of each node: the component left when the chosen bridges are cut. */
  piece: Int32Array;
  pieces: number;
  /** Chosen bridges incident to each piece (its degree in the forest). */
  degree: Int32Array;
}

/** Pieces of the design with the links in `cut` removed (the other links kept), and each piece's forest degree. */
export function bridgeForest(g: CompactGraph, cut: readonly number[]): BridgeForest {
  const isCut = new Uint8Array(g.m);
  for (const e of cut) isCut[e] = 1;
  const piece = new Int32Array(g.n).fill(-1);
  const queue = new Int32Array(g.n);
  let pieces = 0;
  for (let s = 0; s < g.n; s++) {
    if (piece[s] !== -1) continue;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    piece[s] = pieces;
    while (head < tail) {
      const v = queue[head++];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        if (isCut[g.linkOf[p]]) continue;
        const w = g.neighbors[p];
        if (piece[w] !== -1) continue;
        piece[w] = pieces;
        queue[tail++] = w;
      }
    }
    pieces++;
  }
  const degree = new Int32Array(pieces);
  for (const e of cut) {
    degree[piece[g.linkSource[e]]]++;
    degree[piece[g.linkTarget[e]]]++;
  }
  return { piece, pieces, degree };
}

/**
 * The Eswaran–Tarjan bound. `bridges` absent: every bridge of the design, and the design is to
 * become one 2-edge-connected whole (isolated pieces count). Given: only those bridges are to
 * go (isolated pieces do not count: joining components is not asked for).
 */
export function eswaranTarjanBound(g: CompactGraph, bridges?: readonly number[]): MendBound {
  const all = bridges === undefined;
  const cut = bridges ?? findCutElements(g).bridges;
  const f = bridgeForest(g, cut);
  let leaves = 0;
  let isolated = 0;
  for (let i = 0; i < f.pieces; i++) {
    if (f.degree[i] === 1) leaves++;
    else if (f.degree[i] === 0) isolated++;
  }
  if (!all) return { leaves, isolated: 0, links: Math.ceil(leaves / 2) };
  // One piece: already 2-edge-connected (or empty), nothing to add.
  if (f.pieces <= 1) return { leaves: 0, isolated: 0, links: 0 };
  return { leaves, isolated, links: Math.ceil(leaves / 2) + isolated };
}
