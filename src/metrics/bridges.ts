// bridges: the links whose single failure splits the surviving graph (parallel links are
// never bridges: their twin carries on). raw = how many there are.
// Normalisation, our own and deliberately not 1 − bridges/links: that would score a
// network with every link cut as 1 (no links, no bridges), which breaks "0 = no
// robustness left" (docs/METHODS.md §2.3). Instead the score is the share of the ORIGINAL node
// pairs that stay connected after ANY single link failure — Σ over 2-link-connected
// components of C(|C|, 2) / C(N0, 2). It is 1 for a 2-link-connected design and 0 for a
// tree, and it never rises as links or nodes are removed (a removal cannot create cycles);
// it never exceeds pair_connectivity.
// Cost: one low-link DFS, O(N + L).

import { cutMetric } from './kernels/cut-metric.js';

export const bridges = cutMetric(
  'bridges',
  'Bridges: links whose single failure disconnects the surviving graph.',
  'Share of the original node pairs still connected after any single link failure (Σ C(|C|,2) over 2-link-connected pieces / C(N0,2)).',
  (s) => ({ count: s.bridges, protectedPairs: s.twoEdgePairs }),
);
