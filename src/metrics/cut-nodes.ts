// cut_nodes: the nodes (articulation points) whose single failure splits the surviving
// graph. raw = how many there are.
// Normalisation, our own and deliberately not 1 − cut nodes/nodes: that would score a
// network whose links are all gone as 1 (isolated nodes are never cut nodes), which breaks
// "0 = no robustness left" (docs/METHODS.md §2.3). Instead the score is the share of the ORIGINAL
// node pairs that no single failure of a third node can separate — pairs inside one block
// (biconnected component; a bridge is a two-node block): Σ_B C(|B|, 2) / C(N0, 2). Two
// blocks share at most one node, so no pair is counted twice. 1 for a 2-connected design,
// 2/N0 for a path or a star; it never rises as links or nodes are removed.
// Cost: one low-link DFS, O(N + L).

import { cutMetric } from './kernels/cut-metric.js';

export const cutNodes = cutMetric(
  'cut_nodes',
  'Cut nodes: nodes whose single failure disconnects the surviving graph.',
  'Share of the original node pairs that no single third-node failure separates (Σ C(|B|,2) over blocks / C(N0,2)).',
  (s) => ({ count: s.cutNodes, protectedPairs: s.blockPairs }),
);
