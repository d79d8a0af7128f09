// Shared corridors: links whose routes run side by side (within `withinM` metres for more than
// `minKm` km) probably share a duct, a bridge or a trench, whatever the design says. netbrace
// reports such pairs so that the planner can declare the shared-risk group (or say why not).
//
// Geometry on a sphere of mean Earth radius (IUGG, 6,371.0088 km): route lengths are sums of
// great-circle (haversine) segment lengths; "side by side" is tested on points sampled along
// one route every `stepM` metres, measuring the distance to the other route's segments in a
// local equirectangular projection (accurate to well under 1 % at these distances: common
// practice for sub-kilometre offsets). Only pairs of routes whose padded bounding boxes
// overlap are compared.

import { EARTH_RADIUS_KM, greatCircleKm } from './geodesy.js';

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

const EARTH_M = EARTH_RADIUS_KM * 1000;
const RAD = Math.PI / 180;

/** Length of a route along the sphere, km. */
export function routeKm(route: Route): number {
  let km = 0;
  for (let i = 1; i < route.length; i++)
    km += greatCircleKm(route[i - 1][1], route[i - 1][0], route[i][1], route[i][0]);
  return km;
}

/** Points every `stepM` metres along the route (ends included), each with the step it stands for. */
function sample(route: Route, stepM: number): { p: [number, number]; m: number }[] {
  const out: { p: [number, number]; m: number }[] = [];
  for (let i = 1; i < route.length; i++) {
    const [x0, y0] = route[i - 1];
    const [x1, y1] = route[i];
    const len = greatCircleKm(y0, x0, y1, x1) * 1000;
    const n = Math.max(1, Math.ceil(len / stepM));
    for (let k = i === 1 ? 0 : 1; k <= n; k++) {
      const t = k / n;
      out.push({ p: [x0 + (x1 - x0) * t, y0 + (y1 - y0) * t], m: k === 0 ? 0 : len / n });
    }
  }
  return out;
}

/** Distance in metres from point p to segment q0–q1 (local equirectangular projection at p). */
function pointSegmentM(
  p: readonly [number, number],
  q0: readonly [number, number],
  q1: readonly [number, number],
): number {
  const kx = Math.cos(p[1] * RAD) * RAD * EARTH_M;
  const ky = RAD * EARTH_M;
  const ax = (q0[0] - p[0]) * kx;
  const ay = (q0[1] - p[1]) * ky;
  const bx = (q1[0] - p[0]) * kx;
  const by = (q1[1] - p[1]) * ky;
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(1, Math.max(0, -(ax * dx + ay * dy) / len2)) : 0;
  const cx = ax + t * dx;
  const cy = ay + t * dy;
  return Math.hypot(cx, cy);
}

interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

function boxOf(route: Route, padDeg: number): Box {
  const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const [x, y] of route) {
    b.minX = Math.min(b.minX, x);
    b.maxX = Math.max(b.maxX, x);
    b.minY = Math.min(b.minY, y);
    b.maxY = Math.max(b.maxY, y);
  }
  const padX = padDeg / Math.max(0.01, Math.cos(((b.minY + b.maxY) / 2) * RAD));
  return { minX: b.minX - padX, maxX: b.maxX + padX, minY: b.minY - padDeg, maxY: b.maxY + padDeg };
}

const overlaps = (a: Box, b: Box) => a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;

/**
 * Pairs of routes that run within `withinM` of each other for more than `minKm`, longest
 * first. The stretch near a shared end (two links leaving the same site) counts too: a site's
 * first hundred metres are rarely the problem, so `minKm` should be well above `withinM`.
 */
export function sharedCorridors(routes: readonly Route[], options: CorridorOptions = {}): SharedCorridor[] {
  const withinM = options.withinM ?? 50;
  const minKm = options.minKm ?? 1;
  const stepM = options.stepM ?? 25;
  const padDeg = withinM / EARTH_M / RAD;
  const boxes = routes.map((r) => boxOf(r, padDeg));
  // Sampled only when a route has a partner to compare with: a long route has many samples.
  const samples: ({ p: [number, number]; m: number }[] | undefined)[] = [];
  const samplesOf = (a: number) => (samples[a] ??= sample(routes[a], stepM));
  const found: SharedCorridor[] = [];
  for (let a = 0; a < routes.length; a++) {
    if (routes[a].length < 2) continue;
    for (let b = a + 1; b < routes.length; b++) {
      if (routes[b].length < 2 || !overlaps(boxes[a], boxes[b])) continue;
      let m = 0;
      let from: [number, number] | undefined;
      let to: [number, number] | undefined;
      const box = boxes[b];
      for (const s of samplesOf(a)) {
        // Outside route b's box (padded by withinM) no segment of b can be near.
        if (s.p[0] < box.minX || s.p[0] > box.maxX || s.p[1] < box.minY || s.p[1] > box.maxY) continue;
        let near = false;
        for (let i = 1; i < routes[b].length && !near; i++)
          near = pointSegmentM(s.p, routes[b][i - 1], routes[b][i]) <= withinM;
        if (near) {
          m += s.m;
          from ??= s.p;
          to = s.p;
        }
      }
      if (m / 1000 > minKm && from && to) found.push({ a, b, km: m / 1000, from, to });
    }
  }
  return found.sort((x, y) => y.km - x.km || x.a - y.a || x.b - y.b);
}
