import { type Placed } from './project.js';
export declare const LAYOUT_SEED = 7168368;
/** Fixed iteration counts: enough to settle designs of a few hundred sites. */
export declare function iterationsFor(n: number): number;
export declare function forceLayout(ids: readonly string[], edges: readonly (readonly [number, number])[], seed?: number): Placed;
