import type { CompactGraph } from '../graph/compact.js';
import { formatDelta, formatFixed } from '../report/format.js';
import type { ChallengeDef, Requirement } from '../policy/types.js';
import type { AttributeChange, FileReport } from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
import type { Topology } from '../topology/model.js';
import type { Matching } from './rename.js';
/** R values and deltas: three decimals (or more when asked), a true minus sign, no "-0.000". */
export declare const formatR: typeof formatFixed;
/**
 * The fewest decimals (at least `min`) at which `a` and `b` print differently, so that a message
 * shows the digits that decide (a drop of 0.0104 against an allowance of 0.010 prints as 0.0104
 * and 0.0100, never as "0.010, more than the allowed 0.010"). Rounding is monotone, so values
 * that print differently print in their true order. `min` when they are equal or not finite.
 */
export declare function decidingDecimals(a: number, b: number, min?: number): number;
/**
 * Decimals for "dropped from B to H (Δ D), more than the allowed A": the fewest (at least 3)
 * at which the drop and the limit print differently and the drop between B and H as printed
 * lies on the same side of the printed limit as the true drop, so that nobody can subtract the
 * shown numbers and reach the opposite verdict. `drop` = base − head when higher is better.
 */
export declare function changeDecimals(base: number, head: number, higherIsBetter: boolean, limit: number): number;
/** A signed delta with its standard error, both at `decimals` decimals: "−0.0104 ± 0.0020" (report/format.ts). */
export { formatDelta };
/** One line naming what a requirement judges, e.g. `10 % quantile of R at 20 % of nodes removed, "fail" (random nodes) ≥ 0.6`. */
export declare function describeRequirement(r: Requirement, challenges: readonly ChallengeDef[]): string;
export type ElementChanges = NonNullable<FileReport['changes']>;
/**
 * What the change does to the design's elements, read through the matching of base and head:
 * nodes, links and shared-risk groups without a counterpart are removed (base line) or added
 * (head line); matched nodes and groups whose id changed are renamed; matched elements whose
 * hardened flag changed are listed with the flag they have now (see hardenedChanges).
 */
export declare function elementChanges(base: CompactGraph, head: CompactGraph, m: Matching): ElementChanges;
/**
 * Matched nodes and links whose hardened flag the change set or cleared, in head file order
 * (nodes, then links), each with the flag it has at head. Hardening changes what the
 * challenges may remove, so it is a change to the design even when no element moved.
 */
export declare function hardenedChanges(base: CompactGraph, head: CompactGraph, m: Matching): (ReportElement & {
    hardened: boolean;
})[];
/** The kinds of weak point a no-new-spof requirement counts, each in a row of its own. */
export type SpofPart = 'bridges' | 'cut-nodes' | 'risk-groups';
/** The rows of a no-new-spof requirement: bridges, cut nodes and stranding groups are counted apart, never added. */
export declare function spofRowParts(r: Requirement & {
    kind: 'no-new-spof';
}): {
    id: string;
    description: string;
    kind: SpofPart;
}[];
/**
 * The attributes the change alters on nodes (by id) and links (by stable key: their ends) that
 * both sides have — labels, kinds, coordinates, hardening, risk-group membership, lengths,
 * latencies, capacities, weights — with the element's line on each side. Elements added,
 * removed or renamed are elementChanges' part.
 */
export declare function attributeChanges(base: Topology, head: Topology): AttributeChange[];
