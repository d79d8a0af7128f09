// What a weak point or a removal sequence costs, as the report states it: the sites cut off
// from the largest part (with labels and lines) and, when the design has demands, the demands
// that lose every path and their volume. The counting is graph/consequence.ts; this module
// turns it into report data and puts it, with every element's line and label, on the
// sequences the report lists (worst cases, weakest realizations).

import { removeUnit } from '../challenges/units.js';
import type { CompactGraph } from '../graph/compact.js';
import { removalCost } from '../graph/consequence.js';
import { indexOfElement, locateElement, reportElement } from '../graph/element.js';
import { createMask, type Mask } from '../graph/mask.js';
import { findComponents, type Components } from '../graph/structure.js';
import type { AttackCurve, Contingency, Envelope, RemovalSequence } from '../envelope/types.js';
import type { Consequence } from '../graph/consequence.js';
import type { Evaluation } from '../envelope/types.js';

/** Sites a consequence lists by name; the count says how many there are in all. */
export const MAX_STRANDED = 20;

/**
 * Weak points whose cost a requirement works out: each costs a pass over the design, so a
 * change that turns a large mesh into a tree would otherwise take time quadratic in its size.
 * Findings beyond it carry no consequence, and a notice says so.
 */
export const MAX_COSTED = 500;

/** The report's consequence of the removal `mask` (`intact`: the design's components, when known). */
export function consequenceOf(g: CompactGraph, mask: Mask, intact?: Components): Consequence {
  const cost = removalCost(g, mask, intact);
  const out: Consequence = {
    stranded: cost.stranded.slice(0, MAX_STRANDED).map((v) => reportElement(g, 'node', v)),
    strandedCount: cost.stranded.length,
  };
  if (g.demandSource.length > 0) {
    out.demandsLost = cost.demandsLost.length;
    out.demandsTotal = g.demandSource.length;
    out.volumeLost = cost.volumeLost;
    out.volumeTotal = cost.volumeTotal;
  }
  return out;
}

/** The consequence of a removal described by `remove`, which marks a fresh mask. */
export function costOf(g: CompactGraph, remove: (mask: Mask) => void, intact?: Components): Consequence {
  const mask = createMask(g);
  remove(mask);
  return consequenceOf(g, mask, intact);
}

/** The mask after every element of a sequence is removed (groups lose their links that are not hardened, as in the challenges). */
export function sequenceMask(g: CompactGraph, seq: RemovalSequence): Mask {
  const mask = createMask(g);
  for (const id of seq.elements) {
    const i = indexOfElement(g, seq.kind, id);
    if (i >= 0) removeUnit(g, mask, seq.kind, i);
  }
  return mask;
}

function detailed<T extends RemovalSequence>(g: CompactGraph, seq: T, intact: Components): T {
  return {
    ...seq,
    located: seq.elements.map((id) => locateElement({ id, kind: seq.kind }, g)),
    consequence: consequenceOf(g, sequenceMask(g, seq), intact),
  };
}

/**
 * The evaluation as the report shows it: every worst case and weakest realization carries its
 * elements' lines and labels and what the whole sequence costs (N−1 worst cases their
 * elements' lines and labels). A copy; the engine's result
 * (which base and head may share) is left as it was.
 */
export function withSequenceDetails(ev: Evaluation, g: CompactGraph): Evaluation {
  const intact = findComponents(g);
  const envelopes = ev.envelopes.map((env): Envelope => {
    const out: Envelope = { ...env, weakest: env.weakest.map((s) => detailed(g, s, intact)) };
    if (env.worstCase) out.worstCase = detailed(g, env.worstCase, intact);
    return out;
  });
  const attacks = ev.attacks.map((a): AttackCurve =>
    a.worstCase ? { ...a, worstCase: detailed(g, a.worstCase, intact) } : a,
  );
  const contingencies = ev.contingencies.map((c): Contingency => ({
    ...c,
    worst: c.worst.map((w) => ({ ...w, located: w.elements.map((id) => locateElement({ id, kind: c.kind }, g)) })),
  }));
  return { ...ev, envelopes, attacks, contingencies };
}
