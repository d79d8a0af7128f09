import type { Consequence } from '../graph/consequence.js';
import type { ReportElement } from '../graph/element.js';
import type { Evaluation, StructureSummary } from '../envelope/types.js';
import type { DesignMap, OmittedMap } from '../map/types.js';
import type { MendReport } from '../mend/types.js';
export type { Consequence, Evaluation, ReportElement, StructureSummary };
export declare const REPORT_VERSION = 1;
export type FileStatus = 'holds' | 'weakened' | 'below-floor' | 'new' | 'removed' | 'renamed' | 'unreadable';
export type Severity = 'fail' | 'warn' | 'notice';
/** One requirement of the policy, judged on one file: the rows of the requirement table. */
export interface RequirementResult {
    /** Stable id, e.g. "threshold:random-nodes@0.2:q0.1" or "no-new-spof". */
    id: string;
    /** Plain words, e.g. "10 % quantile of R at 20 % nodes removed ≥ 0.60". */
    description: string;
    severity: Severity;
    base: number | null;
    head: number | null;
    /** head − base, paired; null when one side is missing. */
    delta: number | null;
    /** Standard error of the delta (Monte Carlo); 0 for deterministic quantities. */
    se: number | null;
    /** The floor (or ceiling) the head must respect, when the requirement has one. */
    threshold: number | null;
    /** holds: fine; short: below its floor; weakened: dropped beyond tolerance;
     *  inside-error: dropped, but by less than the Monte Carlo error; unsettled: could not be
     *  judged with enough confidence (never reported as holds); not-applicable: a tracked value
     *  (no floor) whose challenge does not apply to the design on either side (no risk groups). */
    status: 'holds' | 'short' | 'weakened' | 'inside-error' | 'unsettled' | 'not-applicable';
    /** Realizations the decision needed (sequential runs, random challenges): see docs/METHODS.md §7.6. */
    realizations?: number;
    /** Confidence-sequence bounds of the head value and of the change after the realizations that ran. */
    bounds?: {
        head?: {
            lo: number;
            hi: number;
        };
        delta?: {
            lo: number;
            hi: number;
        };
    };
    /** What the requirement measures, as data, so that views word it themselves. */
    subject?: RequirementSubject;
    /** Decimals at which base, head and delta decide the judging (at least 3); absent: 3. */
    decimals?: number;
}
/** What a requirement measures: the parts its words are made from. */
export interface RequirementSubject {
    kind: 'r-threshold' | 'area-floor' | 'spread-ceiling' | 'n-1' | 'no-new-spof';
    /** What the challenge removes (for N−1: the element kind, as "nodes" or "links"). */
    remove?: 'nodes' | 'links' | 'risk-groups' | 'region';
    /** The policy's name for the challenge. */
    challenge?: string;
    /** "random", or the order of a targeted attack ("degree", "betweenness", …). */
    order?: string;
    adaptive?: boolean;
    /** The removal fraction (or radius in km for regions) the value is read at. */
    at?: number;
    /** Which statistic of the envelope: a quantile q, the median, mean, minimum, worst case of k removals, or the one value of a curve. */
    statistic?: {
        kind: 'quantile' | 'median' | 'mean' | 'min' | 'worst-case' | 'value';
        q?: number;
        removals?: number;
    };
    /** Whether a higher value is better (false for a spread ceiling and for counts of weak points). */
    higherIsBetter: boolean;
}
export interface Finding {
    /** Finding kind; also the SARIF rule id (stable). */
    rule: 'r-threshold' | 'area-floor' | 'spread-ceiling' | 'n-1' | 'new-bridge' | 'new-cut-node' | 'new-stranding-group' | 'hardened-weak-point' | 'regression' | 'weakest-sequence' | 'parse-error' | 'removed-design' | 'policy-changed' | 'degraded' | 'not-computable';
    /** The requirement id this finding is about, when there is one. */
    requirement?: string;
    /** The requirement's severity, capped by the regression rule's for a regression. */
    severity: Severity;
    /**
     * What the judging found, for a finding about a requirement's value: views title the
     * finding by it (a drop within the allowance is not "weakened").
     */
    status?: FindingStatus;
    message: string;
    base?: number | null;
    head?: number | null;
    delta?: number | null;
    se?: number | null;
    /** The floor (or ceiling) the head value was judged against. */
    threshold?: number;
    /** The drop the regression rule allows for this requirement (head − base beyond it regresses). */
    allowance?: number;
    /** Decimals at which the numbers above decide the judging (at least 3); absent: 3. */
    decimals?: number;
    /** Elements that cause the finding, in order (a weakest sequence is ordered). */
    elements: ReportElement[];
    /** Line to annotate: the first element's, or the error's. */
    line: number;
    column?: number;
    /** For a weak point: what losing it costs at head. */
    consequence?: Consequence;
}
/**
 * short: the head falls short of its floor (or can no longer be judged though the base could);
 * weakened: a drop beyond the allowance; within-allowance / inside-error: a drop that is not a
 * failure; unsettled: neither proven nor refuted; reduced-work: judged on work the budget cut;
 * not-computable: a value that is not a finite number.
 */
export type FindingStatus = 'short' | 'weakened' | 'within-allowance' | 'inside-error' | 'unsettled' | 'reduced-work' | 'not-computable';
/** An attribute of a node or link that the change altered (see FileReport.changes). */
export interface AttributeChange {
    id: string;
    kind: 'node' | 'link' | 'group';
    /** e.g. "risk groups", "hardened", "length (km)", "latency (ms)", "capacity (Gbit/s)", "coordinates", "label". */
    attribute: string;
    /** The value at base and at head, as plain text ("–" when absent). */
    before: string;
    after: string;
    /** 1-based lines of the element at base and at head. */
    baseLine: number;
    headLine: number;
}
export interface FileReport {
    path: string;
    /** For renamed files: the base-side path. */
    previousPath?: string;
    status: FileStatus;
    format?: string;
    findings: Finding[];
    requirements: RequirementResult[];
    head?: Evaluation;
    base?: Evaluation;
    /** For status "unreadable": what could not be read. */
    error?: {
        message: string;
        line: number;
        column: number;
    };
    /** What reading the head design warned of, at its line (the first DESIGN_WARNINGS_KEPT). */
    warnings?: {
        message: string;
        line: number;
        column: number;
        hint?: string;
    }[];
    /**
     * What the change does: elements added and removed (nodes by id or, renamed, by neighbourhood;
     * links by their ends; shared-risk groups by id or members; head lines for added, base lines
     * for removed), renamed elements (base → head), elements whose hardened flag the change set or
     * cleared (head side), and attributes changed on elements both sides have.
     */
    changes?: {
        added: ReportElement[];
        removed: ReportElement[];
        renamed?: {
            from: ReportElement;
            to: ReportElement;
        }[];
        hardened?: (ReportElement & {
            hardened: boolean;
        })[];
        modified?: AttributeChange[];
    };
    /** Where each site and link is drawn, base and head together (src/map/). */
    map?: DesignMap | OmittedMap;
    /** For a failing design: what would mend it (src/mend/). */
    mend?: MendReport;
}
export interface Report {
    version: typeof REPORT_VERSION;
    tool: {
        name: 'netbrace';
        version: string;
    };
    verdict: 'pass' | 'fail';
    mode: 'block' | 'inform';
    policy: {
        /** "file": read from the repository; "builtin": no policy file, defaults applied. */
        source: 'file' | 'builtin';
        path?: string;
        /** The revision the policy was read from (base by default). */
        revision?: string;
        /** True when the change under review modifies the policy itself (reported, not applied). */
        changed?: boolean;
        /** The policy file and the files it inherits, the inheriting file first. */
        files?: string[];
        /** A plain sentence about the policy, e.g. why a changed policy was not applied. */
        note?: string;
        /** What the head's policy would judge differently, when the change modifies the policy. */
        changes?: PolicyChange[];
    };
    base?: string;
    head?: string;
    seed: number;
    /** When this run evaluated one part of the changed designs (index is 1-based: part k of n). */
    part?: {
        index: number;
        total: number;
    };
    /** Set by joinReports: the parts joined into this report (1-based), out of `total`. */
    parts?: {
        total: number;
        joined: number[];
    };
    /**
     * A part run's share of the designs split across the parts (gate/split.ts): the realizations
     * it ran, for the join to judge them. Never in a whole run's or a joined report.
     */
    split?: SplitDesign[];
    /**
     * The change edits the gate's own configuration: the workflow that runs netbrace (settings
     * compared with the base's; a weakening fails the check unless the base already allowed it).
     */
    configuration?: {
        workflow: string;
        changes: {
            setting: string;
            base: string;
            head: string;
            weakens: boolean;
            line: number;
            message: string;
            severity: Severity;
        }[];
    };
    /** What the run judged: the changed designs, the given paths, or every design (thresholds only). */
    scope?: 'changed' | 'paths' | 'all';
    counts: Record<FileStatus, number>;
    files: FileReport[];
    /** The plain statement that the tool informs engineering judgement and does not replace it. */
    caution: string;
}
/** One way the head's policy differs from the policy that judged the change. */
export interface PolicyChange {
    /** A requirement's id, or "weakening" (the rule for drops) or "removed-designs". */
    subject: string;
    /** The key that differs: "min", "max", "severity", "allowed-drop", "allowed-relative-drop", "error-multiple", "requirement" (added or dropped), … */
    key: string;
    effect: 'loosens' | 'tightens';
    /** The value in the judging policy and in the head's (null: absent). */
    base: string | number | null;
    head: string | number | null;
    /** Where the head's value is written (the policy file and line; line 0 when it was dropped). */
    file: string;
    line: number;
}
/** Design warnings a file report keeps; `netbrace inspect` lists them all. */
export declare const DESIGN_WARNINGS_KEPT = 50;
export declare const CAUTION: string;
/** Significant digits kept in the JSON report: enough for any R, few enough that engines that
 *  differ in the last bits of Math.exp/log still write the same bytes (docs/METHODS.md §7.5). */
export declare const REPORT_DIGITS = 12;
/** The report as JSON: stable key order (construction order), numbers rounded to REPORT_DIGITS
 *  significant digits, non-finite numbers as null, two-space indent, final newline. */
export declare function serializeReport(report: Report): string;
/** One design split across parts: this part's band realizations, exact (float64 LE, base64). */
export interface SplitDesign {
    path: string;
    /** Realizations of its largest band in all parts together. */
    realizations: number;
    /**
     * Band realizations from..to (points values each), or, with `piece`, an attack piece's
     * evaluated steps from..to (one row of to − from values; engine.ts attackPieces).
     */
    samples: {
        side: 'head' | 'base';
        challenge: string;
        from: number;
        to: number;
        points: number;
        values: string;
        piece?: number;
    }[];
}
