import type { FileStatus, Finding, RequirementResult } from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
/** A finding the suggestions aim to remove, named so that two runs can be compared. */
export interface MendTarget {
    /** Stable key: rule, requirement and element ids. */
    key: string;
    rule: Finding['rule'];
    requirement?: string;
    severity: Finding['severity'];
    message: string;
    elements: ReportElement[];
    line: number;
}
/** A link a suggestion adds. */
export interface MendLink {
    /** The id the new link gets (free in the design). */
    id: string;
    between: [string, string];
    /** Length in km: the planner's figure, or great-circle distance × the route factor. */
    lengthKm?: number;
    /** Latency in ms: the planner's figure, or estimated from the design's own links. */
    latencyMs?: number;
    /** Cost in the planner's unit, when the candidate list gives one. */
    cost?: number;
    riskGroups?: string[];
    /** list: from the planner's candidate file (line given); generated: a site pair within the distance limit. */
    source: 'list' | 'generated';
    line?: number;
    /** True when the latency is our estimate, not the planner's. */
    latencyEstimated?: boolean;
}
/** One requirement, before (the head as proposed) and after the suggestion. */
export interface MendRequirement {
    id: string;
    description: string;
    before: number | null;
    after: number | null;
    status: RequirementResult['status'];
}
export interface MendSuggestion {
    /** links: add these links; harden: mark these elements hardened (never fail). */
    kind: 'links' | 'harden';
    links: MendLink[];
    harden: ReportElement[];
    /** Total length (km) or cost of the added links; null when unknown (or for hardening). */
    total: number | null;
    unit: 'km' | 'cost' | 'link' | 'element';
    /** Keys of the targets this suggestion removes, and of those it leaves. */
    fixes: string[];
    leaves: string[];
    /** The file's status and whether it would pass the gate, judged by the same engine. */
    status: FileStatus;
    holds: boolean;
    /** R̄ (see MendReport.rDefinition) of the head as proposed, and with the suggestion applied. */
    rBefore: number | null;
    rAfter: number | null;
    /** (rAfter − rBefore) per km, per cost unit or per link. */
    gainPerUnit: number | null;
    requirements: MendRequirement[];
    /** How it was found, in words. */
    method: string;
}
export interface MendBound {
    /** Leaves of the bridge tree (2-edge-connected pieces joined by the bridges in question). */
    leaves: number;
    /** Pieces with no bridge at all, when the design falls apart (Eswaran–Tarjan's q). */
    isolated: number;
    /** ⌈leaves / 2⌉ + isolated: no fewer links can remove those bridges (Eswaran & Tarjan 1976). */
    links: number;
}
export interface MendReport {
    /** What the suggestions aim to remove: the file's failing and warning findings a change to the design can fix. */
    targets: MendTarget[];
    /** The scalar the search ranks by, in words. */
    rDefinition: string;
    /** Lower bounds on the links needed (Eswaran & Tarjan, SIAM J. Comput. 5:653, 1976). */
    bounds: {
        newBridges?: MendBound;
        allBridges: MendBound;
    };
    candidates: {
        source: 'list' | 'generated' | 'none';
        /** The candidate file (repository path), when the policy names one. */
        path?: string;
        count: number;
        routeFactor?: number;
        maxKm?: number;
    };
    /** Best first: those that hold, then by targets fixed, then by R gained per unit. */
    suggestions: MendSuggestion[];
    /** Engine evaluations the search ran (each one full policy evaluation of a mended design). */
    evaluations: number;
    /** Plain sentences: limits hit, a candidate file that could not be read, what was not tried. */
    notes: string[];
}
