import { DesignError } from './errors.js';
/** A file that is not text netbrace reads (kind "design"; policy readers restate it as a PolicyError). */
export declare class EncodingError extends DesignError {
    name: string;
}
/** Offset of the first byte that does not start a well-formed UTF-8 sequence, or -1. */
export declare function firstInvalidUtf8(b: Uint8Array, from?: number): number;
/**
 * The text of a design or policy file. UTF-8 (byte-order mark dropped) or UTF-16 with its
 * byte-order mark; throws EncodingError at the first byte that is neither, naming what the
 * file looks like.
 */
export declare function decodeText(bytes: Uint8Array, file: string): string;
/** The length of `text` in UTF-8 bytes (GitHub's summary limit and the design size limit count bytes). */
export declare function utf8Length(text: string): number;
