// Regional (geographically correlated) failures: a disaster disables every site strictly
// inside a disk of radius r around an epicentre (the disk model of Neumayer, Zussman, Cohen &
// Modiano, INFOCOM 2009, M). Epicentres are all sites with coordinates, one realization each;
// the x axis is the radius in km and the band is over epicentres. Distances are great-circle
// distances by the haversine formula (Sinnott, Sky & Telescope 68:159, 1984, M) on a sphere of
// the mean Earth radius R1 = 6371.0088 km (IUGG / GRS 80, Moritz, Bull. Géodésique 54:395,
// 1980, M); the spherical model errs by up to ~0.5 % against the ellipsoid, which is small next
// to the uncertainty of any disaster radius.
// Sites without coordinates are never removed, and links fail only with their end sites (no
// link geometry is known). Hardened sites survive. Cost: O(S²) distances for S sites.

import type { CompactGraph } from '../graph/compact.js';
import type { BandChallenge } from './types.js';
import { makeGrid } from './grid.js';
import { greatCircleKm } from '../topology/geodesy.js';

/** Indices of nodes with both coordinates, in index (natural id) order. */
export function sitesWithCoordinates(g: CompactGraph): number[] {
  const sites: number[] = [];
  if (g.lat === null || g.lon === null) return sites;
  for (let v = 0; v < g.n; v++) if (Number.isFinite(g.lat[v]) && Number.isFinite(g.lon[v])) sites.push(v);
  return sites;
}

/** Default radius limit: a quarter of the largest distance between two sites, to 2 significant digits. */
export function defaultRegionalUntil(g: CompactGraph): number {
  const sites = sitesWithCoordinates(g);
  let max = 0;
  for (let i = 0; i < sites.length; i++) {
    for (let j = i + 1; j < sites.length; j++) {
      const d = greatCircleKm(g.lat![sites[i]], g.lon![sites[i]], g.lat![sites[j]], g.lon![sites[j]]);
      if (d > max) max = d;
    }
  }
  return max > 0 ? Number((max / 4).toPrecision(2)) : 0;
}

export const regional: BandChallenge = {
  name: 'regional',
  type: 'band',
  summary: 'regional disasters: all sites within radius x km of an epicentre fail; band over epicentres at every site',
  plan(g, params) {
    const x = makeGrid(params.until, params.points, params.at);
    const all = sitesWithCoordinates(g);
    // A work budget may cap the epicentres: then they are spread evenly over the sites in id order.
    const cap = params.epicentres ?? all.length;
    const sites =
      cap >= all.length ? all : Array.from({ length: cap }, (_, r) => all[Math.floor((r * all.length) / cap)]);
    const removable = all.filter((v) => g.nodeHardened[v] === 0);
    const dist = new Float64Array(removable.length);
    const idx = removable.map((_, i) => i);
    return {
      kind: 'node',
      xUnit: 'km',
      x,
      realizations: sites.length,
      maxUnits: removable.length,
      label: (r) => g.nodeIds[sites[r]],
      realize(r, order, steps) {
        const c = sites[r];
        for (let i = 0; i < removable.length; i++) {
          dist[i] = greatCircleKm(g.lat![c], g.lon![c], g.lat![removable[i]], g.lon![removable[i]]);
        }
        idx.sort((a, b) => dist[a] - dist[b] || a - b);
        // Sorted by distance; steps[j] counts sites strictly inside radius x[j].
        let k = 0;
        for (let j = 0; j < x.length; j++) {
          while (k < idx.length && dist[idx[k]] < x[j]) k++;
          steps[j] = k;
        }
        const len = steps[x.length - 1];
        for (let i = 0; i < len; i++) order[i] = removable[idx[i]];
        return len;
      },
    };
  },
};
