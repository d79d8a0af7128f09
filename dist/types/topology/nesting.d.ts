/** Deepest nesting a design or policy file may have (real files stay below 15). */
export declare const MAX_NESTING = 100;
/** Offset of the first token nested deeper than `max`, or -1 when the text stays within it. */
export declare function yamlNestingExceeded(text: string, max?: number): number;
/** 1-based line and column of a string offset. */
export declare function positionOf(text: string, offset: number): {
    line: number;
    column: number;
};
