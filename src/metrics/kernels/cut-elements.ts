// Bridges, cut nodes, blocks and 2-link-connected pieces of a local multigraph in one
// iterative low-link DFS (Hopcroft & Tarjan, CACM 16:372, 1973; Tarjan, SIAM J. Comput.
// 1:146, 1972), allocation-free. It skips the parent LINK rather than the parent node, so a
// link with a parallel twin is never a bridge (as src/graph/structure.ts does).
// Besides the counts it returns, for the normalisations of the bridges / cut_nodes metrics:
// - blockPairs: Σ over blocks (biconnected components, bridges included as 2-node blocks)
//   of C(|B|, 2). Two blocks share at most one node, so each node pair is counted at most
//   once: these are exactly the pairs no single failure of a THIRD node can separate.
// - twoEdgePairs: Σ over 2-link-connected components of C(|C|, 2): the pairs that no
//   single link failure can separate.

import type { LocalGraph } from './subgraph.js';

export interface CutSummary {
  bridges: number;
  cutNodes: number;
  blockPairs: number;
  twoEdgePairs: number;
}

export function createCutFinder(nodeCapacity: number) {
  const disc = new Int32Array(nodeCapacity);
  const low = new Int32Array(nodeCapacity);
  const parentLink = new Int32Array(nodeCapacity);
  const cursor = new Int32Array(nodeCapacity);
  const stack = new Int32Array(nodeCapacity);
  const blockStack = new Int32Array(nodeCapacity);
  const edgeStack = new Int32Array(nodeCapacity);
  const isCut = new Uint8Array(nodeCapacity);
  const out: CutSummary = { bridges: 0, cutNodes: 0, blockPairs: 0, twoEdgePairs: 0 };

  return (g: LocalGraph): CutSummary => {
    const n = g.n;
    const { offsets, neighbors, linkOf } = g;
    disc.fill(-1, 0, n);
    isCut.fill(0, 0, n);
    let time = 0;
    let bridges = 0;
    let blockPairs = 0;
    let twoEdgePairs = 0;
    for (let root = 0; root < n; root++) {
      if (disc[root] !== -1) continue;
      let top = 0;
      let bTop = 0;
      let eTop = 0;
      stack[top++] = root;
      blockStack[bTop++] = root;
      edgeStack[eTop++] = root;
      parentLink[root] = -1;
      disc[root] = low[root] = time++;
      cursor[root] = offsets[root];
      let rootChildren = 0;
      while (top > 0) {
        const v = stack[top - 1];
        if (cursor[v] < offsets[v + 1]) {
          const p = cursor[v]++;
          const e = linkOf[p];
          if (e === parentLink[v]) continue;
          const w = neighbors[p];
          if (disc[w] === -1) {
            parentLink[w] = e;
            disc[w] = low[w] = time++;
            cursor[w] = offsets[w];
            stack[top++] = w;
            blockStack[bTop++] = w;
            edgeStack[eTop++] = w;
            if (v === root) rootChildren++;
          } else if (disc[w] < low[v]) {
            low[v] = disc[w];
          }
        } else {
          top--;
          if (top === 0) break;
          const parent = stack[top - 1];
          if (low[v] < low[parent]) low[parent] = low[v];
          if (low[v] >= disc[parent]) {
            // v's subtree (what is left of it on the stack) plus parent is a block.
            let size = 1;
            while (blockStack[--bTop] !== v) size++;
            size++;
            blockPairs += (size * (size - 1)) / 2;
            if (parent !== root) isCut[parent] = 1;
          }
          if (low[v] > disc[parent]) {
            bridges++;
            let size = 1;
            while (edgeStack[--eTop] !== v) size++;
            twoEdgePairs += (size * (size - 1)) / 2;
          }
        }
      }
      if (rootChildren > 1) isCut[root] = 1;
      // Whatever remains on the link stack is the root's 2-link-connected piece.
      twoEdgePairs += (eTop * (eTop - 1)) / 2;
    }
    let cutNodes = 0;
    for (let v = 0; v < n; v++) cutNodes += isCut[v];
    out.bridges = bridges;
    out.cutNodes = cutNodes;
    out.blockPairs = blockPairs;
    out.twoEdgePairs = twoEdgePairs;
    return out;
  };
}
