// The canonical order of a design's elements. The compact graph numbers nodes, links, groups
// and demands in this order, not in the order the file lists them, so that every tie broken
// "to the lowest index" (attacks, worst cases, epicentres, N−1 listings) and every floating-point
// sum over elements comes out the same however the file is ordered: the same topology in
// another order gives the same numbers, bit for bit.
// - ids: natural order — ids that are whole numbers (digits only) by value, so "2" before "10"
//   (compared as digit strings, so ids beyond 2^53 stay exact), before every other id; other ids
//   by Unicode code point; equal values ("7", "007") by code point;
// - links: by their ends (the end that comes first, then the other), then parallel links by
//   their attributes (length, latency, weight, capacity, hardened, groups, other attributes),
//   then by id; only links equal in all of that fall back to file order, and they are
//   interchangeable for every computation. Parallel links also share out their random-order
//   keys in this order, so the dice do not follow the file either;
// - risk groups by id; demands by (source, target, volume).

import type { Demand, TopoLink, Topology } from '../topology/model.js';

const WHOLE = /^[0-9]+$/;

/** Natural order of element ids (see the header); negative when a comes first. */
export function compareIds(a: string, b: string): number {
  if (a === b) return 0;
  return compareParsed(a, WHOLE.test(a) ? stripZeros(a) : null, b, WHOLE.test(b) ? stripZeros(b) : null);
}

/** compareIds with each id's digits (leading zeros stripped) or null, computed once per id. */
function compareParsed(a: string, da: string | null, b: string, db: string | null): number {
  if (da !== null && db !== null) {
    if (da.length !== db.length) return da.length - db.length;
    if (da !== db) return da < db ? -1 : 1;
  } else if (da !== null || db !== null) return da !== null ? -1 : 1;
  return compareCodePoints(a, b);
}

/** Indices of `ids` in natural order (ties: lower index first); each id is parsed once. */
export function naturalOrder(ids: readonly string[]): number[] {
  const digits = ids.map((id) => (WHOLE.test(id) ? stripZeros(id) : null));
  return ids
    .map((_, i) => i)
    .sort((a, b) => (ids[a] === ids[b] ? 0 : compareParsed(ids[a], digits[a], ids[b], digits[b])) || a - b);
}

function stripZeros(s: string): string {
  let i = 0;
  while (i < s.length - 1 && s.charCodeAt(i) === 48) i++;
  return s.slice(i);
}

/**
 * Code point order of two strings. JavaScript's `<` compares UTF-16 code units, which puts
 * characters above U+FFFF (surrogate pairs, 0xD800–0xDFFF) before U+E000–U+FFFF; ranking
 * surrogates above the rest of the BMP gives the order of code points.
 */
export function compareCodePoints(a: string, b: string): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) {
    const x = a.charCodeAt(i);
    const y = b.charCodeAt(i);
    if (x !== y) return unitRank(x) - unitRank(y);
  }
  return a.length - b.length;
}

function unitRank(u: number): number {
  if (u >= 0xd800 && u <= 0xdfff) return u + 0x2000;
  if (u >= 0xe000) return u - 0x800;
  return u;
}

export interface CanonicalOrder {
  /** File indices of the nodes, in canonical order. */
  nodes: number[];
  /** File indices of the links, in canonical order. */
  links: number[];
  /**
   * Link keys in canonical order. A link without parallels keeps its own key; the parallel links
   * between two nodes share out their keys (the reader's "a—b", "a—b#2", …) in canonical order,
   * so the key that seeds a parallel link's dice does not depend on which one the file lists first.
   */
  keys: string[];
  /** File indices of the demands, in canonical order. */
  demands: number[];
  /** Each link's ends as canonical node indices, smaller first (−1: unknown node), by file index. */
  lo: Int32Array;
  hi: Int32Array;
}

export function canonicalOrder(t: Topology): CanonicalOrder {
  const nodes = naturalOrder(t.nodes.map((v) => v.id));
  const rank = new Map<string, number>();
  nodes.forEach((i, r) => rank.set(t.nodes[i].id, r));
  const m = t.links.length;
  const lo = new Int32Array(m);
  const hi = new Int32Array(m);
  t.links.forEach((l, e) => {
    const s = rank.get(l.source) ?? -1;
    const d = rank.get(l.target) ?? -1;
    lo[e] = Math.min(s, d);
    hi[e] = Math.max(s, d);
  });
  // By the first end: a counting sort (stable, linear); then each bucket (one node's links,
  // a handful) by the other end, parallel links by what they carry, then file order.
  // Bucket b = lo + 1 (a link to an unknown node, lo = −1, which parsers never let through, first).
  const buckets = nodes.length + 1;
  const start = new Int32Array(buckets + 1);
  for (let e = 0; e < m; e++) start[lo[e] + 2]++;
  for (let b = 0; b < buckets; b++) start[b + 1] += start[b];
  const fill = start.slice(0, buckets);
  const order = new Int32Array(m);
  for (let e = 0; e < m; e++) order[fill[lo[e] + 1]++] = e;
  const cmp = (x: number, y: number) =>
    hi[x] - hi[y] || (hi[x] === hi[y] && lo[x] === lo[y] ? compareParallel(t.links[x], t.links[y]) : 0) || x - y;
  for (let b = 0; b < buckets; b++) {
    const from = start[b];
    const to = start[b + 1];
    if (to - from < 2) continue;
    if (to - from <= 16) {
      // Insertion sort: most buckets hold a node's few links.
      for (let i = from + 1; i < to; i++) {
        const e = order[i];
        let j = i - 1;
        while (j >= from && cmp(order[j], e) > 0) {
          order[j + 1] = order[j];
          j--;
        }
        order[j + 1] = e;
      }
    } else order.subarray(from, to).sort(cmp);
  }
  const links = Array.from(order);
  const keys = links.map((e) => t.links[e].key);
  for (let i = 0; i < links.length;) {
    let j = i + 1;
    while (j < links.length && lo[links[j]] === lo[links[i]] && hi[links[j]] === hi[links[i]]) j++;
    if (j - i > 1) keys.splice(i, j - i, ...keys.slice(i, j).sort(compareKeys));
    i = j;
  }
  const demandEnd = (d: Demand, which: 'source' | 'target') => rank.get(d[which]) ?? -1;
  const demands = t.demands
    .map((_, i) => i)
    .sort((a, b) => {
      const x = t.demands[a];
      const y = t.demands[b];
      return (
        demandEnd(x, 'source') - demandEnd(y, 'source') ||
        demandEnd(x, 'target') - demandEnd(y, 'target') ||
        x.volume - y.volume ||
        a - b
      );
    });
  return { nodes, links, keys, demands, lo, hi };
}

/** Occurrence keys: shorter first ("a—b" before "a—b#2" before "a—b#10"), then by code point. */
function compareKeys(a: string, b: string): number {
  return a.length - b.length || compareCodePoints(a, b);
}

/** Parallel links (same ends) by what they carry, then by id; 0 when nothing tells them apart. */
function compareParallel(a: TopoLink, b: TopoLink): number {
  return (
    compareOptional(a.length, b.length) ||
    compareOptional(a.latency, b.latency) ||
    compareOptional(a.weight, b.weight) ||
    compareOptional(a.capacity, b.capacity) ||
    Number(a.hardened) - Number(b.hardened) ||
    compareCodePoints(groupsKey(a), groupsKey(b)) ||
    compareCodePoints(stableJson(a.attrs), stableJson(b.attrs)) ||
    compareIds(a.id, b.id)
  );
}

/** Numbers ascending, absent first. */
function compareOptional(a: number | undefined, b: number | undefined): number {
  if (a === b) return 0;
  if (a === undefined) return -1;
  if (b === undefined) return 1;
  return a < b ? -1 : a > b ? 1 : 0;
}

function groupsKey(l: TopoLink): string {
  return [...new Set(l.riskGroups)].sort(compareIds).join('\u0000');
}

/** JSON with object keys sorted, so equal attributes give equal text whatever their order. */
function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.keys(value as Record<string, unknown>)
      .sort(compareCodePoints)
      .map((k) => `${JSON.stringify(k)}:${stableJson((value as Record<string, unknown>)[k])}`);
    return `{${entries.join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}
