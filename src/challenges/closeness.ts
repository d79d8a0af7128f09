// Static targeted attack by closeness centrality (as an attack: Iyer, Killingback, Sundaram &
// Wang, PLoS ONE 8:e59613, 2013). Hop distances; for designs that are not connected the
// Wasserman–Faust form is used (Wasserman & Faust, Social Network Analysis, 1994, M; networkx's
// default): C(v) = ((r − 1)/Σ d(v, u)) · ((r − 1)/(N − 1)), r = nodes reachable from v, itself
// included. One BFS per node: O(N·L).

import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
import { rankScores } from './rank.js';
import { eligibleUnits } from './units.js';

export function closenessCentrality(g: CompactGraph): Float64Array {
  const n = g.n;
  const dist = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  const out = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    dist[s] = 0;
    let total = 0;
    while (head < tail) {
      const v = queue[head++];
      total += dist[v];
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (dist[w] < 0) {
          dist[w] = dist[v] + 1;
          queue[tail++] = w;
        }
      }
    }
    out[s] = total > 0 && n > 1 ? ((tail - 1) / total) * ((tail - 1) / (n - 1)) : 0;
    for (let i = 0; i < tail; i++) dist[queue[i]] = -1;
  }
  return out;
}

export const closeness: AttackChallenge = {
  name: 'closeness',
  type: 'attack',
  kind: 'node',
  summary: 'targeted attack: nodes by closeness centrality on the intact design, highest first',
  sequence: (g, steps) => rankScores(closenessCentrality(g), eligibleUnits(g, 'node'), steps),
};
