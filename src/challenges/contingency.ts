// N−1 and N−2 contingencies: every single element, and every pair, of one kind (nodes or links)
// is removed in turn and R is taken on what is left — the planners' N−1 / N−2 criterion (common
// practice; e.g. NERC TPL-001 for transmission planning, docs/METHODS.md §6.5). Cases run in
// lexicographic index order; when a budget stops the enumeration, the cases evaluated and the
// cases that exist are both reported. Hardened elements are never removed. The evaluation
// itself lives in envelope/contingency.ts.

import type { ContingencyChallenge } from './types.js';

export const nMinus1: ContingencyChallenge = {
  name: 'n-1',
  type: 'contingency',
  order: 1,
  summary: 'N−1: every single node (or link, with element: link) removed in turn; worst cases reported',
};

export const nMinus2: ContingencyChallenge = {
  name: 'n-2',
  type: 'contingency',
  order: 2,
  summary: 'N−2: every pair of nodes (or links) removed, exhaustively within the work budget',
};
