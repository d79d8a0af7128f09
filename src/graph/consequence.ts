// What a removal costs, on connectivity alone: which surviving sites are cut off from the
// largest part, and which demands lose every path. The planner's question after "is this a
// weak point?" is "what do we lose?": this answers it without R, in sites and traffic.
//
// A site counts as cut off when it survives, is not in the largest part after the removal, and
// shared a part with it before (so an island that was already separate is not blamed on the
// removal). A demand is lost when its two ends were connected before and are not after (an end
// removed, or in different parts); hop counts and latency budgets are not considered, so a
// demand that keeps a path too long for its budget is not counted here. Pure; O(n + m).

import type { CompactGraph } from './compact.js';
import { createMask, type Mask } from './mask.js';
import { findComponents, type Components } from './structure.js';
import type { ReportElement } from './element.js';

/**
 * What losing an element (or a whole removal sequence) costs, on connectivity alone: the
 * surviving sites cut off from the largest part and, when the design has demands, the demands
 * whose two ends no longer share a part (latency budgets are not considered here).
 */
export interface Consequence {
  /** Surviving sites cut off from the largest part, in file order (at most MAX_STRANDED listed). */
  stranded: ReportElement[];
  /** How many sites are cut off (the list may be shorter). */
  strandedCount: number;
  /** Demands that were connected and lose every path, and how many demands the design has. */
  demandsLost?: number;
  demandsTotal?: number;
  /** Their volume, and the volume of all demands (the design's own unit). */
  volumeLost?: number;
  volumeTotal?: number;
}

export interface RemovalCost {
  /** Node indices cut off from the largest part, ascending (file order). */
  stranded: number[];
  /** Demands (indices) that were connected and no longer are, ascending. */
  demandsLost: number[];
  volumeLost: number;
  /** Every demand's volume, for "x of y". */
  volumeTotal: number;
}

/** The cost of the removal `mask` against the intact design (`intact`: its components, when the caller has them). */
export function removalCost(
  g: CompactGraph,
  mask: Mask,
  intact: Components = findComponents(g, createMask(g)),
): RemovalCost {
  const before = intact;
  const after = findComponents(g, mask);
  const stranded: number[] = [];
  if (after.largest >= 0) {
    // The intact part the largest surviving part belongs to.
    let home = -1;
    for (let v = 0; v < g.n && home < 0; v++) if (after.label[v] === after.largest) home = before.label[v];
    for (let v = 0; v < g.n; v++) {
      if (mask.node[v] || after.label[v] === after.largest) continue;
      if (before.label[v] === home) stranded.push(v);
    }
  }
  const demandsLost: number[] = [];
  let volumeLost = 0;
  let volumeTotal = 0;
  for (let d = 0; d < g.demandSource.length; d++) {
    const s = g.demandSource[d];
    const t = g.demandTarget[d];
    volumeTotal += g.demandVolume[d];
    if (s < 0 || t < 0 || before.label[s] !== before.label[t]) continue;
    const served = !mask.node[s] && !mask.node[t] && after.label[s] === after.label[t];
    if (!served) {
      demandsLost.push(d);
      volumeLost += g.demandVolume[d];
    }
  }
  return { stranded, demandsLost, volumeLost, volumeTotal };
}
