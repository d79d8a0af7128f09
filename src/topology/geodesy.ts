// Distances on the Earth, for everything that reads coordinates (regional failures, link
// lengths estimated from sites, routes of GeoJSON links). A sphere of mean radius is enough
// at the accuracy designs give coordinates with.

/** Mean Earth radius R1 (IUGG / GRS 80), km. */
export const EARTH_RADIUS_KM = 6371.0088;

/** Great-circle distance in km between two points given in degrees (haversine, mean Earth radius 6,371.0088 km, IUGG). */
export function greatCircleKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const rad = Math.PI / 180;
  const dLat = (lat2 - lat1) * rad;
  const dLon = (lon2 - lon1) * rad;
  const a = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(a)));
}
