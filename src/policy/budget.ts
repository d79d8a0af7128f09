// The per-design work budget of a policy, in the engine's unit (one element visit, see
// src/envelope/evaluate.ts). A policy may give it as `visits` (element visits), as `seconds`, or
// both; seconds are converted with one fixed rate, never with the clock, so a report stays a
// function of its inputs and seed (byte for byte on any machine): the budget is a ration of
// work, and `seconds` is only the unit people think in.
//
// The rate. One unit of work ("element visit") is about 1/5e7 s of engine time on one core of
// the development machine (a 2-core AMD EPYC virtual machine, Node 20, shared with other jobs:
// load average 2–7). Until 2026-12 the estimate counted every all-pairs metric as N plain
// searches per R, which the bit-parallel search (256 sources per sweep) and survivors that fall
// into pieces made from 0.07 to 8.8 times the real time. The estimate now follows what each
// kernel does on the survivors (envelope/cost.ts), with unit costs fitted to time on
// preferential-attachment graphs (250–4,000 nodes), G(n, L), a grid, a ring and Topology Zoo
// designs (Knight et al., IEEE JSAC 2011, CC BY 4.0); test/bench/budget.bench.ts prints
// estimate against time per design and challenge, and for the envelope and explain commands.
// The rate itself is unchanged, so a budget of S seconds is still about S seconds of engine
// time here, now within about 2× on every design measured instead of up to 9×.
export const ENGINE_VISITS_PER_SECOND = 5e7;

/**
 * The default budget: 60 s, i.e. 3e9 element visits. The built-in policy on a 1,000-node
 * preferential-attachment design needs about 5.7e8 (11 s) and runs whole; a 32 × 32 grid needs
 * 5.6e9 and runs 103 of its 200 realizations; a 4,000-node one runs 10 (the least) and its
 * adaptive degree attack alone, which is not reduced, is estimated at about 100 s.
 */
export const DEFAULT_BUDGET_SECONDS = 60;

/** A budget as a policy writes it (either key may be left out). */
export interface BudgetLimits {
  visits?: number;
  seconds?: number;
}

/** Element visits a budget allows: the smaller of `visits` and `seconds` × the fixed rate. */
export function budgetWork(b: BudgetLimits): number {
  const fromSeconds = b.seconds === undefined ? Infinity : Math.floor(b.seconds * ENGINE_VISITS_PER_SECOND);
  const work = Math.min(b.visits ?? Infinity, fromSeconds);
  if (work === Infinity) return budgetWork({ seconds: DEFAULT_BUDGET_SECONDS });
  return Math.max(1, Math.floor(work));
}
