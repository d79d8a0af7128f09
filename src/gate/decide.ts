// The decisions a sequential run waits for (docs/METHODS.md §7.6): for a requirement on a random
// challenge, whether the head is above or below its floor, and whether the change is beyond or
// within the allowed drop, each settled by anytime-valid confidence sequences
// (envelope/confidence-sequence.ts) or still open. Pure; shared by the stopping rule
// (run-gate.ts) and the judging (compare.ts), so the run stops exactly when the judging could
// say "holds", "short", "weakened" or "within the allowance" without a doubt.
//
// Bounds of a statistic on one side, at level α (Bonferroni over the events each needs):
//   quantile q at x   the quantile CS of column x
//   mean at x         the mean CS of column x
//   area              grid mean (x_1..x_K) of the medians' CSs, each at α/K
//   spread            grid mean of hi-quantile CS minus lo-quantile CS, each at α/(2K)
//   min               no CS: the least of the policy's realizations is a sample statistic;
//                     a head already below its floor stays below, anything else waits for all
// The change: [head.lo − base.hi, head.hi − base.lo] with each side at α/2, unpaired and
// therefore conservative; exactly [0, 0] when both sides are one evaluation (an unchanged design).
// Sampled sources (r-value sources): every realization's R then shares one fixed sampling error,
// which no number of realizations averages out. Each side's confidence sequence then runs at
// α/2 and its bounds widen by z·se, z = Φ⁻¹(1 − α/4), se that side's source error (evaluate.ts
// sourceSampling): a normal bound on the sample mean with the other α/2 (Bonferroni).

import { meanBounds, quantileBounds, type Bounds } from '../envelope/confidence-sequence.js';
import type { DesignEvaluation } from '../envelope/evaluate.js';
import { sortedColumn } from '../envelope/summary.js';
import { normalQuantile } from '../envelope/quantiles.js';
import type { Envelope } from '../envelope/types.js';
import { gridIndex } from '../challenges/grid.js';
import type { ChallengeDef, FilePolicy, Requirement } from '../policy/types.js';

/** Error probability of each decision (floor, weakening) of a requirement: 5 % (common practice). */
export const DECISION_ALPHA = 0.05;

export type FloorDecision = 'above' | 'below' | 'open';
export type WeakeningDecision = 'beyond' | 'within' | 'open';

export interface Decision {
  head: Bounds;
  delta?: Bounds;
  floor?: FloorDecision;
  weakening?: WeakeningDecision;
  /** True for a minimum: it is settled only by all realizations (or a value below its floor). */
  needsAll?: boolean;
}

/** The statistic of a random-challenge requirement, as the bounds need it; undefined for others. */
type Stat =
  | { kind: 'quantile'; q: number; x: number }
  | { kind: 'mean'; x: number }
  | { kind: 'min'; x: number }
  | { kind: 'area' }
  | { kind: 'spread' };

function statOf(r: Requirement): Stat | undefined {
  if (r.kind === 'area-floor') return { kind: 'area' };
  if (r.kind === 'spread-ceiling') return { kind: 'spread' };
  if (r.kind !== 'r-threshold' || r.at === undefined) return undefined;
  const s = r.statistic;
  if (s.kind === 'quantile') return { kind: 'quantile', q: s.q, x: r.at };
  if (s.kind === 'median') return { kind: 'quantile', q: 0.5, x: r.at };
  if (s.kind === 'mean') return { kind: 'mean', x: r.at };
  if (s.kind === 'min') return { kind: 'min', x: r.at };
  return undefined;
}

/** Bounds of the statistic on one side; undefined when the side lacks the envelope or the grid point. */
export function sideBounds(
  stat: Stat,
  env: Envelope,
  samples: readonly Float64Array[],
  alpha: number,
): Bounds | undefined {
  const points = env.x.length;
  if (stat.kind === 'area' || stat.kind === 'spread') {
    const k = points - 1;
    if (k < 1) return undefined;
    let lo = 0;
    let hi = 0;
    for (let j = 1; j < points; j++) {
      const col = sortedColumn(samples, j);
      if (stat.kind === 'area') {
        const b = quantileBounds(col, 0.5, alpha / k);
        lo += b.lo;
        hi += b.hi;
      } else {
        const a = quantileBounds(col, env.band[0], alpha / (2 * k));
        const b = quantileBounds(col, env.band[1], alpha / (2 * k));
        lo += Math.max(0, b.lo - a.hi);
        hi += b.hi - a.lo;
      }
    }
    return { lo: lo / k, hi: hi / k };
  }
  const j = gridIndex(env.x, stat.x);
  if (j < 0) return undefined;
  const col = sortedColumn(samples, j);
  if (stat.kind === 'quantile') return quantileBounds(col, stat.q, alpha);
  if (stat.kind === 'mean') return meanBounds(col, alpha);
  // Minimum: the least so far is an upper bound of the least of all; nothing bounds it below.
  return { lo: 0, hi: col.length ? col[0] : 1 };
}

export interface DecisionInput {
  requirement: Requirement;
  challenge: ChallengeDef | undefined;
  head: DesignEvaluation;
  base?: DesignEvaluation;
  weakening: FilePolicy['weakening'];
  /** Point estimates of the base value, for a relative allowance. */
  baseValue: number | null;
  /** The head's point estimate (a floor it misses at the maximum is short, as without a CS). */
  threshold: number | null;
  higherIsBetter: boolean;
}

/** The allowed drop, as compare.ts applies it. */
export function allowanceOf(weakening: FilePolicy['weakening'], base: number): number {
  return Math.max(weakening.allowedDrop ?? 0, (weakening.allowedRelativeDrop ?? 0) * Math.abs(base));
}

/** The decisions of one requirement on a random challenge; undefined for any other requirement. */
export function decide(input: DecisionInput): Decision | undefined {
  const { requirement: r, challenge: c } = input;
  if (!c?.random) return undefined;
  const stat = statOf(r);
  if (!stat) return undefined;
  const env = input.head.evaluation.envelopes.find((e) => e.challenge === c.engine);
  const samples = input.head.samples.get(c.engine);
  if (!env || !samples) return undefined;
  const srcHead = input.head.evaluation.sampling?.se ?? 0;
  const srcBase = input.base?.evaluation.sampling?.se ?? 0;
  const sampled = srcHead > 0 || srcBase > 0;
  const alpha = sampled ? DECISION_ALPHA / 2 : DECISION_ALPHA;
  const z = normalQuantile(1 - DECISION_ALPHA / 4);
  const head = widen(sideBounds(stat, env, samples, alpha), z * srcHead);
  if (!head) return undefined;
  const out: Decision = { head };
  if (stat.kind === 'min') out.needsAll = true;
  const t = input.threshold;
  if (t !== null) {
    const clear = input.higherIsBetter ? head.lo >= t : head.hi <= t;
    const missed = input.higherIsBetter ? head.hi < t : head.lo > t;
    out.floor = missed ? 'below' : clear && stat.kind !== 'min' ? 'above' : 'open';
  }
  const base = input.base;
  if (base && input.baseValue !== null) {
    const baseEnv = base.evaluation.envelopes.find((e) => e.challenge === c.engine);
    const baseSamples = base.samples.get(c.engine);
    if (base === input.head) out.delta = { lo: 0, hi: 0 };
    else if (baseEnv && baseSamples && stat.kind !== 'min') {
      const h = sideBounds(stat, env, samples, alpha / 2);
      const b = sideBounds(stat, baseEnv, baseSamples, alpha / 2);
      if (h && b) {
        const shift = z * Math.hypot(srcHead, srcBase);
        out.delta = { lo: h.lo - b.hi - shift, hi: h.hi - b.lo + shift };
      }
    }
    if (out.delta) {
      const allowance = allowanceOf(input.weakening, input.baseValue);
      const drop = input.higherIsBetter ? { lo: -out.delta.hi, hi: -out.delta.lo } : out.delta;
      out.weakening = drop.lo > allowance ? 'beyond' : drop.hi <= allowance ? 'within' : 'open';
    } else out.weakening = 'open';
  }
  return out;
}

/** Bounds widened by `by` on both sides (a fixed error no realization averages out). */
function widen(b: Bounds | undefined, by: number): Bounds | undefined {
  return b && by > 0 ? { lo: b.lo - by, hi: b.hi + by } : b;
}

/** Whether a decision still waits for realizations. */
export function isOpen(d: Decision): boolean {
  return d.floor === 'open' || d.weakening === 'open';
}
