// Structural facts of a (masked) compact graph: connected components, bridges and cut
// nodes (articulation points). Iterative Hopcroft–Tarjan low-link DFS (Hopcroft & Tarjan,
// CACM 16:372, 1973; Tarjan, SIAM J. Comput. 1:146, 1972), so deep chains cannot overflow
// the call stack. Parallel links are physical redundancy: a link with a parallel twin is
// never a bridge, which is why the DFS skips its parent *link*, not its parent node.

import type { CompactGraph } from './compact.js';
import { createMask, isLinkAlive, type Mask } from './mask.js';

export interface Components {
  /** Component label per node, -1 for removed nodes. Labels follow the index order of each component's first node. */
  label: Int32Array;
  /** Size of each component. */
  sizes: number[];
  /** Index of the largest component (the first one on ties), -1 when no node is left. */
  largest: number;
}

export function findComponents(g: CompactGraph, mask: Mask = createMask(g)): Components {
  const label = new Int32Array(g.n).fill(-1);
  const sizes: number[] = [];
  const queue = new Int32Array(g.n);
  for (let s = 0; s < g.n; s++) {
    if (mask.node[s] || label[s] !== -1) continue;
    const c = sizes.length;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    label[s] = c;
    while (head < tail) {
      const v = queue[head++];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (label[w] !== -1 || mask.node[w] || mask.link[g.linkOf[p]]) continue;
        label[w] = c;
        queue[tail++] = w;
      }
    }
    sizes.push(tail);
  }
  let largest = -1;
  for (let c = 0; c < sizes.length; c++) if (largest < 0 || sizes[c] > sizes[largest]) largest = c;
  return { label, sizes, largest };
}

export interface CutElements {
  /** Link indices whose loss disconnects their component, ascending. */
  bridges: number[];
  /** Node indices whose loss disconnects their component, ascending. */
  cutNodes: number[];
}

export function findCutElements(g: CompactGraph, mask: Mask = createMask(g)): CutElements {
  const n = g.n;
  const disc = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const parentLink = new Int32Array(n).fill(-1);
  const cursor = new Int32Array(n);
  const stack = new Int32Array(n);
  const isCut = new Uint8Array(n);
  const bridges: number[] = [];
  let time = 0;

  for (let root = 0; root < n; root++) {
    if (mask.node[root] || disc[root] !== -1) continue;
    let top = 0;
    stack[top++] = root;
    disc[root] = low[root] = time++;
    cursor[root] = g.offsets[root];
    let rootChildren = 0;
    while (top > 0) {
      const v = stack[top - 1];
      if (cursor[v] < g.offsets[v + 1]) {
        const p = cursor[v]++;
        const e = g.linkOf[p];
        if (e === parentLink[v] || !isLinkAlive(g, mask, e)) continue;
        const w = g.neighbors[p];
        if (disc[w] === -1) {
          parentLink[w] = e;
          disc[w] = low[w] = time++;
          cursor[w] = g.offsets[w];
          stack[top++] = w;
          if (v === root) rootChildren++;
        } else if (disc[w] < low[v]) {
          low[v] = disc[w];
        }
      } else {
        top--;
        if (top === 0) break;
        const parent = stack[top - 1];
        if (low[v] < low[parent]) low[parent] = low[v];
        if (low[v] > disc[parent]) bridges.push(parentLink[v]);
        if (parent !== root && low[v] >= disc[parent]) isCut[parent] = 1;
      }
    }
    if (rootChildren > 1) isCut[root] = 1;
  }

  bridges.sort((a, b) => a - b);
  const cutNodes: number[] = [];
  for (let v = 0; v < n; v++) if (isCut[v]) cutNodes.push(v);
  return { bridges, cutNodes };
}

/** The links a shared-risk group takes down: all of them, or (honouring hardening) those not hardened. */
export function groupLinkMask(g: CompactGraph, k: number, honourHardening: boolean, mask: Mask = createMask(g)): Mask {
  for (let p = g.groupOffsets[k]; p < g.groupOffsets[k + 1]; p++) {
    const e = g.groupLinks[p];
    if (!honourHardening || g.linkHardened[e] === 0) mask.link[e] = 1;
  }
  return mask;
}

/**
 * Shared-risk groups whose loss (all their links at once) splits the design, ascending. A group
 * counts only for what its members do together: its links that are bridges on their own are
 * left out of the test (each is already a single point of failure), so a group is listed when
 * losing its other links still adds a component. Removing bridges never changes which links
 * lie on a cycle, so this separates the two cleanly. Honouring hardening, hardened links are
 * not lost (as the challenges treat them) and hardened bridges are not counted as bridges.
 * O(groups × (n + m)).
 */
export function findStrandingGroups(
  g: CompactGraph,
  honourHardening: boolean,
  cuts: CutElements = findCutElements(g),
): number[] {
  const isBridge = new Uint8Array(g.m);
  for (const e of cuts.bridges) if (!honourHardening || g.linkHardened[e] === 0) isBridge[e] = 1;
  const intact = findComponents(g).sizes.length;
  const mask = createMask(g);
  const out: number[] = [];
  for (let k = 0; k < g.groupIds.length; k++) {
    mask.link.fill(0);
    let removed = 0;
    for (let p = g.groupOffsets[k]; p < g.groupOffsets[k + 1]; p++) {
      const e = g.groupLinks[p];
      if (isBridge[e] || (honourHardening && g.linkHardened[e])) continue;
      mask.link[e] = 1;
      removed++;
    }
    if (removed > 1 && findComponents(g, mask).sizes.length > intact) out.push(k);
  }
  return out;
}
