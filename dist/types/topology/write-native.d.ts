import type { Topology } from './model.js';
/** Our format as a JSON document (stable key order, two-space indent, final newline). */
export declare function writeNativeJson(t: Topology): string;
