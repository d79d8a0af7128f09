import type { CompactGraph } from '../graph/compact.js';
/** Route factor when the policy sets none (common practice; see the header). */
export declare const DEFAULT_ROUTE_FACTOR = 1.3;
/** Generated candidates when coordinates are missing: every pair up to this many sites, else pairs within MAX_HOPS. */
export declare const ALL_PAIRS_LIMIT = 300;
export declare const MAX_HOPS = 3;
/** With coordinates: every pair up to this many located sites, else pairs within MAX_HOPS hops (and the distance limit). */
export declare const GEO_ALL_PAIRS_LIMIT = 2000;
/** Most generated candidates kept (the nearest first). */
export declare const MAX_GENERATED = 20000;
export interface Candidate {
    /** Node indices in the head design, a < b not required. */
    a: number;
    b: number;
    id?: string;
    lengthKm?: number;
    latencyMs?: number;
    cost?: number;
    riskGroups?: string[];
    note?: string;
    source: 'list' | 'generated';
    /** Line in the candidate file. */
    line?: number;
}
export interface CandidateSet {
    list: Candidate[];
    /** What a unit of `total` is: cost when every candidate has one, else km when every one has a length, else links. */
    unit: 'km' | 'cost' | 'link';
    source: 'list' | 'generated' | 'none';
    routeFactor?: number;
    maxKm?: number;
    notes: string[];
}
export interface CandidateOptions {
    routeFactor?: number;
    maxKm?: number;
}
/** The unit a candidate is priced in, and its price. */
export declare function price(c: Candidate, unit: CandidateSet['unit']): number;
/** Read the planner's candidate file against the head design. Throws PolicyError with file:line:col. */
export declare function parseCandidateFile(text: string, file: string, g: CompactGraph): CandidateSet;
/**
 * Candidates when the planner keeps no list: with coordinates, every pair of sites not yet
 * joined whose great-circle distance is within `maxKm` (default: the longest span the design
 * already has, so suggestions stay within the reach of spans already built), length = distance
 * × route factor, rounded to 0.1 km; without coordinates, every pair of a design up to
 * ALL_PAIRS_LIMIT sites, else pairs within MAX_HOPS hops, length unknown (ranked per link).
 */
export declare function generateCandidates(g: CompactGraph, options?: CandidateOptions): CandidateSet;
