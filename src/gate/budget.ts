// The policy's work budget, handed to the engine for one design: shared out between the
// engine runs of the design (evaluationSpecs may ask for more than one), and kept the same on
// base and head so that their realizations stay paired. Pure: the engine's own planner
// (planEvaluation) says what each budget would cut.
//
// Sharing. When a design's runs together need more than the budget, each gets the part of it
// that its unreduced work is of the total (the larger of the two sides' estimates, so base
// and head get the same budget per run). Otherwise every run gets the whole budget.
// Pairing. The engine cuts realizations by a factor that depends on the design's size, so a
// change of one element can leave base and head with, say, 86 and 85 realizations, which no
// longer pair. Where the budget cuts a random challenge on either side, both sides run the
// smaller count (repeated until the engine's plans agree; regional challenges are left to the
// engine, their epicentres are paired by site). The report says what was cut, from the
// policy's count, on both sides.

import { planEvaluation, type DesignEvaluation, type EvaluationSpec } from '../envelope/evaluate.js';
import type { ChallengeName } from '../challenges/types.js';
import type { CompactGraph } from '../graph/compact.js';

/** A random challenge both sides run with fewer realizations than asked. */
export interface PairedCut {
  /** Index of the engine run (spec) it belongs to. */
  spec: number;
  challenge: ChallengeName;
  /** Realizations the policy asks for, and those both sides run. */
  from: number;
  to: number;
  maxWork: number;
}

export interface BudgetedSpecs {
  head: EvaluationSpec[];
  base?: EvaluationSpec[];
  cuts: PairedCut[];
}

/** Most rounds of pairing; the counts only go down, so the plans agree after one or two. */
const PAIRING_ROUNDS = 8;

function withBudget(spec: EvaluationSpec, maxWork: number): EvaluationSpec {
  return { ...spec, challenges: spec.challenges.map((c) => ({ ...c })), budget: { maxWork } };
}

/** Each run's share of a design's budget (see the file comment). */
export function shareBudget(
  specs: readonly EvaluationSpec[],
  maxWork: number,
  graphs: readonly CompactGraph[],
): number[] {
  const need = specs.map((spec) =>
    Math.max(...graphs.map((g) => planEvaluation(g, { ...spec, budget: { maxWork: Infinity } }).work)),
  );
  const total = need.reduce((a, b) => a + b, 0);
  if (total <= maxWork) return specs.map(() => maxWork);
  return need.map((w) => Math.max(1, Math.floor((maxWork * w) / total)));
}

/** Band realizations each random challenge of a plan runs (regional left out). */
function bandCounts(g: CompactGraph, spec: EvaluationSpec): Map<ChallengeName, number> {
  const out = new Map<ChallengeName, number>();
  for (const it of planEvaluation(g, spec).items) {
    if (it.type === 'band' && it.params.challenge !== 'regional') out.set(it.params.challenge, it.params.realizations);
  }
  return out;
}

/** The engine requests for one design under a budget of `maxWork` element visits, paired across base and head. */
export function budgetSpecs(
  specs: readonly EvaluationSpec[],
  maxWork: number,
  head: CompactGraph,
  base?: CompactGraph,
): BudgetedSpecs {
  const shares = shareBudget(specs, maxWork, base ? [head, base] : [head]);
  const headSpecs = specs.map((s, i) => withBudget(s, shares[i]));
  if (!base) return { head: headSpecs, cuts: [] };
  const baseSpecs = specs.map((s, i) => withBudget(s, shares[i]));
  const cuts: PairedCut[] = [];
  specs.forEach((spec, i) => {
    const asked = bandCounts(head, { ...spec, budget: { maxWork: Infinity } });
    const lowered = new Set<ChallengeName>();
    for (let round = 0; round < PAIRING_ROUNDS; round++) {
      const h = bandCounts(head, headSpecs[i]);
      const b = bandCounts(base, baseSpecs[i]);
      let changed = false;
      for (const [challenge, count] of h) {
        const other = b.get(challenge);
        if (other === undefined || other === count) continue;
        const common = Math.min(count, other);
        for (const s of [headSpecs[i], baseSpecs[i]]) {
          const c = s.challenges.find((x) => x.challenge === challenge)!;
          c.realizations = common;
        }
        lowered.add(challenge);
        changed = true;
      }
      if (!changed) break;
    }
    const final = bandCounts(head, headSpecs[i]);
    for (const challenge of lowered) {
      const from = asked.get(challenge)!;
      const to = final.get(challenge)!;
      if (to < from) cuts.push({ spec: i, challenge, from, to, maxWork: shares[i] });
    }
  });
  return { head: headSpecs, base: baseSpecs, cuts };
}

/**
 * The head's engine requests with the realizations the policy asks for: pairing's lowered
 * counts undone. A design's size (its unreduced work, gate-request.ts) is judged on these; the
 * lowered counts are a budget's doing and would make a large design look small.
 */
export function askedSpecs(b: BudgetedSpecs): EvaluationSpec[] {
  return b.head.map((spec, i) => ({
    ...spec,
    challenges: spec.challenges.map((c) => {
      const cut = b.cuts.find((x) => x.spec === i && x.challenge === c.challenge);
      return cut ? { ...c, realizations: cut.from } : c;
    }),
  }));
}

/**
 * Restate, on one side's result of engine run `spec`, the cuts that pairing made: the engine
 * saw only the lowered count, so its own words would start from it, or say nothing.
 */
export function notePairedCuts(result: DesignEvaluation, cuts: readonly PairedCut[], spec: number): void {
  for (const cut of cuts) {
    if (cut.spec !== spec) continue;
    const env = result.evaluation.envelopes.find((e) => e.challenge === cut.challenge);
    // Stopped early by its decisions (maxRealizations): the budget did not decide the count.
    if (!env || env.realizations >= cut.from || env.maxRealizations !== undefined) continue;
    const reason =
      `realizations reduced from ${cut.from} to ${env.realizations} by the work budget (${cut.maxWork} element visits), ` +
      'on base and head alike so that they stay paired';
    const others = (env.degraded ?? '')
      .split('; ')
      .filter((part) => part !== '' && !part.startsWith('realizations reduced from'));
    env.degraded = [reason, ...others].join('; ');
    const prefix = `${cut.challenge}: `;
    const line = `${prefix}${env.degraded}`;
    const list = result.evaluation.degraded;
    const at = list.findIndex((d) => d.startsWith(prefix));
    if (at >= 0) list[at] = line;
    else list.push(line);
  }
}
