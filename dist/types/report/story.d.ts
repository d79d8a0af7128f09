import type { Consequence, FileReport, Finding, Report, ReportElement, RequirementResult, Severity } from './report.js';
/** text: our words or user text to escape; code: shown verbatim in monospace; id: an element's or requirement's id (monospace). */
export type SegmentKind = 'text' | 'code' | 'id';
export interface Segment {
    kind: SegmentKind;
    text: string;
    /** Text from a design or a message (a label, a reason): never merged with our words, so a view may set it apart. */
    user?: boolean;
}
export type Sentence = Segment[];
export declare const seg: {
    text: (text: string) => Segment;
    user: (text: string) => Segment;
    code: (text: string) => Segment;
    id: (text: string) => Segment;
};
/** A sentence as plain text (logs, annotations, SARIF): segments joined as they are. */
export declare function plainSentence(s: Sentence): string;
/** Adjacent text segments merged, empty ones dropped: fewer, longer runs for views to escape. */
export declare function compact(s: Sentence): Sentence;
/** The README section every definition links to (README.md, "Reading the report"). */
export declare const README_ANCHOR = "reading-the-report";
export interface VerdictStory {
    /** blocks: fails and blocks the merge; informs: fails, but inform mode does not block; part: one part of a split run (never blocks by itself); clear: nothing weakened. */
    tone: 'blocks' | 'informs' | 'part' | 'clear';
    mark: string;
    sentence: Sentence;
}
/** "1 design weakened, 1 could not be read": the failing designs by what happened to them. */
export declare function failingCounts(files: readonly FileReport[]): string[];
/** The verdict in one sentence of our own: "netbrace blocks this merge: 1 design weakened". */
export declare function verdictStory(report: Report, title?: string): VerdictStory;
/** The caution in one line, under the verdict; the full text (report.caution) closes each view. */
export declare const CAUTION_LINE = "netbrace informs engineering judgement under the stated assumptions; it does not replace engineering studies (the full caution is at the end).";
/** "Kaskeld (`kaskeld`, line 58)", "link `a-b` (line 12)", "site `x`" when the line is unknown. */
export declare function elementSentence(e: Pick<ReportElement, 'id' | 'kind' | 'line' | 'label'>): Sentence;
/** "cuts off A, B and C from the largest part; 3 of 47 demands (volume 44 of 1096) lose every path" */
export declare function costSentence(c: Consequence, plural?: boolean): Sentence;
export interface WeakenedItem {
    severity: Severity;
    rule: Finding['rule'];
    /** RULE_TITLE of the rule. */
    title: string;
    line: number;
    elements: ReportElement[];
    /** The consequence in one sentence, ending with a full stop. */
    sentence: Sentence;
    finding: Finding;
}
export interface RequirementLine {
    requirement: RequirementResult;
    mark: string;
    /** "R at 10 % sites removed (q10)". */
    label: Sentence;
    /** "holds · R at 10 % sites removed (q10) 0.464 → 0.450 (−0.013 ± 0.005), floor 0.42". */
    sentence: Sentence;
}
/** A requirement's short name, from its subject (its plain description for older reports). */
export declare function requirementLabel(r: RequirementResult): Sentence;
/** "0.464 → 0.450 (−0.013 ± 0.005), floor 0.42, allowed drop 0.010". */
export declare function requirementNumbers(r: RequirementResult, allowance?: number): string;
export declare function requirementLine(r: RequirementResult, findings?: readonly Finding[]): RequirementLine;
export interface Definition {
    term: 'R' | 'area' | 'spread' | '\u00b1' | 'inside-error';
    sentence: Sentence;
    /** The README section that says more (README_ANCHOR). */
    anchor: string;
}
/** R, area, spread and ±, each in one line, for the words this design's lines use. */
export declare function definitions(f: FileReport): Definition[];
export interface DesignStory {
    file: FileReport;
    /** fails: blocks on its own; warns: passes with warnings; holds: passes (notices do not change that). */
    outcome: 'fails' | 'warns' | 'holds';
    mark: string;
    /** The file status in words (FILE_STATUS_WORD; "could not be evaluated" told apart). */
    statusWord: string;
    /** "4 new bridges, 4 new cut nodes; 3 requirements weakened" or "every requirement holds". */
    headline: string;
    /** Failures and warnings that name what weakened, worst first. */
    weakened: WeakenedItem[];
    /** Context (notices) that is not a requirement's number. */
    notices: WeakenedItem[];
    /** One line per requirement, in policy order. */
    howMuch: RequirementLine[];
    definitions: Definition[];
}
/**
 * The finding an unreadable file is told by in every view (its located reading error, as a
 * failure), unless its findings already say it; undefined for any other file.
 */
export declare function unreadableFinding(f: FileReport): Finding | undefined;
export declare function designStory(f: FileReport): DesignStory;
/** For a design with no element to name whose requirements fell: what "what weakened" says instead of "nothing". */
export declare function numbersOnly(d: Pick<DesignStory, 'howMuch'>): string | undefined;
/** Every design's story, worst first (rank.ts). */
export declare function designStories(report: Pick<Report, 'files'>): DesignStory[];
/**
 * The policy change in one sentence: "This change edits the policy: the head's version would
 * loosen the floor of `r-threshold:…` from 0.42 to 0.4 and tighten …; the base's version judges
 * this change." Undefined when the change leaves the policy alone.
 */
export declare function policyChangeSentence(report: Pick<Report, 'policy' | 'base'>): Sentence | undefined;
/**
 * "+1 site (Saltmarrow, `saltmarrow`, line 210); −2 links (`a-b`, base line 214; …); site `a`
 * renamed `b` (line 3); now hardened: …": what the change did to the design's elements.
 */
export declare function changeSentence(f: FileReport, max?: number): Sentence | undefined;
/** "link `a—b`: length 24 km → 30 km (base line 12, head line 13)": one attribute the change altered. */
export declare function modificationSentence(c: NonNullable<NonNullable<FileReport['changes']>['modified']>[number]): Sentence;
