// The structural part of mending: the fewest candidate links, then the shortest (or cheapest)
// in total, after which none of the given bridges and cut nodes is one any more. A depth-first
// branch and bound with iterative deepening on the number of links:
// - lower bound of a partial set: ⌈leaves / 2⌉ of the forest the remaining target bridges
//   form (Eswaran & Tarjan 1976, see bridge-tree.ts), 1 while only target cut nodes remain;
// - branching: a leaf piece of that forest must receive a new link end, so the search
//   branches on the candidates with exactly one end in the leaf piece with the fewest such
//   candidates (and the other end in the same tree); with no target bridge left, on the
//   candidates joining two of the parts a remaining target cut node separates;
// - children in order of bridges covered, then Ghosh–Boyd score (fiedler.ts), then price;
//   at most BRANCH_WIDTH children per state and MAX_EXPANSIONS states in all, so the work is
//   bounded. A set whose size equals the bound at the root is the smallest possible; when a
//   limit cut the search, a larger result is only the smallest found, and says so.
// Pure and deterministic: ties go to the lower candidate index.

import type { CompactGraph } from '../graph/compact.js';
import { createMask } from '../graph/mask.js';
import { findComponents, findCutElements } from '../graph/structure.js';
import { withExtraLinks } from './apply.js';
import { bridgeForest } from './bridge-tree.js';

export const BRANCH_WIDTH = 8;
export const MAX_EXPANSIONS = 3000;
/** Element visits the search may spend in all (each state costs one pass over the design). */
export const MAX_VISITS = 5e7;

export interface CoverProblem {
  g: CompactGraph;
  /** Candidate links as node index pairs. */
  pairs: readonly (readonly [number, number])[];
  /** Price of each candidate (km, cost, or 1 per link). */
  price: readonly number[];
  /** Secondary order (higher first), e.g. the Ghosh–Boyd score. */
  score: readonly number[];
  /** Link indices of g that must stop being bridges. */
  bridges: readonly number[];
  /** Node indices of g that must stop being cut nodes. */
  cutNodes: readonly number[];
  maxLinks: number;
  /** How many of the best sets of the smallest size to return. */
  keep: number;
}

export interface CoverResult {
  /** Candidate index sets, ascending within each; best (lowest price) first. */
  sets: number[][];
  /** ⌈leaves/2⌉ of the target bridges at the start (0 when only cut nodes are targets, 1 if any). */
  lowerBound: number;
  /** True when the size of the sets is proven the smallest (it meets the bound, or the search below it was complete). */
  minimal: boolean;
  /** Set when the search stopped at a limit. */
  truncated: boolean;
  expansions: number;
  /** Why nothing was found, when nothing was. */
  reason?: string;
}

interface Residual {
  bridges: number[];
  cutNodes: number[];
  bound: number;
  g: CompactGraph;
}

export function solveCover(p: CoverProblem): CoverResult {
  const maxExpansions = Math.max(20, Math.min(MAX_EXPANSIONS, Math.floor(MAX_VISITS / Math.max(1, p.g.n + p.g.m))));
  // Candidates by end node, so a leaf's candidates are found without a pass over all of them.
  const byNode: number[][] = Array.from({ length: p.g.n }, () => []);
  p.pairs.forEach(([a, b], c) => {
    byNode[a].push(c);
    if (b !== a) byNode[b].push(c);
  });
  let expansions = 0;
  let truncated = false;
  let incompleteBelow = false;

  const residual = (set: readonly number[]): Residual => {
    expansions++;
    const g = withExtraLinks(
      p.g,
      set.map((c) => p.pairs[c]),
    );
    const cuts = findCutElements(g);
    const isBridge = new Set(cuts.bridges);
    const isCut = new Set(cuts.cutNodes);
    const bridges = p.bridges.filter((e) => isBridge.has(e));
    const cutNodes = p.cutNodes.filter((v) => isCut.has(v));
    let bound = 0;
    if (bridges.length > 0) {
      const f = bridgeForest(g, bridges);
      let leaves = 0;
      for (let i = 0; i < f.pieces; i++) if (f.degree[i] === 1) leaves++;
      bound = Math.ceil(leaves / 2);
    } else if (cutNodes.length > 0) bound = 1;
    return { bridges, cutNodes, bound, g };
  };

  /** The children of a state, best first, and whether any were cut off by the width. */
  const children = (set: readonly number[], r: Residual): { list: number[]; cut: boolean } => {
    const used = new Set(set);
    const order = (cands: number[], cover: (c: number) => number) =>
      cands.sort((a, b) => cover(b) - cover(a) || p.score[b] - p.score[a] || p.price[a] - p.price[b] || a - b);
    if (r.bridges.length > 0) {
      const f = bridgeForest(r.g, r.bridges);
      // The forest of pieces: adjacency through the remaining target bridges.
      const adj: number[][] = Array.from({ length: f.pieces }, () => []);
      for (const e of r.bridges) {
        const a = f.piece[r.g.linkSource[e]];
        const b = f.piece[r.g.linkTarget[e]];
        adj[a].push(b);
        adj[b].push(a);
      }
      // Nodes of each leaf piece; the leaf with the fewest useful candidates is branched on.
      const members = new Map<number, number[]>();
      for (let v = 0; v < r.g.n; v++) {
        const pc = f.piece[v];
        if (f.degree[pc] === 1) (members.get(pc) ?? members.set(pc, []).get(pc)!).push(v);
      }
      const treeOf = (leaf: number) => {
        const dist = new Int32Array(f.pieces).fill(-1);
        const queue = [leaf];
        dist[leaf] = 0;
        for (let h = 0; h < queue.length; h++) {
          for (const w of adj[queue[h]]) {
            if (dist[w] !== -1) continue;
            dist[w] = dist[queue[h]] + 1;
            queue.push(w);
          }
        }
        return dist;
      };
      let bestLeaf = -1;
      let bestList: number[] = [];
      let bestDist: Int32Array | null = null;
      for (const [leaf, nodes] of [...members.entries()].sort((a, b) => a[0] - b[0])) {
        const dist = treeOf(leaf);
        const list: number[] = [];
        const seenHere = new Set<number>();
        for (const v of nodes) {
          for (const c of byNode[v]) {
            if (used.has(c) || seenHere.has(c)) continue;
            seenHere.add(c);
            const [a, b] = p.pairs[c];
            const pa = f.piece[a];
            const pb = f.piece[b];
            if ((pa === leaf) === (pb === leaf)) continue;
            const other = pa === leaf ? pb : pa;
            if (dist[other] > 0) list.push(c);
          }
        }
        list.sort((x, y) => x - y);
        if (bestLeaf < 0 || list.length < bestList.length) {
          bestLeaf = leaf;
          bestList = list;
          bestDist = dist;
        }
        if (list.length === 0) break;
      }
      const dist = bestDist!;
      const cover = (c: number) => {
        const [a, b] = p.pairs[c];
        return Math.max(dist[f.piece[a]], dist[f.piece[b]]);
      };
      order(bestList, cover);
      return { list: bestList.slice(0, BRANCH_WIDTH), cut: bestList.length > BRANCH_WIDTH };
    }
    // Only cut nodes remain: join two parts that the first of them separates.
    const v = r.cutNodes[0];
    const mask = createMask(r.g);
    mask.node[v] = 1;
    const comps = findComponents(r.g, mask);
    const list: number[] = [];
    for (let c = 0; c < p.pairs.length; c++) {
      if (used.has(c)) continue;
      const [a, b] = p.pairs[c];
      if (a === v || b === v) continue;
      if (comps.label[a] !== comps.label[b]) list.push(c);
    }
    order(list, () => 0);
    return { list: list.slice(0, BRANCH_WIDTH), cut: list.length > BRANCH_WIDTH };
  };

  const root = residual([]);
  const lowerBound = root.bridges.length > 0 ? root.bound : root.cutNodes.length > 0 ? 1 : 0;
  if (root.bridges.length === 0 && root.cutNodes.length === 0) {
    return { sets: [[]], lowerBound: 0, minimal: true, truncated: false, expansions };
  }

  const found = new Map<string, { set: number[]; price: number }>();
  const priceOf = (set: readonly number[]) => set.reduce((s, c) => s + p.price[c], 0);
  const worstKept = () => {
    if (found.size < p.keep) return Infinity;
    return Math.max(...[...found.values()].map((x) => x.price));
  };

  let depthComplete: boolean;
  let everIncomplete = false;
  const seen = new Set<string>();
  const dfs = (set: number[], r: Residual, limit: number) => {
    if (r.bridges.length === 0 && r.cutNodes.length === 0) {
      const sorted = [...set].sort((a, b) => a - b);
      const key = sorted.join(',');
      if (!found.has(key)) {
        found.set(key, { set: sorted, price: priceOf(sorted) });
        if (found.size > p.keep) {
          // Drop the most expensive (ties: the later key).
          const worst = [...found.entries()].sort((a, b) => b[1].price - a[1].price || (a[0] < b[0] ? 1 : -1))[0][0];
          found.delete(worst);
        }
      }
      return;
    }
    if (set.length + r.bound > limit || set.length >= limit) return;
    const { list, cut } = children(set, r);
    if (cut) depthComplete = false;
    for (const c of list) {
      if (expansions >= maxExpansions) {
        truncated = true;
        depthComplete = false;
        return;
      }
      const next = [...set, c];
      const key = [...next].sort((a, b) => a - b).join(',');
      if (seen.has(key)) continue;
      seen.add(key);
      if (priceOf(next) > worstKept()) continue;
      dfs(next, residual(next), limit);
    }
  };

  for (let limit = Math.max(1, lowerBound); limit <= p.maxLinks; limit++) {
    depthComplete = true;
    seen.clear();
    dfs([], root, limit);
    if (!depthComplete) everIncomplete = true;
    if (found.size > 0) break;
    if (!depthComplete) incompleteBelow = true;
    if (truncated) break;
  }
  const sets = [...found.values()]
    .sort((a, b) => a.price - b.price || (a.set.join(',') < b.set.join(',') ? -1 : 1))
    .map((x) => x.set);
  if (sets.length === 0) {
    const reason = truncated
      ? `no set of at most ${p.maxLinks} candidate links was found within the search limit (${maxExpansions} states)`
      : everIncomplete
        ? `no set of at most ${p.maxLinks} candidate links was found among the ${BRANCH_WIDTH} best-ranked choices at each step`
        : `no set of at most ${p.maxLinks} candidate links does it`;
    return { sets, lowerBound, minimal: false, truncated, expansions, reason };
  }
  const size = sets[0].length;
  return { sets, lowerBound, minimal: size === lowerBound || !incompleteBelow, truncated, expansions };
}
