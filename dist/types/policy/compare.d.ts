import type { PolicyChange } from '../report/report.js';
import type { Policy } from './types.js';
/** `judging` → `proposed`: every difference that loosens or tightens, in the proposed file's order. */
export declare function policyChanges(judging: Policy, proposed: Policy): PolicyChange[];
