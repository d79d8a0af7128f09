export declare const MAP_WIDTH = 760;
export declare const MAP_MAX_HEIGHT = 640;
export declare const MAP_MIN_HEIGHT = 260;
export declare const MAP_MARGIN = 36;
export interface Placed {
    x: Float64Array;
    y: Float64Array;
    width: number;
    height: number;
}
/** Round to 0.1 drawing units, so the same inputs give the same bytes on any engine. */
export declare function round1(v: number): number;
/** Longitudes shifted so that the largest empty arc lies outside their range. */
export declare function unwrapLongitudes(lon: readonly number[]): number[];
/** Fit plane coordinates into the drawing (y down), aspect kept, centred; rounded. */
export declare function fitToBox(px: readonly number[], py: readonly number[], width?: number, maxHeight?: number, margin?: number): Placed;
/** Project latitudes and longitudes (degrees) into the drawing. */
export declare function projectGeographic(lat: readonly number[], lon: readonly number[]): Placed;
