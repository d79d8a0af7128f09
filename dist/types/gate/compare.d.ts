import type { Finding, FileReport, FileStatus, RequirementResult } from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
import type { FilePolicy, Requirement, WeakeningRule } from '../policy/types.js';
import { type DesignSide, type Measured } from './measure.js';
export type { DesignSide };
export interface LocatedProblem {
    message: string;
    line: number;
    column: number;
}
export interface CompareInput {
    path: string;
    previousPath?: string;
    change: 'added' | 'modified' | 'renamed' | 'deleted' | 'unchanged';
    /** Judge thresholds only (no base comparison): scheduled runs and new files. */
    thresholdsOnly?: boolean;
    policy: FilePolicy;
    format?: string;
    head?: DesignSide;
    base?: DesignSide;
    /** The head could not be read (parse error): the file fails with this line. */
    headError?: LocatedProblem;
    /** The head was read, but R cannot be computed on it (a metric of R does not apply): the file fails. */
    headUnsupported?: LocatedProblem;
    /** The base could not be read (or R cannot be computed on it): the head is judged on thresholds only. */
    baseError?: LocatedProblem;
}
/**
 * On realizations cut by the budget, a value meets its floor only when it clears it by more
 * than this many of its own standard errors (about 97.7 % one-sided under a normal
 * approximation; common practice).
 */
export declare const REDUCED_MARGIN_SE = 2;
type RowStatus = RequirementResult['status'];
/** What the floor and the weakening judgement of one requirement share. */
export interface Judging {
    r: Requirement;
    m: Measured;
    /** The head value, known to be finite (judge() has dealt with a missing or broken one). */
    headValue: number;
    description: string;
    /** The floor (or ceiling) the requirement sets; null for a tracked value. */
    threshold: number | null;
    rule: Finding['rule'];
    elements: ReportElement[];
    /** The fields every finding of this requirement carries. */
    extra: Partial<Finding>;
}
/** The head against the floor (or ceiling): short, unsettled (interval, cut work, thin margin) or holds. */
export declare function judgeFloor(j: Judging): {
    status: RowStatus;
    findings: Finding[];
};
/**
 * Base against head under the policy's weakening rule: weakened, unsettled, inside the error,
 * within the allowance, or nothing (a rise or no change). `status` is the floor's verdict; a
 * "short" is never softened.
 */
export declare function judgeWeakening(j: Judging, policyRule: WeakeningRule, floorStatus: RowStatus): {
    status: RowStatus;
    findings: Finding[];
};
/** Which status a judged file has, from its findings (only fail-severity findings change it). */
export declare function fileStatus(change: CompareInput['change'], findings: readonly Finding[]): FileStatus;
export declare function compareDesign(input: CompareInput): FileReport;
