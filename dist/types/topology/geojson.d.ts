import { type BuilderOptions } from './builder.js';
import type { Topology } from './model.js';
/**
 * A link property: `false` says the line only joins the two sites (netbrace convert draws such
 * lines when no route is known), so it takes no part in the search for shared corridors.
 */
export declare const ROUTE_KNOWN = "route_known";
/** A line's end belongs to a site within this many metres (common practice for surveyed plans). */
export declare const END_TOLERANCE_M = 100;
/** Shared corridors: within this many metres ... */
export declare const CORRIDOR_WITHIN_M = 50;
/** ... for more than this many km. */
export declare const CORRIDOR_MIN_KM = 1;
export declare function parseGeojson(text: string, file: string, options?: BuilderOptions): Topology;
