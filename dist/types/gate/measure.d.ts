import type { DesignEvaluation } from '../envelope/evaluate.js';
import type { ElementKind } from '../graph/element.js';
import type { CompactGraph } from '../graph/compact.js';
import type { ReportElement } from '../graph/element.js';
import type { ChallengeDef, Requirement } from '../policy/types.js';
import type { Topology } from '../topology/model.js';
/** One side of a comparison: the compiled design and what the engine made of it. */
export interface DesignSide {
    graph: CompactGraph;
    result: DesignEvaluation;
    /** The parsed design, for what the change does to its attributes (labels, lengths...). */
    topology?: Topology;
}
export interface Measured {
    base: number | null;
    head: number | null;
    delta: number | null;
    se: number | null;
    /** Confidence interval of the head value (order statistics), when known. */
    lo?: number;
    hi?: number;
    /** Higher is better (false for spread). */
    higherIsBetter: boolean;
    /** Elements behind the head value, in order. */
    elements: {
        id: string;
        kind: ElementKind;
    }[];
    /** Set when the value could not be computed (challenge skipped, too few steps...). */
    missing?: string;
    /** Set with `missing` when the head lacks what the challenge needs (coordinates, risk groups). */
    notApplicable?: boolean;
    /**
     * Set when the value comes from incomplete work (N−1 cases or an exact worst-case search
     * cut by the work budget): it may be higher than the true value, so a floor it meets is
     * not proven. Says why.
     */
    incomplete?: string;
    /**
     * Set when the work budget left a random challenge with fewer realizations than the policy
     * asks for, on the head or the base: says how many ran. The value and the delta then rest on
     * fewer realizations.
     */
    reduced?: string;
    /** Standard error of the head value itself, when the head's realizations were cut. */
    headSe?: number;
    /** Set when the budget cut base and head differently, so their realizations do not pair. */
    unpaired?: string;
    /**
     * Set when the head's R is estimated from sampled sources: that estimate's standard error
     * (already part of `se`, and of `headSe` when set), and the sample's size.
     */
    sourceSe?: number;
    sources?: {
        sources: number;
        nodes: number;
    };
}
/** Most elements a finding lists. */
export declare const MAX_ELEMENTS = 10;
/** Line (and label) of an element in the head design, else in the base design, else 0. */
export declare function locate(el: {
    id: string;
    kind: ElementKind;
}, head?: CompactGraph, base?: CompactGraph): ReportElement;
/** Measure one requirement (not no-new-spof) on head, and on base when there is one. */
export declare function measure(req: Requirement, challenges: readonly ChallengeDef[], head: DesignSide, base?: DesignSide): Measured;
