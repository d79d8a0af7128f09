// The same design written in another order is the same design: the fixture cases whose head
// only reorders the base's nodes and links must give base and head evaluations that agree in
// every number and every element named — every envelope, attack curve, contingency and worst
// case, not only the policy's requirements (the generic test checks those deltas are 0).
// Only source lines may differ, since the elements moved in the file, and the ids the reader
// derives for links without one: they spell the ends as written ("10—9" for a link written
// from 10 to 9) and number parallel links in file order ("4—11#2"), so the test compares them
// as their unordered ends. Lists of bridges and cut nodes follow the file (by line), so they
// are compared as sets.
import { afterAll, describe, expect, it } from 'vitest';
import { cleanupCases, runCase } from './harness.js';

afterAll(cleanupCases);

/** The evaluation without source lines, derived link ids as their sorted ends. */
function withoutLines(value: unknown): unknown {
  if (typeof value === 'string') {
    const ends = /^([^\u2014]+)\u2014([^\u2014#]+)(#\d+)?$/u.exec(value);
    return ends ? [ends[1], ends[2]].sort().join('\u2014') : value;
  }
  if (Array.isArray(value)) return value.map(withoutLines);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value)
        .filter(([k]) => k !== 'line')
        .map(([k, v]) => [k, withoutLines(v)]),
    );
  }
  return value;
}

describe('a reordered design evaluates exactly as the original', () => {
  for (const name of ['engine-node-order', 'engine-demo-reversed']) {
    it(name, async () => {
      const run = await runCase(name);
      expect(run.code, run.out + run.err).toBe(0);
      const files = run.report!.files;
      expect(files).toHaveLength(1);
      const { base, head } = files[0];
      expect(base).toBeDefined();
      expect(head!.envelopes.length + head!.attacks.length + head!.contingencies.length).toBeGreaterThan(2);
      const comparable = (ev: typeof head) => {
        const out = withoutLines(ev) as { structure: { bridges: { id: string }[]; cutNodes: { id: string }[] } };
        for (const list of [out.structure.bridges, out.structure.cutNodes])
          list.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
        return out;
      };
      expect(comparable(head)).toEqual(comparable(base));
      for (const r of files[0].requirements) if (r.base !== null) expect(r.delta, r.id).toBe(0);
    });
  }
});
