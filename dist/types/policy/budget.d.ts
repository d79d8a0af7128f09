export declare const ENGINE_VISITS_PER_SECOND = 50000000;
/**
 * The default budget: 60 s, i.e. 3e9 element visits. The built-in policy on a 1,000-node
 * preferential-attachment design needs about 5.7e8 (11 s) and runs whole; a 32 × 32 grid needs
 * 5.6e9 and runs 103 of its 200 realizations; a 4,000-node one runs 10 (the least) and its
 * adaptive degree attack alone, which is not reduced, is estimated at about 100 s.
 */
export declare const DEFAULT_BUDGET_SECONDS = 60;
/** A budget as a policy writes it (either key may be left out). */
export interface BudgetLimits {
    visits?: number;
    seconds?: number;
}
/** Element visits a budget allows: the smaller of `visits` and `seconds` × the fixed rate. */
export declare function budgetWork(b: BudgetLimits): number;
