// The per-design work budget of a policy, in the engine's unit (one element visit, see
// src/envelope/evaluate.ts). A policy may give it as `work` (element visits), as `seconds`, or
// both; seconds are converted with one fixed rate, never with the clock, so a report stays a
// function of its inputs and seed (byte for byte on any machine): the budget is a ration of
// work, and `seconds` is only the unit people think in.
//
// The rate. Measured on 2026-12-01 on the development machine (one core of a 2-core AMD EPYC
// virtual machine, Node 20, shared with other jobs: load average 2–3), the built-in policy's
// evaluation of each design with no budget, planned work divided by wall time (best of two):
//   topology-zoo designs (Knight et al., IEEE JSAC 2011, CC BY 4.0):
//     Kdl (754 sites, 899 links)        2.69e9 visits in 55.9 s   4.8e7 visits/s
//     Cogentco (197, 245)               1.79e8 in 1.84 s          9.7e7
//     Colt, Interoute, Deltacom, Ion, TataNld, GtsCe, UsCarrier, DialtelecomCz (110–193 sites)
//                                                                 8.7e7 – 1.3e8
//     Pern (127, 129)                                             2.4e8
//   seeded synthetic graphs (test/envelope/graphs.ts):
//     preferential attachment, 100–1000 nodes, 2 links per node   3.2e8 – 4.1e8
//     32 × 32 grid (1024 nodes) under a 3e9 budget: 2.98e9 in 41.7 s   7.2e7
// The estimate counts every all-pairs metric as N searches per R, but the searches run 32
// sources at a time and their cost grows with the design's diameter, so the true rate spreads
// over almost a factor of ten between designs. A budget is a cap, so the conversion uses the
// slow end, the largest real design measured (rounded up): a budget of S seconds is about S
// seconds of engine time here on designs like Kdl, and less on most others.
export const ENGINE_VISITS_PER_SECOND = 5e7;

/**
 * The default budget: 60 s, i.e. 3e9 element visits. The built-in policy on a 1,000-node
 * design needs about 6.6e9 (a preferential-attachment graph, 17 s uncut here); under the
 * default it runs 79 of its 200 realizations in 11 s, and a 32 × 32 grid 76 in 42 s: within
 * about a minute on one CI core, for head and base each.
 */
export const DEFAULT_BUDGET_SECONDS = 60;

/** A budget as a policy writes it (either key may be left out). */
export interface BudgetLimits {
  work?: number;
  seconds?: number;
}

/** Element visits a budget allows: the smaller of `work` and `seconds` × the fixed rate. */
export function budgetWork(b: BudgetLimits): number {
  const fromSeconds = b.seconds === undefined ? Infinity : Math.floor(b.seconds * ENGINE_VISITS_PER_SECOND);
  const work = Math.min(b.work ?? Infinity, fromSeconds);
  if (work === Infinity) return budgetWork({ seconds: DEFAULT_BUDGET_SECONDS });
  return Math.max(1, Math.floor(work));
}
