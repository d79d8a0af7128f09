// What a challenge removes, one "unit" at a time: a node, a link, or a shared-risk group (all of
// its links at once). Units are integer indices in the compact graph's canonical order
// (graph/canonical.ts); ids are restored only here.

import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { ElementKind } from '../graph/element.js';

export function unitCount(g: CompactGraph, kind: ElementKind): number {
  return kind === 'node' ? g.n : kind === 'link' ? g.m : g.groupIds.length;
}

/** Display ids (what reports show). */
export function unitIds(g: CompactGraph, kind: ElementKind): readonly string[] {
  return kind === 'node' ? g.nodeIds : kind === 'link' ? g.linkIds : g.groupIds;
}

/** Stable ids that seed random orders: node ids, link keys (end ids + occurrence), group ids. */
export function unitKeys(g: CompactGraph, kind: ElementKind): readonly string[] {
  return kind === 'node' ? g.nodeIds : kind === 'link' ? g.linkKeys : g.groupIds;
}

/** 1 for units a challenge may remove: not hardened; a group needs one link that is not hardened. */
export function eligibleUnits(g: CompactGraph, kind: ElementKind): Uint8Array {
  const count = unitCount(g, kind);
  const out = new Uint8Array(count);
  for (let u = 0; u < count; u++) out[u] = isEligible(g, kind, u) ? 1 : 0;
  return out;
}

export function isEligible(g: CompactGraph, kind: ElementKind, u: number): boolean {
  if (kind === 'node') return g.nodeHardened[u] === 0;
  if (kind === 'link') return g.linkHardened[u] === 0;
  for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++)
    if (g.linkHardened[g.groupLinks[p]] === 0) return true;
  return false;
}

/** Marks unit u removed in the mask. A group removes its links that are not hardened. */
export function removeUnit(g: CompactGraph, mask: Mask, kind: ElementKind, u: number): void {
  if (kind === 'node') mask.node[u] = 1;
  else if (kind === 'link') mask.link[u] = 1;
  else {
    for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) {
      const e = g.groupLinks[p];
      if (g.linkHardened[e] === 0) mask.link[e] = 1;
    }
  }
}

/** Undoes removeUnit (for searches that try a unit and put it back). */
export function restoreUnit(g: CompactGraph, mask: Mask, kind: ElementKind, u: number): void {
  if (kind === 'node') mask.node[u] = 0;
  else if (kind === 'link') mask.link[u] = 0;
  else for (let p = g.groupOffsets[u]; p < g.groupOffsets[u + 1]; p++) mask.link[g.groupLinks[p]] = 0;
}

/**
 * Units removed at fraction x of the original count: the real number x·count, capped by what
 * may be removed. It is whole when x·count is (up to the grid's 12-decimal rounding); otherwise
 * R there is read between the two neighbouring whole counts (valueAtCount), so that a value at
 * a fraction moves continuously with the design's size instead of jumping where rounding does.
 */
export function countAt(x: number, count: number, eligible: number): number {
  const c = Math.min(x * count, eligible);
  const whole = Math.round(c);
  return Math.abs(c - whole) <= 1e-9 * Math.max(1, whole) ? whole : c;
}

/** Whole units a removal order must hold to reach fraction x: ⌈countAt⌉. */
export function stepsAt(x: number, count: number, eligible: number): number {
  return Math.ceil(countAt(x, count, eligible));
}

/**
 * R at a real removal count c from R after whole counts (values[k] after k removals): linear
 * between ⌊c⌋ and ⌈c⌉, exactly values[c] when c is whole. NaN when ⌈c⌉ is beyond the values.
 */
export function valueAtCount(values: ArrayLike<number>, c: number): number {
  const lo = Math.floor(c);
  const hi = Math.ceil(c);
  if (!(lo >= 0) || hi >= values.length) return Number.NaN;
  return lerp(values[lo], values[hi], c - lo);
}

/** a + w·(b − a): exactly a at w = 0 and when a = b (so equal neighbours never drift). */
export function lerp(a: number, b: number, w: number): number {
  return w === 0 || a === b ? a : a + w * (b - a);
}

export function countOnes(a: Uint8Array): number {
  let c = 0;
  for (let i = 0; i < a.length; i++) c += a[i];
  return c;
}
