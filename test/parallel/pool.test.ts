import { describe, expect, it } from 'vitest';
import { closeWorkers, evaluateDesignParallel, PARALLEL_MIN_WORK, workerEntry } from '../../src/parallel/pool.js';
import { evaluateDesign, planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { preferentialGraph } from '../envelope/graphs.js';

describe('deterministic parallel realizations', () => {
  const g = preferentialGraph(120, 2, 5);
  const spec: EvaluationSpec = {
    r: {
      metrics: [
        { id: 'efficiency', weight: 2 },
        { id: 'largest_component', weight: 1 },
      ],
      combine: 'mean',
    },
    seed: 77,
    challenges: [
      { challenge: 'random-links', realizations: 40, until: 0.5, worstCase: 3 },
      { challenge: 'random-nodes', realizations: 37, points: 6 },
      { challenge: 'degree-adaptive', until: 0.3 },
      { challenge: 'n-1' },
    ],
  };
  // Warm-started Lanczos (algebraic connectivity on a component above the dense limit) must
  // not make the result depend on the thread count either.
  const spectral: EvaluationSpec = {
    r: {
      metrics: [
        { id: 'algebraic_connectivity', weight: 1 },
        { id: 'largest_component', weight: 1 },
      ],
      combine: 'min',
    },
    seed: 3,
    challenges: [
      { challenge: 'random-links', realizations: 12, until: 0.1, points: 3 },
      { challenge: 'betweenness', until: 0.02 },
    ],
  };

  it('gives byte-identical JSON for 1 and 2 worker threads, and equals the synchronous evaluation', async () => {
    const one = await evaluateDesignParallel(g, spec, 1, { minWork: 0 });
    const two = await evaluateDesignParallel(g, spec, 2, { minWork: 0 });
    const sync = evaluateDesign(g, spec);
    const json = JSON.stringify(one.evaluation);
    expect(JSON.stringify(two.evaluation)).toBe(json);
    expect(JSON.stringify(sync.evaluation)).toBe(json);
    expect(two.samples.get('random-links')!.map((a) => Array.from(a))).toEqual(
      one.samples.get('random-links')!.map((a) => Array.from(a)),
    );
    expect(one.evaluation.envelopes[0].realizations).toBe(40);
  });

  it('stays byte-identical with warm-started spectral metrics', async () => {
    const big = preferentialGraph(300, 5, 8);
    const one = await evaluateDesignParallel(big, spectral, 1, { minWork: 0 });
    const two = await evaluateDesignParallel(big, spectral, 2, { minWork: 0 });
    expect(JSON.stringify(two.evaluation)).toBe(JSON.stringify(one.evaluation));
    // At 5 % every survivor is still connected, so the iterative eigen-solver ran there.
    expect(one.evaluation.envelopes[0].min[1]).toBeGreaterThan(0);
  });

  it('reuses its idle threads for the next evaluation, a different design included', async () => {
    const other = preferentialGraph(90, 3, 6);
    const a = await evaluateDesignParallel(other, spec, 2, { minWork: 0 });
    const b = await evaluateDesignParallel(g, spec, 2, { minWork: 0 });
    const c = await evaluateDesignParallel(other, spec, 2, { minWork: 0 });
    expect(JSON.stringify(c.evaluation)).toBe(JSON.stringify(a.evaluation));
    expect(JSON.stringify(b.evaluation)).toBe(JSON.stringify(evaluateDesign(g, spec).evaluation));
    await closeWorkers();
  });

  it('finds its worker from source (tsx) and from the bundle (dist/worker.js)', () => {
    const source = workerEntry(new URL('../../src/parallel/pool.ts', import.meta.url).href);
    expect(source.url.href).toBe(new URL('../../src/parallel/worker.ts', import.meta.url).href);
    expect(source.loader).toMatch(/tsx\/dist\/esm\/api\/index\.mjs$/);
    const bundled = workerEntry('file:///x/dist/cli.js');
    expect(bundled.url.href).toBe('file:///x/dist/worker.js');
    expect(bundled.loader).toBeUndefined();
  });

  it('runs small evaluations inline (no thread would pay for itself) with the same result', async () => {
    const small = { ...spec, challenges: [{ challenge: 'random-nodes' as const, realizations: 5 }] };
    const plan = planEvaluation(g, small);
    expect(plan.work).toBeLessThan(PARALLEL_MIN_WORK);
    expect(JSON.stringify((await evaluateDesignParallel(g, small, 2)).evaluation)).toBe(
      JSON.stringify(evaluateDesign(g, small).evaluation),
    );
  });

  it('rejects a thread count that is not a positive integer', async () => {
    await expect(evaluateDesignParallel(g, spec, 0)).rejects.toThrow(RangeError);
  });
});
