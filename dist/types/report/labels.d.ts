import type { ChallengeName } from '../challenges/types.js';
import type { ElementKind } from '../graph/element.js';
import type { AttributeChange, Consequence, FileReport, FileStatus, Finding, ReportElement, Report, RequirementResult } from './report.js';
export { formatDelta, formatError, formatValue, shortRevision } from './format.js';
export { REQUIREMENT_STATUS_WORD, fileFails, fileWarns } from './vocabulary.js';
export declare const STATUS_WORD: Record<FileStatus, string>;
export declare function challengeLabel(c: ChallengeName): string;
export declare function kindPlural(k: ElementKind): string;
export declare function kindSingular(k: ElementKind): string;
/** The x-axis caption of an envelope chart. */
export declare function xAxisLabel(kind: ElementKind, xUnit: 'fraction' | 'km'): string;
/** Whether a requirement counts things (bridges, cut nodes): shown as whole numbers. */
export declare function isCountRequirement(r: RequirementResult): boolean;
/** A requirement's value: whole numbers for counts, else as formatValue. */
export declare function formatRequirementValue(r: RequirementResult, v: number | null): string;
/** A requirement's delta: signed whole numbers for counts, else as formatDelta. */
export declare function formatRequirementDelta(r: RequirementResult): string;
export declare function formatFraction(x: number): string;
/** A file's status in words; an error whose R cannot be computed is not "could not be read". */
export declare function fileStatusWord(f: FileReport): string;
/** "2 pass, 1 could not be read": the report's counts in words, errors told apart by fileStatusWord. */
export declare function statusCounts(r: {
    counts: Record<FileStatus, number>;
    files: FileReport[];
}): string[];
/** "regional (no site has coordinates (lat/lon))": the challenges that do not apply to a side. */
export declare function describeNotApplicable(ev: {
    notApplicable?: {
        challenge: ChallengeName;
        reason: string;
    }[];
} | undefined): string | undefined;
/**
 * id → element (line, label) for every element the file's report names: findings first, then
 * structure, sequences and what they strand, then the change list. Keyed by kind and id.
 */
export declare function knownElements(f: FileReport): Map<string, ReportElement>;
/** The element of this kind and id as the report names it, else the bare id (line 0). */
export declare function knownElement(known: ReadonlyMap<string, ReportElement>, kind: ReportElement['kind'], id: string): ReportElement;
/** How a view writes the parts of an element's name: ids (code), labels (text), the space that keeps "line 14" together. */
export interface ElementStyle {
    id?: (id: string) => string;
    text?: (label: string) => string;
    /** The parenthesised part, "(node 8, line 93)", whole (for muted styling). */
    meta?: (part: string) => string;
    space?: string;
}
/**
 * The one way an element is named in every view and message: "Bratislava (node 8, line 93)"
 * for a site with a label, "kaskeld (line 14)" without one, the bare id when the line is unknown.
 */
export declare function formatElement(e: Pick<ReportElement, 'id' | 'kind' | 'line' | 'label'>, style?: ElementStyle): string;
/**
 * What a loss costs, in one short sentence: "Losing it cuts off Saltmere (node 0, line 6) from
 * the largest part; 1 of 3 demands (volume 10 of 17) loses every path." `subject` is who does
 * it ("Losing it", "These removals"; empty for a clause that follows an element's name).
 */
export declare function consequenceSentence(c: Consequence, subject?: string, style?: ElementStyle): string;
export interface NamedSequence {
    /** "Worst case found under random site failures (exact search, 3 sites)". */
    title: string;
    ids: string[];
    /** The elements with their lines and labels, in order. */
    elements: ReportElement[];
    /** R after each step, when known. */
    values?: number[];
    /** What the whole sequence costs, when the report says. */
    consequence?: Consequence;
}
/**
 * The sequences a planner acts on, in this order and without repeats: each envelope's worst
 * case, the gate's weakest-sequence findings, then each envelope's weakest realization. Every
 * element carries its line (from the sequence itself, else from what the report names).
 */
export declare function weakestSequences(f: FileReport): NamedSequence[];
/**
 * How a finding is titled, from its rule and what the judging found: a drop within the
 * allowance is not "weakened", a floor that was not settled is not "short". `names` gives
 * the view's word for each rule when the finding is what the rule is about.
 */
export declare function findingTitle(x: Finding, names: Readonly<Record<Finding['rule'], string>>): string;
/** "N−1 (links)", "N−2 (sites)": a contingency table's name with the element kind it removes. */
export declare function contingencyLabel(challenge: ChallengeName, kind: ElementKind): string;
/** "link a—b: length 24 km → 30 km (base line 12, head line 13)": one attribute the change altered. */
export declare function describeModification(c: AttributeChange): string;
/** Every attribute change of a file, one line each, at most `max` and a "… N more" line. */
export declare function describeModifications(f: FileReport, max?: number): string[];
/** "+1 site (saltmarrow, line 83), +2 links (…); −2 links (…); node a renamed b; now hardened: …": what the change did. */
export declare function describeChanges(f: FileReport, max?: number): string | undefined;
/** A finding, or several new-bridge / new-cut-node / hardened-weak-point findings of one severity merged into one (`members` keeps them). */
export type GroupedFinding = Finding & {
    grouped?: boolean;
    members?: Finding[];
};
/** Findings in reading order: failures, then warnings, then notices (stable within each). */
export declare function bySeverity<T extends Finding>(findings: readonly T[]): T[];
/** New bridges and cut nodes (and weak points hidden by hardening) of one severity read best as one list: merge their findings. */
export declare function groupFindings(findings: readonly Finding[]): GroupedFinding[];
/**
 * The change edits the gate's own configuration: one sentence per setting of the workflow that
 * runs netbrace, and one for the policy files; shown at the top of every view.
 */
export declare function configurationNotes(r: Report): {
    text: string;
    weakens: boolean;
    file: string;
    line: number;
}[];
