import type { Report, SplitDesign } from '../report/report.js';
/**
 * The part (1-based) that runs the realizations from `from` on (a task never crosses a batch):
 * batch b < n belongs to part b + 1; later batches to none. Parts cannot stop early (none sees
 * the others' samples), so they run the first n batches side by side, and a join whose decisions
 * are still open after them runs the next batches itself, by the same rule as one run.
 */
export declare function batchOwner(from: number, total: number): number | undefined;
/** The part (1-based) that runs piece `index` of a long attack (engine.ts attackPieces). */
export declare function pieceOwner(index: number, total: number): number;
export declare function encodeValues(values: readonly Float64Array[]): string;
export declare function decodeValues(text: string, rows: number, points: number, name: string): Float64Array[];
export declare function sampleKey(path: string, side: 'head' | 'base', challenge: string, from: number, to: number): string;
/** What a join is given: the files the parts judged whole, and the samples of the split designs. */
export interface JoinInput {
    total: number;
    files: Map<string, Report['files'][number]>;
    split: Set<string>;
    samples: Map<string, {
        values: string;
        points: number;
        part: number;
    }>;
    reports: readonly Report[];
}
/** The part reports as a join input; a missing or repeated part is a UsageError naming it. */
export declare function joinInput(reports: readonly Report[]): JoinInput;
/** Realization ranges as people count them (1-based, inclusive): "1–32, 65–96". */
export declare function rangesText(d: Pick<SplitDesign, 'samples'>): string;
