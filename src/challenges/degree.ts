// Targeted node attacks by degree (number of working links at a node). Static: ranked once on
// the intact design; adaptive: the highest current degree is removed at each step, with degrees
// updated incrementally — a bucket per degree, each a lazy min-heap of node indices so that ties
// go to the lowest index; the top bucket only moves down (degrees never rise under removal), so
// the whole attack costs O((N + L) log N) (bucket peeling as in Batagelj & Zaversnik 2003, M).
// Holme, Kim, Yoon & Han, PRE 65:056109 (2002): "ID" and "RD" attacks.

import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
import { rankDescending } from './rank.js';
import { eligibleUnits } from './units.js';

export function nodeDegrees(g: CompactGraph): Int32Array {
  const deg = new Int32Array(g.n);
  for (let v = 0; v < g.n; v++) deg[v] = g.offsets[v + 1] - g.offsets[v];
  return deg;
}

export function staticDegreeOrder(g: CompactGraph, steps: number): Int32Array {
  return rankDescending(nodeDegrees(g), eligibleUnits(g, 'node'), steps);
}

export function adaptiveDegreeOrder(g: CompactGraph, steps: number): Int32Array {
  const deg = nodeDegrees(g);
  const eligible = eligibleUnits(g, 'node');
  const removed = new Uint8Array(g.n);
  let maxDeg = 0;
  for (let v = 0; v < g.n; v++) if (eligible[v] && deg[v] > maxDeg) maxDeg = deg[v];
  const buckets: number[][] = Array.from({ length: maxDeg + 1 }, () => []);
  for (let v = 0; v < g.n; v++) if (eligible[v]) buckets[deg[v]].push(v); // ascending: already a heap
  const out: number[] = [];
  let top = maxDeg;
  while (out.length < steps && top >= 0) {
    const heap = buckets[top];
    if (heap.length === 0) {
      top--;
      continue;
    }
    const v = heapPop(heap);
    if (removed[v] || deg[v] !== top) continue; // stale entry: the node has moved down
    removed[v] = 1;
    out.push(v);
    for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
      const w = g.neighbors[p];
      if (removed[w]) continue;
      deg[w]--;
      if (eligible[w]) heapPush(buckets[deg[w]], w);
    }
  }
  return Int32Array.from(out);
}

function heapPush(h: number[], v: number): void {
  let i = h.length;
  h.push(v);
  while (i > 0) {
    const parent = (i - 1) >> 1;
    if (h[parent] <= v) break;
    h[i] = h[parent];
    i = parent;
  }
  h[i] = v;
}

function heapPop(h: number[]): number {
  const top = h[0];
  const last = h.pop()!;
  if (h.length > 0) {
    let i = 0;
    for (;;) {
      const l = 2 * i + 1;
      if (l >= h.length) break;
      const r = l + 1;
      const c = r < h.length && h[r] < h[l] ? r : l;
      if (h[c] >= last) break;
      h[i] = h[c];
      i = c;
    }
    h[i] = last;
  }
  return top;
}

export const degree: AttackChallenge = {
  name: 'degree',
  type: 'attack',
  kind: 'node',
  summary: 'targeted attack: nodes by degree on the intact design, highest first',
  sequence: (g, steps) => staticDegreeOrder(g, steps),
};

export const degreeAdaptive: AttackChallenge = {
  name: 'degree-adaptive',
  type: 'attack',
  kind: 'node',
  summary: 'targeted attack: the node with the highest current degree, re-ranked after every removal',
  sequence: (g, steps) => adaptiveDegreeOrder(g, steps),
};
