import type { DesignFormat, SourcePos, Topology } from './model.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
interface Cell {
    text: string;
    pos: SourcePos;
}
interface Row {
    cells: Cell[];
    /** Where the row ends (for "missing column" errors). */
    end: SourcePos;
}
/**
 * The rows one at a time, so that a file with millions of rows is never held as rows: the
 * builder's element limit stops the read where it is crossed.
 */
export declare function csvRows(text: string, b: TopologyBuilder): Generator<Row>;
/**
 * Whether a CSV text is an edge list: its first row (the header) names a `source` and a
 * `target` column (ignoring case and spaces around names), as parseEdgeList requires. A text
 * whose first row cannot be read as CSV is not one. Reads the first row only.
 */
export declare function csvHasEdgeHeader(text: string): boolean;
export declare function parseEdgeList(text: string, file: string, options?: BuilderOptions, format?: DesignFormat): Topology;
export {};
