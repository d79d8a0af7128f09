export interface FastYaml {
    data: unknown;
    /** Offsets of the line starts (ascending), for offset → line and column. */
    lineStarts: Int32Array;
    /** Where the child `key` of a list or mapping read here starts, and how a number was written. */
    child(container: object, key: string | number): {
        at: number;
        src: string | undefined;
    } | undefined;
    /** Where a list or mapping read here starts. */
    start(container: object): number | undefined;
}
export declare function readFastYaml(text: string): FastYaml | undefined;
/** 1-based line and column of an offset. */
export declare function lineColumn(lineStarts: Int32Array, offset: number): {
    line: number;
    column: number;
};
