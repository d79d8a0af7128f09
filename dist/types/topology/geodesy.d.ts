/** Mean Earth radius R1 (IUGG / GRS 80), km. */
export declare const EARTH_RADIUS_KM = 6371.0088;
/** Great-circle distance in km between two points given in degrees (haversine, mean Earth radius 6,371.0088 km, IUGG). */
export declare function greatCircleKm(lat1: number, lon1: number, lat2: number, lon2: number): number;
