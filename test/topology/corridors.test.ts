// Shared corridors: routes that run side by side. Distances checked against closed forms on
// the sphere (an arc of the equator is R·Δλ; a parallel offset of d metres in latitude is
// d / (R·π/180) degrees), R = 6,371.0088 km (IUGG mean Earth radius).
import { describe, expect, it } from 'vitest';
import { routeKm, sharedCorridors, type Route } from '../../src/topology/corridors.js';

const R_KM = 6371.0088;
const degOfM = (m: number) => (m / (R_KM * 1000)) * (180 / Math.PI);

describe('route length', () => {
  it('an arc of the equator is R·Δλ (closed form)', () => {
    const route: Route = [
      [0, 0],
      [0.5, 0],
      [1, 0],
    ];
    expect(routeKm(route)).toBeCloseTo((R_KM * Math.PI) / 180, 6);
  });
});

describe('shared corridors', () => {
  // Two routes along the equator, 5 km long, 20 m apart: one shared stretch of ~5 km.
  const along: Route = [
    [0, 0],
    [degOfM(5000), 0],
  ];
  const beside: Route = [
    [0, degOfM(20)],
    [degOfM(5000), degOfM(20)],
  ];

  it('finds two routes 20 m apart for 5 km, with the length they share', () => {
    const c = sharedCorridors([along, beside]);
    expect(c).toHaveLength(1);
    expect(c[0]).toMatchObject({ a: 0, b: 1 });
    expect(c[0].km).toBeGreaterThan(4.9);
    expect(c[0].km).toBeLessThanOrEqual(5.01);
  });

  it('ignores routes 200 m apart, and stretches shorter than the minimum', () => {
    const far: Route = [
      [0, degOfM(200)],
      [degOfM(5000), degOfM(200)],
    ];
    expect(sharedCorridors([along, far])).toEqual([]);
    // Together for 600 m only, then diverging at right angles.
    const short: Route = [
      [0, degOfM(10)],
      [degOfM(600), degOfM(10)],
      [degOfM(600), degOfM(3000)],
    ];
    expect(sharedCorridors([along, short])).toEqual([]);
    expect(sharedCorridors([along, short], { minKm: 0.5 })).toHaveLength(1);
  });

  it('two links that only meet at a shared site do not share a corridor', () => {
    const east: Route = [
      [0, 0],
      [degOfM(5000), 0],
    ];
    const north: Route = [
      [0, 0],
      [0, degOfM(5000)],
    ];
    expect(sharedCorridors([east, north])).toEqual([]);
  });
});
