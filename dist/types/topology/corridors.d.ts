/** A route: [lon, lat] points in degrees (GeoJSON order). */
export type Route = readonly (readonly [number, number])[];
export interface CorridorOptions {
    /** Two routes closer than this many metres run together (default 50). */
    withinM?: number;
    /** Only stretches longer than this many km are reported (default 1). */
    minKm?: number;
    /** Sampling step along a route, metres (default 25). */
    stepM?: number;
}
export interface SharedCorridor {
    /** Indices of the two routes, a < b. */
    a: number;
    b: number;
    /** Length of route a that runs within `withinM` of route b, km. */
    km: number;
    /** Where the shared stretch begins and ends (points of route a). */
    from: readonly [number, number];
    to: readonly [number, number];
}
/** Length of a route along the sphere, km. */
export declare function routeKm(route: Route): number;
/**
 * Pairs of routes that run within `withinM` of each other for more than `minKm`, longest
 * first. The stretch near a shared end (two links leaving the same site) counts too: a site's
 * first hundred metres are rarely the problem, so `minKm` should be well above `withinM`.
 */
export declare function sharedCorridors(routes: readonly Route[], options?: CorridorOptions): SharedCorridor[];
