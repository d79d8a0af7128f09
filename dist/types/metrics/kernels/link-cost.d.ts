import type { CompactGraph } from '../../graph/compact.js';
export interface LinkCost {
    kind: 'latency' | 'length' | 'weight';
    /** Unit of the cost, for reports. */
    unit: 'ms' | 'km' | '';
    values: Float64Array;
    /** Smallest cost of any link. */
    min: number;
}
export declare function chooseLinkCost(g: CompactGraph): LinkCost | null;
/** Great-circle distance in km between two points given in degrees (haversine, mean Earth radius 6,371.0088 km, IUGG). */
export declare function greatCircleKm(lat1: number, lon1: number, lat2: number, lon2: number): number;
/** One-way propagation delay of light in optical fibre, ms per km (≈ c / 1.47; common practice). */
export declare const FIBRE_MS_PER_KM = 0.0049;
