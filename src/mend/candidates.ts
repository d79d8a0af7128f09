// Candidate links for mending a design: the planner's own list (a YAML or JSON file the policy
// names under `mend.candidates`), or, without one, site pairs within a distance limit whose
// length is the great-circle distance × a route factor (1.3 by default: fibre follows roads,
// rails and coasts rather than the great circle; common practice, and the figure the demo's
// lengths were made with). Pure: the caller reads the file.
//
// The candidate file:
//   candidates:
//     - between: [ibberlin, tarnquist]   # required: two sites of the design
//       length_km: 47.8                  # length_km or cost (or both)
//       latency_ms: 0.339                # optional; else estimated from the design's links
//       cost: 120                        # optional, any unit the planner uses
//       risk_groups: [duct-kaskeld-shore]
//       id: lease-ibberlin-tarnquist     # optional
//       note: leased span, 3-year term   # optional, shown as given
// A candidate naming a site the design does not have is skipped with a note (the list serves
// several designs); a malformed file is a located PolicyError.

import { isMap, isScalar, isSeq, LineCounter, parseDocument, type Node } from 'yaml';
import { PolicyError } from '../errors.js';
import type { CompactGraph } from '../graph/compact.js';
import { greatCircleKm } from '../metrics/kernels/link-cost.js';

/** Route factor when the policy sets none (common practice; see the header). */
export const DEFAULT_ROUTE_FACTOR = 1.3;
/** Generated candidates when coordinates are missing: every pair up to this many sites, else pairs within MAX_HOPS. */
export const ALL_PAIRS_LIMIT = 300;
export const MAX_HOPS = 3;
/** With coordinates: every pair up to this many located sites, else pairs within MAX_HOPS hops (and the distance limit). */
export const GEO_ALL_PAIRS_LIMIT = 2000;
/** Most generated candidates kept (the nearest first). */
export const MAX_GENERATED = 20_000;

export interface Candidate {
  /** Node indices in the head design, a < b not required. */
  a: number;
  b: number;
  id?: string;
  lengthKm?: number;
  latencyMs?: number;
  cost?: number;
  riskGroups?: string[];
  note?: string;
  source: 'list' | 'generated';
  /** Line in the candidate file. */
  line?: number;
}

export interface CandidateSet {
  list: Candidate[];
  /** What a unit of `total` is: cost when every candidate has one, else km when every one has a length, else links. */
  unit: 'km' | 'cost' | 'link';
  source: 'list' | 'generated' | 'none';
  routeFactor?: number;
  maxKm?: number;
  notes: string[];
}

export interface CandidateOptions {
  routeFactor?: number;
  maxKm?: number;
}

const KEYS = new Set(['between', 'id', 'length_km', 'latency_ms', 'cost', 'risk_groups', 'note']);

/** The unit a candidate is priced in, and its price. */
export function price(c: Candidate, unit: CandidateSet['unit']): number {
  if (unit === 'cost') return c.cost ?? 0;
  if (unit === 'km') return c.lengthKm ?? 0;
  return 1;
}

function unitOf(list: readonly Candidate[]): CandidateSet['unit'] {
  if (list.length > 0 && list.every((c) => c.cost !== undefined)) return 'cost';
  if (list.length > 0 && list.every((c) => c.lengthKm !== undefined)) return 'km';
  return 'link';
}

/** Read the planner's candidate file against the head design. Throws PolicyError with file:line:col. */
export function parseCandidateFile(text: string, file: string, g: CompactGraph): CandidateSet {
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: false, uniqueKeys: true });
  const at = (node: Node | null | undefined) => {
    const p = node?.range ? lines.linePos(node.range[0]) : { line: 1, col: 1 };
    return { file, line: p.line, column: p.col };
  };
  if (doc.errors.length > 0) {
    const p = lines.linePos(doc.errors[0].pos[0]);
    throw new PolicyError(
      `the candidate list is not valid YAML: ${doc.errors[0].message.split('\n')[0]}`,
      { file, line: p.line, column: p.col },
      'check the indentation and quoting on this line',
    );
  }
  const root = doc.contents as Node | null;
  const hint = 'write "candidates:" followed by a list of {between: [a, b], length_km: …}';
  if (!isMap(root))
    throw new PolicyError('the candidate list must be a mapping with a "candidates" list', at(root), hint);
  const pair = root.items.find((p) => isScalar(p.key) && p.key.value === 'candidates');
  if (!pair || !isSeq(pair.value))
    throw new PolicyError('the candidate list has no "candidates" list', at((pair?.value as Node) ?? root), hint);
  const list: Candidate[] = [];
  const notes: string[] = [];
  const missing = new Set<string>();
  (pair.value.items as Node[]).forEach((item, i) => {
    const what = `candidate ${i + 1}`;
    if (!isMap(item)) throw new PolicyError(`${what} must be a mapping`, at(item), hint);
    const get = (k: string) => item.items.find((p) => isScalar(p.key) && p.key.value === k);
    for (const p of item.items) {
      const k = isScalar(p.key) ? String(p.key.value) : '';
      if (!KEYS.has(k))
        throw new PolicyError(`${what}: unknown key "${k}"`, at(p.key as Node), `known keys: ${[...KEYS].join(', ')}`);
    }
    const between = get('between');
    const ends = between && isSeq(between.value) ? (between.value.items as Node[]) : null;
    if (
      !ends ||
      ends.length !== 2 ||
      !ends.every((e) => isScalar(e) && (typeof e.value === 'string' || typeof e.value === 'number'))
    ) {
      throw new PolicyError(
        `${what}: "between" must list two site ids`,
        at((between?.value as Node) ?? item),
        'e.g. between: [north, south]',
      );
    }
    const [s, t] = ends.map((e) => String((e as { value: unknown }).value));
    if (s === t)
      throw new PolicyError(
        `${what}: a link from a site to itself adds nothing`,
        at(ends[1]),
        'name two different sites',
      );
    const num = (k: string): number | undefined => {
      const p = get(k);
      if (!p) return undefined;
      const v = isScalar(p.value) ? p.value.value : undefined;
      if (typeof v !== 'number' || !Number.isFinite(v) || v < 0)
        throw new PolicyError(`${what}: "${k}" must be a number ≥ 0`, at(p.value as Node), '');
      return v;
    };
    const str = (k: string): string | undefined => {
      const p = get(k);
      if (!p) return undefined;
      const v = isScalar(p.value) ? p.value.value : undefined;
      if (typeof v !== 'string' && typeof v !== 'number')
        throw new PolicyError(`${what}: "${k}" must be text`, at(p.value as Node), '');
      return String(v);
    };
    const lengthKm = num('length_km');
    const cost = num('cost');
    if (lengthKm === undefined && cost === undefined)
      throw new PolicyError(`${what} has neither "length_km" nor "cost"`, at(item), 'give its length or its cost');
    const rg = get('risk_groups');
    let riskGroups: string[] | undefined;
    if (rg) {
      if (!isSeq(rg.value) || !(rg.value.items as Node[]).every((x) => isScalar(x)))
        throw new PolicyError(`${what}: "risk_groups" must be a list of ids`, at(rg.value as Node), '');
      riskGroups = (rg.value.items as Node[]).map((x) => String((x as { value: unknown }).value));
    }
    const a = g.nodeIndex.get(s);
    const b = g.nodeIndex.get(t);
    if (a === undefined || b === undefined) {
      for (const id of [s, t]) if (!g.nodeIndex.has(id)) missing.add(id);
      return;
    }
    const c: Candidate = { a, b, source: 'list', line: at(item).line };
    const id = str('id');
    if (id !== undefined) c.id = id;
    if (lengthKm !== undefined) c.lengthKm = lengthKm;
    const latency = num('latency_ms');
    if (latency !== undefined) c.latencyMs = latency;
    if (cost !== undefined) c.cost = cost;
    if (riskGroups) c.riskGroups = riskGroups;
    const note = str('note');
    if (note !== undefined) c.note = note;
    list.push(c);
  });
  if (missing.size > 0) {
    const names = [...missing].slice(0, 5).join(', ');
    notes.push(
      `candidates naming sites this design does not have were skipped (${names}${missing.size > 5 ? ', …' : ''})`,
    );
  }
  return { list, unit: unitOf(list), source: 'list', notes };
}

/** Great-circle span of the longest existing link whose ends both have coordinates (km), or 0. */
function longestSpanKm(g: CompactGraph): number {
  let best = 0;
  if (!g.lat || !g.lon) return 0;
  for (let e = 0; e < g.m; e++) {
    const s = g.linkSource[e];
    const t = g.linkTarget[e];
    const d = greatCircleKm(g.lat[s], g.lon[s], g.lat[t], g.lon[t]);
    if (Number.isFinite(d) && d > best) best = d;
  }
  return best;
}

function adjacency(g: CompactGraph): Set<number> {
  const set = new Set<number>();
  for (let e = 0; e < g.m; e++) {
    const s = g.linkSource[e];
    const t = g.linkTarget[e];
    set.add(s < t ? s * g.n + t : t * g.n + s);
  }
  return set;
}

/**
 * Candidates when the planner keeps no list: with coordinates, every pair of sites not yet
 * joined whose great-circle distance is within `maxKm` (default: the longest span the design
 * already has, so suggestions stay within the reach of spans already built), length = distance
 * × route factor, rounded to 0.1 km; without coordinates, every pair of a design up to
 * ALL_PAIRS_LIMIT sites, else pairs within MAX_HOPS hops, length unknown (ranked per link).
 */
export function generateCandidates(g: CompactGraph, options: CandidateOptions = {}): CandidateSet {
  const routeFactor = options.routeFactor ?? DEFAULT_ROUTE_FACTOR;
  const joined = adjacency(g);
  const notes: string[] = [];
  const list: Candidate[] = [];
  const hasCoords = (v: number) =>
    g.lat !== null && g.lon !== null && Number.isFinite(g.lat[v]) && Number.isFinite(g.lon[v]);
  const located: number[] = [];
  for (let v = 0; v < g.n; v++) if (hasCoords(v)) located.push(v);
  if (located.length >= 2) {
    const maxKm = options.maxKm ?? longestSpanKm(g);
    const consider = (a: number, b: number) => {
      if (joined.has(a * g.n + b)) return;
      const d = greatCircleKm(g.lat![a], g.lon![a], g.lat![b], g.lon![b]);
      if (d <= maxKm) list.push({ a, b, lengthKm: Math.round(d * routeFactor * 10) / 10, source: 'generated' });
    };
    if (located.length <= GEO_ALL_PAIRS_LIMIT) {
      for (let i = 0; i < located.length; i++)
        for (let j = i + 1; j < located.length; j++) consider(located[i], located[j]);
    } else {
      for (const [a, b] of nearPairs(g)) if (hasCoords(a) && hasCoords(b)) consider(a, b);
      notes.push(`${located.length} located sites: only pairs within ${MAX_HOPS} hops were considered`);
    }
    list.sort((x, y) => x.lengthKm! - y.lengthKm! || x.a - y.a || x.b - y.b);
    if (list.length > MAX_GENERATED) {
      notes.push(
        `${list.length} site pairs lie within ${round1(maxKm)} km; the ${MAX_GENERATED} shortest were considered`,
      );
      list.length = MAX_GENERATED;
    }
    if (located.length < g.n)
      notes.push(`${g.n - located.length} sites have no coordinates and get no generated candidate`);
    return { list, unit: 'km', source: 'generated', routeFactor, maxKm: round1(maxKm), notes };
  }
  // No coordinates: lengths are unknown, every suggestion is priced per link.
  if (g.n <= ALL_PAIRS_LIMIT) {
    for (let a = 0; a < g.n; a++)
      for (let b = a + 1; b < g.n; b++) if (!joined.has(a * g.n + b)) list.push({ a, b, source: 'generated' });
    notes.push(
      'the design has no coordinates: every pair of sites not yet joined is a candidate, and lengths are unknown',
    );
  } else {
    for (const [a, b] of nearPairs(g)) list.push({ a, b, source: 'generated' });
    notes.push(
      `the design has no coordinates: site pairs within ${MAX_HOPS} hops are the candidates, and lengths are unknown`,
    );
  }
  return { list, unit: 'link', source: 'generated', notes };
}

/** Pairs a < b at 2 to MAX_HOPS hops, in order of a then b, at most MAX_GENERATED (the BFS touches only what it reaches). */
function nearPairs(g: CompactGraph): [number, number][] {
  const out: [number, number][] = [];
  const dist = new Int32Array(g.n).fill(-1);
  const queue = new Int32Array(g.n);
  for (let a = 0; a < g.n && out.length < MAX_GENERATED; a++) {
    let head = 0;
    let tail = 0;
    queue[tail++] = a;
    dist[a] = 0;
    while (head < tail) {
      const v = queue[head++];
      if (dist[v] >= MAX_HOPS) continue;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (dist[w] !== -1) continue;
        dist[w] = dist[v] + 1;
        queue[tail++] = w;
      }
    }
    const near: number[] = [];
    for (let i = 0; i < tail; i++) {
      const b = queue[i];
      if (b > a && dist[b] >= 2) near.push(b);
    }
    near.sort((x, y) => x - y);
    for (const b of near) if (out.length < MAX_GENERATED) out.push([a, b]);
    for (let i = 0; i < tail; i++) dist[queue[i]] = -1;
  }
  return out;
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}
