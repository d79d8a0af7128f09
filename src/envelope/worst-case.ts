// The weakest removal sequence of length k against R — the bottom contour of the envelope.
// Minimising R over k-sets is NP-hard in general (the critical node problem, docs/METHODS.md §6.6), so:
// - exact: k ≤ 2 and C(E, k) within the limit — every single element / pair is evaluated;
// - beam: width B > 1 — the B best partial sequences are extended by every element each step;
// - greedy: adaptive greedy — each step removes the element whose loss leaves the lowest R.
// Beam and greedy results are the best attack found: an upper bound on the true worst case
// (Lordan & Albareda-Sambola 2019 show greedy adaptive falls short of the optimum).
// Ties go to the lexicographically smallest index sequence: the elements first in canonical
// (natural id) order, graph/canonical.ts — never to where the file lists them.

import type { CompactGraph } from '../graph/compact.js';
import { copyMask, createMask, type Mask } from '../graph/mask.js';
import { eligibleUnits, removeUnit, unitIds } from '../challenges/units.js';
import type { WorstCase } from './types.js';
import type { ElementKind } from '../graph/element.js';
import type { RFunction } from './r-value.js';

export interface WorstCaseOptions {
  /** Largest number of subsets the exact search may evaluate. */
  exactLimit: number;
  /** Beam width; 1 = greedy. */
  beam: number;
}

/** Number of k-subsets of e elements, as a float (k ≤ 2 is all that is needed). */
export function subsets(e: number, k: number): number {
  if (k <= 0) return 1;
  if (k === 1) return e;
  let c = 1;
  for (let i = 0; i < k; i++) c = (c * (e - i)) / (i + 1);
  return Math.max(0, Math.round(c));
}

/** R with unit u removed on top of `mask`, leaving `mask` unchanged. */
function tryUnit(g: CompactGraph, kind: ElementKind, mask: Mask, trial: Mask, u: number, rfn: RFunction): number {
  if (kind === 'node' || kind === 'link') {
    const bits = kind === 'node' ? mask.node : mask.link;
    if (bits[u]) return rfn(mask);
    bits[u] = 1;
    const r = rfn(mask);
    bits[u] = 0;
    return r;
  }
  copyMask(mask, trial);
  removeUnit(g, trial, kind, u);
  return rfn(trial);
}

export function searchWorstCase(
  g: CompactGraph,
  kind: ElementKind,
  k: number,
  rfn: RFunction,
  options: WorstCaseOptions,
): WorstCase {
  const eligible = eligibleUnits(g, kind);
  const units: number[] = [];
  for (let u = 0; u < eligible.length; u++) if (eligible[u]) units.push(u);
  const steps = Math.min(k, units.length);
  const ids = unitIds(g, kind);
  const done = (seq: number[], values: number[], method: WorstCase['method']): WorstCase => ({
    kind,
    k: steps,
    method,
    elements: seq.map((u) => ids[u]),
    values,
  });
  if (steps === 0) return done([], [], 'exact');
  const mask = createMask(g);
  const trial = createMask(g);

  if (steps <= 2 && subsets(units.length, steps) <= options.exactLimit) {
    const single = units.map((u) => tryUnit(g, kind, mask, trial, u, rfn));
    if (steps === 1) {
      let best = 0;
      for (let i = 1; i < units.length; i++) if (single[i] < single[best]) best = i;
      return done([units[best]], [single[best]], 'exact');
    }
    let bestR = Infinity;
    let bi = -1;
    let bj = -1;
    for (let i = 0; i < units.length; i++) {
      removeUnit(g, mask, kind, units[i]);
      for (let j = i + 1; j < units.length; j++) {
        const r = tryUnit(g, kind, mask, trial, units[j], rfn);
        if (r < bestR) {
          bestR = r;
          bi = i;
          bj = j;
        }
      }
      mask.node.fill(0);
      mask.link.fill(0);
    }
    // Report the pair in the order that hurts first: the worse single element leads.
    const [a, b] = single[bj] < single[bi] ? [bj, bi] : [bi, bj];
    return done([units[a], units[b]], [single[a], bestR], 'exact');
  }

  const width = Math.max(1, Math.floor(options.beam));
  interface State {
    seq: number[];
    values: number[];
    mask: Mask;
  }
  let beam: State[] = [{ seq: [], values: [], mask: createMask(g) }];
  for (let step = 0; step < steps; step++) {
    const candidates: { parent: State; u: number; r: number; key: string }[] = [];
    for (const state of beam) {
      const used = new Set(state.seq);
      for (const u of units) {
        if (used.has(u)) continue;
        candidates.push({ parent: state, u, r: tryUnit(g, kind, state.mask, trial, u, rfn), key: '' });
      }
    }
    if (candidates.length === 0) break;
    // Lowest R first; then the lexicographically smallest set, so equal sets reached in
    // different orders are kept once and ties go to the lowest indices (natural id order).
    for (const c of candidates) c.key = [...c.parent.seq, c.u].sort((x, y) => x - y).join(',');
    candidates.sort(
      (x, y) => x.r - y.r || compareKeys(x.key, y.key) || compareSeq([...x.parent.seq, x.u], [...y.parent.seq, y.u]),
    );
    const next: State[] = [];
    const seen = new Set<string>();
    for (const c of candidates) {
      if (next.length >= width) break;
      if (seen.has(c.key)) continue;
      seen.add(c.key);
      const m = createMask(g);
      copyMask(c.parent.mask, m);
      removeUnit(g, m, kind, c.u);
      next.push({ seq: [...c.parent.seq, c.u], values: [...c.parent.values, c.r], mask: m });
    }
    beam = next;
  }
  const best = beam[0];
  return done(best.seq, best.values, width > 1 ? 'beam' : 'greedy');
}

function compareKeys(a: string, b: string): number {
  return compareSeq(a.split(',').map(Number), b.split(',').map(Number));
}

function compareSeq(a: number[], b: number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}
