import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findComponents, findCutElements } from '../../src/graph/structure.js';

const path = (n: number) => graphFromEdges(n, Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as const));
const cycle = (n: number) => graphFromEdges(n, Array.from({ length: n }, (_, i) => [i, (i + 1) % n] as const));

describe('structure', () => {
  // Textbook facts (common practice): every link of a tree is a bridge, every inner node of a path is a cut node.
  it('a path: every link is a bridge, every inner node a cut node', () => {
    const { bridges, cutNodes } = findCutElements(path(5));
    expect(bridges).toEqual([0, 1, 2, 3]);
    expect(cutNodes).toEqual([1, 2, 3]);
  });

  it('a cycle has no bridge and no cut node', () => {
    expect(findCutElements(cycle(6))).toEqual({ bridges: [], cutNodes: [] });
  });

  it('a parallel link is redundancy, not a bridge', () => {
    const g = graphFromEdges(3, [[0, 1], [0, 1], [1, 2]]);
    expect(findCutElements(g)).toEqual({ bridges: [2], cutNodes: [1] });
  });

  it('masking a cycle link turns the cycle into a path', () => {
    const g = cycle(5);
    const mask = createMask(g);
    mask.link[g.linkIndex.get('e4')!] = 1; // 4–0
    const ids = (list: number[]) => list.map((e) => g.linkIds[e]);
    const cuts = findCutElements(g, mask);
    expect(ids(cuts.bridges).sort()).toEqual(['e0', 'e1', 'e2', 'e3']);
    expect(cuts.cutNodes).toEqual([1, 2, 3]);
  });

  it('components count and the largest one, removed nodes excluded', () => {
    const g = path(7);
    const mask = createMask(g);
    mask.node[2] = 1;
    const c = findComponents(g, mask);
    expect(c.sizes).toEqual([2, 4]);
    expect(c.largest).toBe(1);
    expect(c.label[2]).toBe(-1);
  });

  it('a deep chain does not overflow the stack (iterative DFS)', () => {
    const n = 200_000;
    const { bridges, cutNodes } = findCutElements(path(n));
    expect(bridges.length).toBe(n - 1);
    expect(cutNodes.length).toBe(n - 2);
  });
});
