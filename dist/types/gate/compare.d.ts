import type { Finding, FileReport, FileStatus } from '../report/report.js';
import type { FilePolicy } from '../policy/types.js';
import { type DesignSide } from './measure.js';
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
/** Which status a judged file has, from its findings (only fail-severity findings change it). */
export declare function fileStatus(change: CompareInput['change'], findings: readonly Finding[]): FileStatus;
export declare function compareDesign(input: CompareInput): FileReport;
