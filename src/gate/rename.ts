// Which element of the base is which element of the head. Ids are the first answer; an id
// that was renamed while everything around it stayed the same is the same site, not a site
// removed and a new one added, and must not show up as a "new" weak point.
//
//   nodes   same id; then, repeatedly until nothing changes, an unmatched base node and an
//           unmatched head node whose neighbourhoods agree through the nodes matched so far
//           (the same matched neighbours, with multiplicity, and as many unmatched ones) are
//           matched when that neighbourhood is unique on both sides — two candidates for one
//           neighbourhood stay unmatched, since guessing would hide a real change. A final
//           check keeps only renames whose whole neighbourhood is identical under the matching.
//   links   by their matched ends, parallel links in file order (the stable link key, read
//           through the node matching).
//   groups  same id; else the unique unmatched group with exactly the same matched links.
// This is graph matching by colour refinement restricted to the unmatched remainder
// (Weisfeiler & Leman's refinement idea, 1968; common practice for diffing labelled graphs).
// Pure; about O((n + m) log m) per round, and rounds only continue while matches are made.

import type { CompactGraph } from '../graph/compact.js';

export interface Matching {
  /** Base index → head index, -1 when the element has no counterpart. */
  nodeToHead: Int32Array;
  nodeToBase: Int32Array;
  linkToHead: Int32Array;
  linkToBase: Int32Array;
  groupToHead: Int32Array;
  groupToBase: Int32Array;
  /** Matched pairs [base, head] whose ids differ, in head file order. */
  renamedNodes: [number, number][];
  renamedGroups: [number, number][];
}

/** The identity matching of a design with itself (base and head are one evaluation). */
export function identityMatching(g: CompactGraph): Matching {
  const id = (k: number) => Int32Array.from({ length: k }, (_, i) => i);
  return {
    nodeToHead: id(g.n),
    nodeToBase: id(g.n),
    linkToHead: id(g.m),
    linkToBase: id(g.m),
    groupToHead: id(g.groupIds.length),
    groupToBase: id(g.groupIds.length),
    renamedNodes: [],
    renamedGroups: [],
  };
}

/** Neighbours of v as matched indices on the other side, sorted; unmatched ones counted apart. */
function neighbourhood(g: CompactGraph, v: number, map: Int32Array): { matched: number[]; unmatched: number } {
  const matched: number[] = [];
  let unmatched = 0;
  for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
    const w = map[g.neighbors[p]];
    if (w < 0) unmatched++;
    else matched.push(w);
  }
  matched.sort((a, b) => a - b);
  return { matched, unmatched };
}

/** The head's neighbourhood of h, written in head indices, as the base's is after mapping. */
function headNeighbourhood(g: CompactGraph, h: number, toBase: Int32Array): { matched: number[]; unmatched: number } {
  const matched: number[] = [];
  let unmatched = 0;
  for (let p = g.offsets[h]; p < g.offsets[h + 1]; p++) {
    const w = g.neighbors[p];
    if (toBase[w] < 0) unmatched++;
    else matched.push(w);
  }
  matched.sort((a, b) => a - b);
  return { matched, unmatched };
}

const signature = (nb: { matched: number[]; unmatched: number }) => `${nb.matched.join(',')}|${nb.unmatched}`;

function addTo(map: Map<string, number[]>, key: string, value: number): void {
  const list = map.get(key);
  if (list) list.push(value);
  else map.set(key, [value]);
}

function matchNodes(base: CompactGraph, head: CompactGraph): { toHead: Int32Array; toBase: Int32Array } {
  const toHead = new Int32Array(base.n).fill(-1);
  const toBase = new Int32Array(head.n).fill(-1);
  const byId = new Set<number>();
  for (let b = 0; b < base.n; b++) {
    const h = head.nodeIndex.get(base.nodeIds[b]);
    if (h !== undefined) {
      toHead[b] = h;
      toBase[h] = b;
      byId.add(b);
    }
  }
  for (;;) {
    const baseBy = new Map<string, number[]>();
    const headBy = new Map<string, number[]>();
    for (let b = 0; b < base.n; b++) {
      if (toHead[b] >= 0) continue;
      const nb = neighbourhood(base, b, toHead);
      if (nb.matched.length === 0) continue; // nothing to recognise it by
      addTo(baseBy, signature(nb), b);
    }
    if (baseBy.size === 0) break;
    for (let h = 0; h < head.n; h++) {
      if (toBase[h] >= 0) continue;
      const nb = headNeighbourhood(head, h, toBase);
      if (nb.matched.length === 0) continue;
      addTo(headBy, signature(nb), h);
    }
    let made = 0;
    for (const [key, bs] of baseBy) {
      const hs = headBy.get(key);
      if (bs.length !== 1 || hs?.length !== 1) continue;
      toHead[bs[0]] = hs[0];
      toBase[hs[0]] = bs[0];
      made++;
    }
    if (made === 0) break;
  }
  // Keep only renames whose whole neighbourhood is identical under the final matching.
  for (let changed = true; changed;) {
    changed = false;
    for (let b = 0; b < base.n; b++) {
      const h = toHead[b];
      if (h < 0 || byId.has(b)) continue;
      const nb = neighbourhood(base, b, toHead);
      const nh = headNeighbourhood(head, h, toBase);
      if (nb.unmatched === 0 && nh.unmatched === 0 && signature(nb) === signature(nh)) continue;
      toHead[b] = -1;
      toBase[h] = -1;
      changed = true;
    }
  }
  return { toHead, toBase };
}

/** Links grouped by their (matched) unordered ends, in file order. */
function linksByEnds(g: CompactGraph, endOf: (v: number) => number): Map<string, number[]> {
  const out = new Map<string, number[]>();
  for (let e = 0; e < g.m; e++) {
    const a = endOf(g.linkSource[e]);
    const b = endOf(g.linkTarget[e]);
    if (a < 0 || b < 0) continue;
    const key = a < b ? `${a}-${b}` : `${b}-${a}`;
    const list = out.get(key);
    if (list) list.push(e);
    else out.set(key, [e]);
  }
  return out;
}

function groupMembers(g: CompactGraph, k: number): number[] {
  return Array.from(g.groupLinks.subarray(g.groupOffsets[k], g.groupOffsets[k + 1]));
}

// The gate asks for the same pair twice (is it the same design? then what changed?): the
// matching is a pure function of the two graphs, kept while both live.
const matchings = new WeakMap<CompactGraph, WeakMap<CompactGraph, Matching>>();

export function matchDesigns(base: CompactGraph, head: CompactGraph): Matching {
  let byHead = matchings.get(base);
  if (!byHead) matchings.set(base, (byHead = new WeakMap()));
  const hit = byHead.get(head);
  if (hit) return hit;
  const m = computeMatching(base, head);
  byHead.set(head, m);
  return m;
}

function computeMatching(base: CompactGraph, head: CompactGraph): Matching {
  const nodes = matchNodes(base, head);
  const linkToHead = new Int32Array(base.m).fill(-1);
  const linkToBase = new Int32Array(head.m).fill(-1);
  const headLinks = linksByEnds(head, (v) => v);
  for (const [key, bs] of linksByEnds(base, (v) => nodes.toHead[v])) {
    const hs = headLinks.get(key) ?? [];
    for (let i = 0; i < Math.min(bs.length, hs.length); i++) {
      linkToHead[bs[i]] = hs[i];
      linkToBase[hs[i]] = bs[i];
    }
  }

  const G = base.groupIds.length;
  const H = head.groupIds.length;
  const groupToHead = new Int32Array(G).fill(-1);
  const groupToBase = new Int32Array(H).fill(-1);
  const headGroup = new Map(head.groupIds.map((id, k) => [id, k]));
  for (let k = 0; k < G; k++) {
    const h = headGroup.get(base.groupIds[k]);
    if (h !== undefined) {
      groupToHead[k] = h;
      groupToBase[h] = k;
    }
  }
  const membersKey = (list: number[]) => [...list].sort((a, b) => a - b).join(',');
  const baseBy = new Map<string, number[]>();
  for (let k = 0; k < G; k++) {
    if (groupToHead[k] >= 0) continue;
    const mapped = groupMembers(base, k).map((e) => linkToHead[e]);
    if (mapped.length === 0 || mapped.some((e) => e < 0)) continue;
    addTo(baseBy, membersKey(mapped), k);
  }
  const headBy = new Map<string, number[]>();
  for (let h = 0; h < H; h++) {
    if (groupToBase[h] >= 0) continue;
    const members = groupMembers(head, h);
    if (members.length === 0) continue;
    addTo(headBy, membersKey(members), h);
  }
  for (const [key, ks] of baseBy) {
    const hs = headBy.get(key);
    if (ks.length !== 1 || hs?.length !== 1) continue;
    groupToHead[ks[0]] = hs[0];
    groupToBase[hs[0]] = ks[0];
  }

  const renamedNodes: [number, number][] = [];
  for (let h = 0; h < head.n; h++) {
    const b = nodes.toBase[h];
    if (b >= 0 && base.nodeIds[b] !== head.nodeIds[h]) renamedNodes.push([b, h]);
  }
  const renamedGroups: [number, number][] = [];
  for (let h = 0; h < H; h++) {
    const b = groupToBase[h];
    if (b >= 0 && base.groupIds[b] !== head.groupIds[h]) renamedGroups.push([b, h]);
  }
  return {
    nodeToHead: nodes.toHead,
    nodeToBase: nodes.toBase,
    linkToHead,
    linkToBase,
    groupToHead,
    groupToBase,
    renamedNodes,
    renamedGroups,
  };
}

/** Equal numbers, or both unknown (NaN), or both columns absent. */
function sameValue(a: Float64Array | null, i: number, b: Float64Array | null, j: number): boolean {
  const x = a ? a[i] : Number.NaN;
  const y = b ? b[j] : Number.NaN;
  return Object.is(x, y) || (Number.isNaN(x) && Number.isNaN(y));
}

/**
 * Whether base and head are the same design once renamed ids are read through the matching:
 * every node, link and shared-risk group matched, with the same ends, flags, coordinates,
 * lengths, latencies, weights and group memberships, and the same demands. Such a change only
 * spells ids differently, so it is judged on one evaluation (every delta exactly 0).
 */
export function sameDesign(base: CompactGraph, head: CompactGraph, m: Matching): boolean {
  if (base.n !== head.n || base.m !== head.m || base.groupIds.length !== head.groupIds.length) return false;
  if (base.demandVolume.length !== head.demandVolume.length || !Object.is(base.latencyBudget, head.latencyBudget))
    return false;
  for (let v = 0; v < base.n; v++) {
    const h = m.nodeToHead[v];
    if (h < 0 || base.nodeHardened[v] !== head.nodeHardened[h]) return false;
    if (!sameValue(base.lat, v, head.lat, h) || !sameValue(base.lon, v, head.lon, h)) return false;
  }
  const groupsOf = (g: CompactGraph) => {
    const out: number[][] = Array.from({ length: g.m }, () => []);
    for (let k = 0; k < g.groupIds.length; k++)
      for (let p = g.groupOffsets[k]; p < g.groupOffsets[k + 1]; p++) out[g.groupLinks[p]].push(k);
    return out;
  };
  const bg = groupsOf(base);
  const hg = groupsOf(head);
  for (let e = 0; e < base.m; e++) {
    const f = m.linkToHead[e];
    if (f < 0 || base.linkHardened[e] !== head.linkHardened[f]) return false;
    const a = [m.nodeToHead[base.linkSource[e]], m.nodeToHead[base.linkTarget[e]]].sort((x, y) => x - y);
    const b = [head.linkSource[f], head.linkTarget[f]].sort((x, y) => x - y);
    if (a[0] !== b[0] || a[1] !== b[1]) return false;
    if (
      !sameValue(base.length, e, head.length, f) ||
      !sameValue(base.latency, e, head.latency, f) ||
      !sameValue(base.weight, e, head.weight, f)
    )
      return false;
    const ga = bg[e].map((k) => m.groupToHead[k]).sort((x, y) => x - y);
    const gb = [...hg[f]].sort((x, y) => x - y);
    if (ga.length !== gb.length || ga.some((k, i) => k !== gb[i])) return false;
  }
  const demands = (g: CompactGraph, map: (v: number) => number) =>
    Array.from(g.demandVolume, (vol, d) => {
      const [s, t] = [map(g.demandSource[d]), map(g.demandTarget[d])].sort((x, y) => x - y);
      return `${s} ${t} ${vol}`;
    }).sort();
  const da = demands(base, (v) => m.nodeToHead[v]);
  const db = demands(head, (v) => v);
  return da.every((x, i) => x === db[i]);
}
