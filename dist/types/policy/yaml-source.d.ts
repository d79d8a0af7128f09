import type { Where } from './types.js';
export type Segment = string | number;
export declare class YamlSource {
    readonly file: string;
    readonly data: unknown;
    private readonly doc;
    private readonly lines;
    constructor(text: string, file: string);
    /** Location of a byte offset. */
    offset(pos: number): Where;
    /** Location of the value at `path`, or of its key when `key` is set; the nearest existing ancestor otherwise. */
    where(path: readonly Segment[], key?: boolean): Where;
}
/** Split a JSON pointer ("/a/0/b~1c") into segments. */
export declare function pointerSegments(pointer: string): Segment[];
