// Static targeted attack by eigenvector centrality (Bonacich 1972, M; as an attack: Iyer,
// Killingback, Sundaram & Wang, PLoS ONE 8:e59613, 2013): nodes ranked once on the intact
// design by their entry in the principal eigenvector of the adjacency matrix.
// Power iteration on A + I (the shift keeps bipartite graphs from oscillating and leaves the
// eigenvectors unchanged), from the all-ones vector, until the largest change of the unit
// vector is below 1e-13 or 100,000 rounds; O(L) per round. On a disconnected design the
// iteration settles on the component(s) with the largest eigenvalue; the others score ~0 and
// are ranked after them by index (natural id order).

import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
import { rankScores } from './rank.js';
import { eligibleUnits } from './units.js';

export function eigenvectorCentrality(g: CompactGraph, tolerance = 1e-13, maxRounds = 100_000): Float64Array {
  const n = g.n;
  let x = new Float64Array(n).fill(n > 0 ? 1 / Math.sqrt(n) : 0);
  let y = new Float64Array(n);
  for (let round = 0; round < maxRounds; round++) {
    let norm = 0;
    for (let v = 0; v < n; v++) {
      let s = x[v];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) s += x[g.neighbors[p]];
      y[v] = s;
      norm += s * s;
    }
    norm = Math.sqrt(norm);
    if (norm === 0) break;
    let change = 0;
    for (let v = 0; v < n; v++) {
      y[v] /= norm;
      const d = Math.abs(y[v] - x[v]);
      if (d > change) change = d;
    }
    const t = x;
    x = y;
    y = t;
    if (change < tolerance) break;
  }
  return x;
}

export const eigenvector: AttackChallenge = {
  name: 'eigenvector',
  type: 'attack',
  kind: 'node',
  summary: 'targeted attack: nodes by eigenvector centrality on the intact design, highest first',
  sequence: (g, steps) => rankScores(eigenvectorCentrality(g), eligibleUnits(g, 'node'), steps),
};
