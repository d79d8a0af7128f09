// Connectivity curves by reverse union–find (Newman & Ziff, PRL 85:4104, 2000; PRE 64:016706,
// 2001). Removing units u_1..u_K and asking for the largest component and the connected pairs
// after every step equals adding the units back in reverse order: one near-linear pass,
// O((N + L)·α(N)), gives the whole curve for any fixed order (random, or a targeted attack's).
// Curves hold raw counts; index k is "after k units were removed".

import type { CompactGraph } from '../graph/compact.js';
import { findRoot } from '../metrics/kernels/union-find.js';
import { kernelWork } from '../metrics/kernels/work-count.js';
import type { ElementKind } from '../graph/element.js';

export interface ConnectivityCurve {
  /** Size of the largest component after k removals, k = 0..K. */
  lcc: Float64Array;
  /** Connected node pairs Σ_C C(|C|, 2) after k removals. */
  pairs: Float64Array;
}

/** Scratch space for one graph, reused by every realization. */
export interface UnionFindWorkspace {
  /** Union–find forest (union by size, path halving) over node indices. */
  parent: Int32Array;
  size: Int32Array;
  nodeOn: Uint8Array;
  linkOn: Uint8Array;
  /** For group orders: the position of the group that takes each link first. */
  firstGroup: Int32Array;
}

export function createUnionFindWorkspace(g: CompactGraph): UnionFindWorkspace {
  return {
    parent: new Int32Array(g.n),
    size: new Int32Array(g.n),
    nodeOn: new Uint8Array(g.n),
    linkOn: new Uint8Array(g.m),
    firstGroup: new Int32Array(g.m),
  };
}

/**
 * The curve of a removal order of `count` units of the given kind (`order[0..count)`).
 * Groups remove their links that are not hardened; a link lost with an earlier group stays lost.
 */
export function connectivityCurve(
  g: CompactGraph,
  kind: ElementKind,
  order: ArrayLike<number>,
  count: number,
  ws: UnionFindWorkspace = createUnionFindWorkspace(g),
  out: ConnectivityCurve = { lcc: new Float64Array(count + 1), pairs: new Float64Array(count + 1) },
): ConnectivityCurve {
  const { nodeOn, linkOn, firstGroup } = ws;
  nodeOn.fill(1);
  linkOn.fill(1);
  // Which units are gone at k = count. For groups, remember which group takes each link first.
  if (kind === 'node') for (let i = 0; i < count; i++) nodeOn[order[i]] = 0;
  else if (kind === 'link') for (let i = 0; i < count; i++) linkOn[order[i]] = 0;
  else {
    firstGroup.fill(-1);
    for (let i = 0; i < count; i++) {
      const u = order[i];
      for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
        const e = g.groupLinks[p];
        if (g.linkHardened[e] === 0 && linkOn[e] === 1) {
          linkOn[e] = 0;
          firstGroup[e] = i;
        }
      }
    }
  }

  const { parent, size } = ws;
  const st: JoinState = { lcc: 0, pairs: 0 };
  const { offsets, neighbors, linkOf, linkSource, linkTarget } = g;
  const addNode = (v: number): void => {
    nodeOn[v] = 1;
    if (st.lcc < 1) st.lcc = 1;
    for (let p = offsets[v]; p < offsets[v + 1]; p++) {
      const w = neighbors[p];
      if (nodeOn[w] === 1 && linkOn[linkOf[p]] === 1) join(st, parent, size, v, w);
    }
  };
  const addLink = (e: number): void => {
    linkOn[e] = 1;
    const a = linkSource[e];
    const b = linkTarget[e];
    if (nodeOn[a] === 1 && nodeOn[b] === 1) join(st, parent, size, a, b);
  };

  // The survivors at k = count.
  for (let v = 0; v < g.n; v++) {
    parent[v] = v;
    size[v] = 1;
  }
  for (let v = 0; v < g.n; v++) if (nodeOn[v] === 1) st.lcc = 1;
  for (let e = 0; e < g.m; e++) {
    const a = linkSource[e];
    const b = linkTarget[e];
    if (linkOn[e] === 1 && nodeOn[a] === 1 && nodeOn[b] === 1) join(st, parent, size, a, b);
  }
  out.lcc[count] = st.lcc;
  out.pairs[count] = st.pairs;

  // Add back in reverse order.
  for (let i = count - 1; i >= 0; i--) {
    const u = order[i];
    if (kind === 'node') addNode(u);
    else if (kind === 'link') addLink(u);
    else {
      for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
        const e = g.groupLinks[p];
        if (firstGroup[e] === i) addLink(e);
      }
    }
    out.lcc[i] = st.lcc;
    out.pairs[i] = st.pairs;
  }
  kernelWork.visits += 2 * g.n + g.m + count;
  return out;
}

interface JoinState {
  lcc: number;
  pairs: number;
}

/** Union by size with path halving (metrics/kernels/union-find.ts), also counting the pairs each merge connects. */
function join(st: JoinState, parent: Int32Array, size: Int32Array, a: number, b: number): void {
  a = findRoot(parent, a);
  b = findRoot(parent, b);
  if (a === b) return;
  const sa = size[a];
  const sb = size[b];
  const s = sa + sb;
  st.pairs += sa * sb;
  if (sa < sb) {
    parent[a] = b;
    size[b] = s;
  } else {
    parent[b] = a;
    size[a] = s;
  }
  if (s > st.lcc) st.lcc = s;
}
