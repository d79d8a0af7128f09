// A design's size — whether it runs in batches and is split across parts — is judged on the
// realizations the policy asks for, not on the lower count the budget leaves after base and
// head are paired (gate/budget.ts): a one-element change can leave the two sides one
// realization apart, pairing then writes the lower count into both requests, and judged on
// that count a design of thousands of asked realizations looked like a small one.
import { describe, expect, it } from 'vitest';
import { askedSpecs, budgetSpecs } from '../../src/gate/budget.js';
import { sequentialRun, splitAcrossParts, SEQUENTIAL_MIN_WORK, type GateRequest } from '../../src/gate-request.js';
import { compileTopology } from '../../src/graph/compact.js';
import { planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { parseDesign } from '../../src/topology/parse.js';
import { partsVariants } from '../cases/parts-design.js';

describe('the size of a design under a budget', () => {
  const v = partsVariants();
  const base = compileTopology(parseDesign(v.gridBase, 'networks/grid.csv'));
  const head = compileTopology(parseDesign(v.gridHead, 'networks/grid.csv'));
  const spec: EvaluationSpec = {
    r: { metrics: [{ id: 'efficiency', weight: 1 }], combine: 'mean' },
    seed: 5,
    challenges: [{ challenge: 'random-nodes', until: 0.2, points: 5, realizations: 8000 }],
  };
  const budgeted = budgetSpecs([spec], 2.1e7, head, base);
  const request = {} as GateRequest;

  it('is judged on the asked realizations when pairing lowered both sides', () => {
    // The budget leaves the two sides different counts, so pairing cut both to the lower one.
    expect(budgeted.cuts).toHaveLength(1);
    expect(budgeted.cuts[0].from).toBe(8000);
    expect(budgeted.head[0].challenges[0].realizations).toBe(budgeted.cuts[0].to);
    expect(askedSpecs(budgeted)[0].challenges[0].realizations).toBe(8000);
    const asked = planEvaluation(head, { ...askedSpecs(budgeted)[0], budget: { maxWork: Infinity } }).work;
    const lowered = planEvaluation(head, { ...budgeted.head[0], budget: { maxWork: Infinity } }).work;
    expect(asked).toBeGreaterThan(SEQUENTIAL_MIN_WORK);
    expect(lowered).toBeLessThan(SEQUENTIAL_MIN_WORK);
    expect(sequentialRun(request, askedSpecs(budgeted), head, base)).toBe(true);
    expect(splitAcrossParts(2, budgeted.head, head, base, askedSpecs(budgeted))).toBe(true);
    // Judged on the lowered counts, the same design would neither batch nor split.
    expect(sequentialRun(request, budgeted.head, head, base)).toBe(false);
    expect(splitAcrossParts(2, budgeted.head, head, base)).toBe(false);
  });
});
