export declare const ENGINE_VISITS_PER_SECOND = 50000000;
/**
 * The default budget: 60 s, i.e. 3e9 element visits. The built-in policy on a 1,000-node
 * design needs about 6.6e9 (a preferential-attachment graph, 17 s uncut here); under the
 * default it runs 79 of its 200 realizations in 11 s, and a 32 × 32 grid 76 in 42 s: within
 * about a minute on one CI core, for head and base each.
 */
export declare const DEFAULT_BUDGET_SECONDS = 60;
/** A budget as a policy writes it (either key may be left out). */
export interface BudgetLimits {
    work?: number;
    seconds?: number;
}
/** Element visits a budget allows: the smaller of `work` and `seconds` × the fixed rate. */
export declare function budgetWork(b: BudgetLimits): number;
