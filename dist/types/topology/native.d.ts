import type { DesignFormat, Topology } from './model.js';
import { type BuilderOptions } from './builder.js';
/**
 * Aliases a document may expand. Real designs rarely use anchors at all; the yaml package's
 * default (100) already stops exponential growth, and a lower cap fails sooner.
 */
export declare const MAX_ALIAS_COUNT = 50;
export declare function parseNative(text: string, file: string, options?: BuilderOptions, format?: DesignFormat, fast?: boolean): Topology;
