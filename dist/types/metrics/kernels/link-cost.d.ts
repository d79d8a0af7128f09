import type { CompactGraph } from '../../graph/compact.js';
export { greatCircleKm } from '../../topology/geodesy.js';
export interface LinkCost {
    kind: 'latency' | 'length' | 'weight';
    /** Unit of the cost, for reports. */
    unit: 'ms' | 'km' | '';
    values: Float64Array;
    /** Smallest cost of any link. */
    min: number;
}
export declare function chooseLinkCost(g: CompactGraph): LinkCost | null;
/** One-way propagation delay of light in optical fibre, ms per km (≈ c / 1.47; common practice). */
export declare const FIBRE_MS_PER_KM = 0.0049;
