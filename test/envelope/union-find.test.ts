// The Newman–Ziff fast path must give exactly the registry metrics' values (not approximately:
// the engine switches between the two paths, and a gate compares their outputs).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask, type Mask } from '../../src/graph/mask.js';
import { getMetric } from '../../src/metrics/registry.js';
import { connectivityCurve } from '../../src/envelope/union-find.js';
import { unionFindR } from '../../src/envelope/r-value.js';
import { hashIds, randomOrder, seedWord } from '../../src/random.js';
import { removeUnit, unitCount } from '../../src/challenges/units.js';
import type { ElementKind } from '../../src/graph/element.js';
import { randomGraph } from './graphs.js';

function checkCurve(g: CompactGraph, kind: ElementKind, seed: number): void {
  const count = unitCount(g, kind);
  const order = new Int32Array(count);
  randomOrder(hashIds(Array.from({ length: count }, (_, i) => `u${i}`)), null, seedWord(seed), 0, order);
  const curve = connectivityCurve(g, kind, order, count);
  const lcc = getMetric('largest_component').create(g);
  const pairs = getMetric('pair_connectivity').create(g);
  const rl = unionFindR(g, { metrics: [{ id: 'largest_component', weight: 1 }], combine: 'mean' })!;
  const rp = unionFindR(g, { metrics: [{ id: 'pair_connectivity', weight: 1 }], combine: 'mean' })!;
  const mask: Mask = createMask(g);
  for (let k = 0; k <= count; k++) {
    if (k > 0) removeUnit(g, mask, kind, order[k - 1]);
    expect(rl(curve, k)).toBe(lcc(mask).normalized);
    expect(rp(curve, k)).toBe(pairs(mask).normalized);
  }
}

describe('reverse union–find curves (Newman & Ziff 2000)', () => {
  it('equal the registry metrics exactly at every node-removal step', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.integer({ min: 0, max: 90 }), fc.nat(1000), (n, l, seed) => {
        const links = Math.min(l, (n * (n - 1)) / 2);
        checkCurve(randomGraph(n, links, seed), 'node', seed);
      }),
      { numRuns: 60, seed: 20240601 },
    );
  });

  it('equal the registry metrics exactly at every link-removal step', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 40 }), fc.integer({ min: 0, max: 90 }), fc.nat(1000), (n, l, seed) => {
        checkCurve(randomGraph(n, Math.min(l, (n * (n - 1)) / 2), seed), 'link', seed);
      }),
      { numRuns: 60, seed: 20240602 },
    );
  });

  it('handle parallel links and the empty graph', () => {
    checkCurve(
      graphFromEdges(3, [
        [0, 1],
        [0, 1],
        [1, 2],
      ]),
      'link',
      3,
    );
    checkCurve(
      graphFromEdges(3, [
        [0, 1],
        [0, 1],
        [1, 2],
      ]),
      'node',
      3,
    );
    checkCurve(graphFromEdges(0, []), 'node', 1);
  });

  it('equal the registry metrics for shared-risk groups, overlapping and with hardened links', () => {
    const pos = { line: 1, column: 1 };
    const nodes = Array.from({ length: 8 }, (_, i) => ({ id: `s${i}`, hardened: false, pos, attrs: {} }));
    const ends: [number, number, string[], boolean][] = [
      [0, 1, ['duct-a'], false],
      [1, 2, ['duct-a', 'duct-b'], false],
      [2, 3, ['duct-b'], true],
      [3, 4, ['duct-c'], false],
      [4, 5, ['duct-c', 'duct-a'], false],
      [5, 6, [], false],
      [6, 7, ['duct-d'], false],
      [7, 0, ['duct-d', 'duct-b'], false],
    ];
    const g = compileTopology({
      file: 'x',
      format: 'native-yaml',
      nodes,
      links: ends.map(([a, b, groups, hardened], e) => ({
        id: `l${e}`,
        key: `s${a}-s${b}`,
        source: `s${a}`,
        target: `s${b}`,
        riskGroups: groups,
        hardened,
        pos,
        attrs: {},
      })),
      riskGroups: [],
      demands: [],
      metadata: {},
      warnings: [],
    });
    expect(g.groupIds.length).toBe(4);
    for (const seed of [1, 2, 3, 4, 5]) checkCurve(g, 'group', seed);
  });
});
