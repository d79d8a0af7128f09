import type { CompactGraph } from '../graph/compact.js';
import type { BandChallenge } from './types.js';
export declare const EARTH_RADIUS_KM = 6371.0088;
/** Great-circle distance in km between two points given in degrees (haversine). */
export declare function haversineKm(lat1: number, lon1: number, lat2: number, lon2: number): number;
/** Indices of nodes with both coordinates, in index (natural id) order. */
export declare function sitesWithCoordinates(g: CompactGraph): number[];
/** Default radius limit: a quarter of the largest distance between two sites, to 2 significant digits. */
export declare function defaultRegionalUntil(g: CompactGraph): number;
export declare const regional: BandChallenge;
