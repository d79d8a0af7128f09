// CSV designs under the built-in policy: a CSV whose header names source and target is a design;
// any other CSV changed in the same commit is no design and appears nowhere in the report.
import { afterAll, describe, expect, it } from 'vitest';
import { cleanupCases, runCase } from './harness.js';

afterAll(cleanupCases);

describe('CSV designs by their header', () => {
  it('judges the edge list and nothing else', async () => {
    const run = await runCase('data-csv-default');
    expect(run.report?.files.map((f) => f.path)).toEqual(['networks/estuary-ring.csv']);
    expect(JSON.stringify(run.report)).not.toMatch(/spares-budget|ducts-latin1/);
  });
});
