import type { FileReport, FileStatus, Finding, RequirementResult, Severity } from './report.js';
/** Every file status, in the order counts are listed (report.counts, outputs). */
export declare const FILE_STATUSES: readonly FileStatus[];
/** A file status in words. */
export declare const FILE_STATUS_WORD: Record<FileStatus, string>;
/** Worst first: the order files of equal severity are listed in. */
export declare const FILE_STATUS_RANK: Record<FileStatus, number>;
/** A requirement's status in words (the line of "how much" starts with the status itself). */
export declare const REQUIREMENT_STATUS_WORD: Record<RequirementResult['status'], string>;
/** What a finding is, by rule: one title for every view (annotations, markdown, SARIF, HTML, terminal). */
export declare const RULE_TITLE: Record<Finding['rule'], string>;
/** A finding's title when its judging status says more than its rule (a drop the policy allows). */
export declare const JUDGED_TITLE: {
    readonly 'within-allowance': "robustness dropped within the allowance";
    readonly 'inside-error': "change inside the Monte Carlo error";
};
/** The title of one finding: its judging status's where that is milder than the rule's. */
export declare function judgedTitle(x: Pick<Finding, 'rule' | 'status' | 'severity'>): string;
export declare const SEVERITY_WORD: Record<Severity, string>;
/**
 * Our status marks: geometric, not traffic lights, and always beside a word (a mark alone
 * carries no meaning for a screen reader or a colour-blind reader).
 */
export declare const MARK: {
    /** fails: a failure, or a design that blocks */
    readonly fail: "■";
    /** a warning */
    readonly warn: "▲";
    /** a notice, context only */
    readonly notice: "·";
    /** holds */
    readonly holds: "□";
    /** inside the error, unsettled, not applicable */
    readonly open: "◌";
};
/** The mark of a requirement line, by its status and severity. */
export declare function requirementMark(r: Pick<RequirementResult, 'status' | 'severity'>): string;
/** Whether a file, on its own, fails: any fail-severity finding, or an error. */
export declare function fileFails(f: Pick<FileReport, 'status' | 'findings'>): boolean;
/** Whether a file has warnings (and no failure). */
export declare function fileWarns(f: Pick<FileReport, 'status' | 'findings'>): boolean;
