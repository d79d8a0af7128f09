import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findComponents } from '../../src/graph/structure.js';
import { getMetric } from '../../src/metrics/registry.js';
import { complete, path, randomEdges, rng, star } from './families.js';

const lcc = getMetric('largest_component');
const pairs = getMetric('pair_connectivity');

describe('largest_component and pair_connectivity', () => {
  it('are 1 on an intact connected graph', () => {
    const g = complete(6);
    expect(lcc.create(g)(createMask(g))).toEqual({ raw: 6, normalized: 1 });
    expect(pairs.create(g)(createMask(g))).toEqual({ raw: 15, normalized: 1 });
  });

  it('use the original node count N0 (docs/METHODS.md §2.2)', () => {
    // Removing the centre of a 10-node star leaves 9 isolated nodes.
    const g = star(10);
    const mask = createMask(g);
    mask.node[0] = 1;
    expect(lcc.create(g)(mask)).toEqual({ raw: 1, normalized: 0.1 });
    expect(pairs.create(g)(mask)).toEqual({ raw: 0, normalized: 0 });
    // Cutting the middle link of P6 leaves 3 + 3 nodes: 6 of 15 pairs.
    const p = path(6);
    const m2 = createMask(p);
    m2.link[2] = 1;
    expect(lcc.create(p)(m2)).toEqual({ raw: 3, normalized: 0.5 });
    expect(pairs.create(p)(m2).normalized).toBeCloseTo(6 / 15, 15);
  });

  it('score 0 on an emptied or empty graph', () => {
    const g = path(3);
    const mask = createMask(g);
    mask.node.fill(1);
    expect(lcc.create(g)(mask)).toEqual({ raw: 0, normalized: 0 });
    expect(pairs.create(g)(mask)).toEqual({ raw: 0, normalized: 0 });
    const empty = graphFromEdges(0, []);
    expect(lcc.create(empty)(createMask(empty)).normalized).toBe(0);
    expect(pairs.create(empty)(createMask(empty)).normalized).toBe(0);
  });

  it('agree with the BFS component finder of src/graph/structure.ts on random masks', () => {
    const r = rng(7);
    const g = graphFromEdges(60, randomEdges(60, 70, 3));
    const evalL = lcc.create(g);
    const evalP = pairs.create(g);
    const mask = createMask(g);
    for (let trial = 0; trial < 50; trial++) {
      for (let v = 0; v < g.n; v++) mask.node[v] = r() < 0.2 ? 1 : 0;
      for (let e = 0; e < g.m; e++) mask.link[e] = r() < 0.2 ? 1 : 0;
      const c = findComponents(g, mask);
      const largest = c.largest < 0 ? 0 : c.sizes[c.largest];
      const connected = c.sizes.reduce((s, k) => s + (k * (k - 1)) / 2, 0);
      expect(evalL(mask).raw).toBe(largest);
      expect(evalP(mask).raw).toBe(connected);
    }
  });
});
