import type { CompactGraph } from '../graph/compact.js';
import type { BandChallenge } from './types.js';
/** Indices of nodes with both coordinates, in index (natural id) order. */
export declare function sitesWithCoordinates(g: CompactGraph): number[];
/** Default radius limit: a quarter of the largest distance between two sites, to 2 significant digits. */
export declare function defaultRegionalUntil(g: CompactGraph): number;
export declare const regional: BandChallenge;
