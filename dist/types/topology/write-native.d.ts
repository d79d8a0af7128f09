import type { Topology } from './model.js';
/** Our format as a plain document (stable key order). */
export declare function nativeDocument(t: Topology): Record<string, unknown>;
/** Our format as a JSON document (two-space indent, final newline). */
export declare function writeNativeJson(t: Topology): string;
/**
 * Our format as YAML: block style, with short lists of plain values (ends, risk groups,
 * positions) and sites written on one line, so that one element reads as a few lines.
 */
export declare function writeNativeYaml(t: Topology, comment?: string): string;
