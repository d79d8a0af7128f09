// The engine's work estimate (envelope/cost.ts, evaluate.ts) against the operations a run
// actually performs, counted by the kernels (metrics/kernels/work-count.ts): a deterministic
// measure, not wall time (time is compared in test/bench/budget.bench.ts). For each design
// family and challenge, estimate ÷ counted must stay in one fixed range, so a design whose
// searches are cheaper or dearer than the model says (a ring that falls into pieces, a
// small-world graph searched 256 sources at a time) fails here before it misleads a budget.
// The counted operations are weighted with the same unit costs the estimate uses (PLAIN_VISIT,
// WORD_VISIT), so the test checks which searches, levels and survivors the model predicts;
// the unit costs themselves were fitted to time (cost.ts says on what). Drawing removal orders
// and the adaptive degree ranking are estimated from time and not counted, which the upper end
// of the range leaves room for.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { parseDesign } from '../../src/topology/parse.js';
import { evaluateDesign, planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { ALL_PAIRS_OVERHEAD, PLAIN_VISIT, WORD_VISIT, hopSearchCost, survivorShape } from '../../src/envelope/cost.js';
import { createRValue } from '../../src/envelope/r-value.js';
import { createMask } from '../../src/graph/mask.js';
import { kernelWork, resetKernelWork } from '../../src/metrics/kernels/work-count.js';
import type { ChallengeParams } from '../../src/challenges/types.js';
import type { RValueSpec } from '../../src/envelope/types.js';
import { preferentialGraph, randomGraph } from './graphs.js';

/** Estimate ÷ counted work must lie in this range on every family and challenge. */
const LOW = 0.6;
const HIGH = 2;

const counted = () => PLAIN_VISIT * kernelWork.visits + WORD_VISIT * kernelWork.wordVisits;
const zoo = (name: string) => {
  const file = path.join(import.meta.dirname, `../../fixtures/topology-zoo/graphml/${name}.graphml`);
  return compileTopology(parseDesign(readFileSync(file, 'utf8'), `${name}.graphml`, {}));
};
const grid = (w: number) => {
  const e: [number, number][] = [];
  for (let i = 0; i < w; i++)
    for (let j = 0; j < w; j++) {
      if (j + 1 < w) e.push([i * w + j, i * w + j + 1]);
      if (i + 1 < w) e.push([i * w + j, (i + 1) * w + j]);
    }
  return graphFromEdges(w * w, e);
};
const ring = (n: number) =>
  graphFromEdges(
    n,
    Array.from({ length: n }, (_, i) => [i, (i + 1) % n] as [number, number]),
  );

// Small enough that every run takes well under a second.
const families: [string, () => CompactGraph][] = [
  ['preferential attachment 400 × 2', () => preferentialGraph(400, 2, 5)],
  ['G(n, L) 400, 800', () => randomGraph(400, 800, 5)],
  ['grid 12 × 12', () => grid(12)],
  ['ring 300', () => ring(300)],
  // Topology Zoo (Knight et al., IEEE JSAC 2011, CC BY 4.0): a long one, a meshier one, a tree-like one.
  ['zoo Cogentco', () => zoo('Cogentco')],
  ['zoo Colt', () => zoo('Colt')],
  ['zoo GtsCe', () => zoo('GtsCe')],
];
const r: RValueSpec = {
  metrics: [
    { id: 'pair_connectivity', weight: 1 },
    { id: 'efficiency', weight: 1 },
  ],
  combine: 'mean',
};
const challenges: ChallengeParams[] = [
  { challenge: 'random-nodes', until: 0.2, points: 5, realizations: 12 },
  { challenge: 'random-links', until: 0.2, points: 5, realizations: 12 },
  { challenge: 'degree-adaptive', until: 0.2 },
  { challenge: 'n-1', element: 'link' },
];

describe('work estimate against counted operations', () => {
  for (const [name, make] of families) {
    it(`${name}: each challenge's estimate within ${LOW}–${HIGH}× of the operations its run counts`, () => {
      const g = make();
      const ratios: string[] = [];
      for (const c of challenges) {
        const spec: EvaluationSpec = { r, seed: 3, challenges: [{ ...c }], budget: { maxWork: Infinity } };
        const estimate = planEvaluation(g, spec).work;
        resetKernelWork();
        evaluateDesign(g, spec);
        const ratio = estimate / counted();
        ratios.push(`${c.challenge} ${ratio.toFixed(2)}`);
        expect(ratio, `${name}, ${c.challenge}: estimate ${estimate}, counted ${counted()}`).toBeGreaterThan(LOW);
        expect(ratio, `${name}, ${c.challenge}: estimate ${estimate}, counted ${counted()}`).toBeLessThan(HIGH);
      }
      expect(ratios).toHaveLength(challenges.length);
      if (process.env.NETBRACE_PRINT_RATIOS) console.log(`${name}: ${ratios.join(', ')}`);
    });
  }

  // Efficiency from a seeded sample of 1,024 sources (r-value sources), as the built-in policy
  // runs larger designs; the attacks are long enough to be strided and shared out to pieces.
  const sampledChallenges: ChallengeParams[] = [
    { challenge: 'random-nodes', until: 0.2, points: 5, realizations: 2 },
    { challenge: 'degree-adaptive', until: 0.06 },
  ];
  for (const n of [4000, 10_000]) {
    it(`preferential attachment ${n} × 2, 1,024 sampled sources: estimates within ${LOW}–${HIGH}× of counted`, () => {
      const g = preferentialGraph(n, 2, 5);
      const sampled: RValueSpec = { ...r, sources: 1024 };
      // The long attack on the larger one would take seconds; its band is the sampled path.
      for (const c of n > 4000 ? sampledChallenges.slice(0, 1) : sampledChallenges) {
        const spec: EvaluationSpec = { r: sampled, seed: 3, challenges: [{ ...c }], budget: { maxWork: Infinity } };
        const estimate = planEvaluation(g, spec).work;
        resetKernelWork();
        evaluateDesign(g, spec);
        const ratio = estimate / counted();
        if (process.env.NETBRACE_PRINT_RATIOS) console.log(`sampled ${n}, ${c.challenge}: ${ratio.toFixed(2)}`);
        expect(ratio, `${n}, ${c.challenge}: estimate ${estimate}, counted ${counted()}`).toBeGreaterThan(LOW);
        expect(ratio, `${n}, ${c.challenge}: estimate ${estimate}, counted ${counted()}`).toBeLessThan(HIGH);
      }
      // The sample is what makes it cheap: the exact search costs several times more.
      const exact = planEvaluation(g, {
        r,
        seed: 3,
        challenges: [sampledChallenges[0]],
        budget: { maxWork: Infinity },
      });
      const cheap = planEvaluation(g, {
        r: sampled,
        seed: 3,
        challenges: [sampledChallenges[0]],
        budget: { maxWork: Infinity },
      });
      expect(exact.work).toBeGreaterThan(2.5 * cheap.work);
    });
  }

  it('costs one all-pairs search on the survivors: a ring cut into pieces is far cheaper than the whole ring', () => {
    const g = ring(300);
    const mask = createMask(g);
    for (let v = 0; v < g.n; v += 10) mask.node[v] = 1; // 30 arcs of 9 sites
    const rf = createRValue(g, { metrics: [{ id: 'efficiency', weight: 1 }], combine: 'mean' });
    for (const m of [createMask(g), mask]) {
      resetKernelWork();
      rf(m);
      // The fixed part of an evaluation (scratch resets) is time, not counted operations.
      const ratio = (hopSearchCost(survivorShape(g, m)) - ALL_PAIRS_OVERHEAD) / counted();
      expect(ratio).toBeGreaterThan(LOW);
      expect(ratio).toBeLessThan(HIGH);
    }
    // Whole: one plain search per site (eccentricity 150); in pieces: one 2-word batch per arc.
    expect(hopSearchCost(survivorShape(g))).toBeGreaterThan(10 * hopSearchCost(survivorShape(g, mask)));
  });
});
