import { LimitError } from '../errors.js';
import { utf8Length } from '../decode.js';
import { type ParseOptions, type Topology } from './model.js';
export { utf8Length };
/** Refuses text over the byte limit (cheap bounds first: each UTF-16 unit is 1–3 bytes). */
export declare function checkSize(text: string, file: string, maxBytes?: number): void;
export declare function sizeError(file: string, bytes: number, maxBytes: number): LimitError;
/**
 * Parse a design. The format comes from `options.format`, else from the file's extension.
 * Throws DesignError (located: file, line, column, hint) for anything the user must fix,
 * LimitError for files or designs over the limits.
 */
export declare function parseDesign(text: string, file: string, options?: ParseOptions): Topology;
