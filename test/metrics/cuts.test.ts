import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findCutElements } from '../../src/graph/structure.js';
import { getMetric } from '../../src/metrics/registry.js';
import { complete, cycle, expectRelative, path, randomEdges, rng, star } from './families.js';

const value = (id: string, g: ReturnType<typeof path>, mask = createMask(g)) => getMetric(id).create(g)(mask);

describe('bridges and cut_nodes', () => {
  it('scores: 2-connected designs 1, a tree 0 (bridges) and 2/N (cut nodes), an emptied design 0', () => {
    for (const id of ['bridges', 'cut_nodes']) {
      expect(value(id, cycle(8)).normalized).toBe(1);
      expect(value(id, complete(6)).normalized).toBe(1);
    }
    expect(value('bridges', path(10)).normalized).toBe(0);
    expectRelative(value('cut_nodes', path(10)).normalized, 2 / 10);
    expectRelative(value('cut_nodes', star(10)).normalized, 2 / 10);
    const g = cycle(6);
    const mask = createMask(g);
    mask.link.fill(1);
    expect(value('bridges', g, mask)).toEqual({ raw: 0, normalized: 0 });
    expect(value('cut_nodes', g, mask)).toEqual({ raw: 0, normalized: 0 });
  });
  it('a parallel link is never a bridge', () => {
    const g = graphFromEdges(3, [
      [0, 1],
      [0, 1],
      [1, 2],
    ]);
    expect(value('bridges', g).raw).toBe(1);
    // {0,1} is 2-link-connected: 1 of 3 pairs survives any single link failure.
    expectRelative(value('bridges', g).normalized, 1 / 3);
  });
  it('two triangles sharing a node: one cut node, blocks of 3 and 3 → 6 of 10 pairs', () => {
    const g = graphFromEdges(5, [
      [0, 1],
      [1, 2],
      [2, 0],
      [2, 3],
      [3, 4],
      [4, 2],
    ]);
    expect(value('cut_nodes', g).raw).toBe(1);
    expectRelative(value('cut_nodes', g).normalized, 6 / 10);
    expect(value('bridges', g)).toEqual({ raw: 0, normalized: 1 });
  });
  it('counts agree with src/graph/structure.ts on random masked multigraphs', () => {
    const r = rng(41);
    const edges = randomEdges(80, 110, 8);
    edges.push(...edges.slice(0, 10)); // parallels
    const g = graphFromEdges(80, edges);
    const b = getMetric('bridges').create(g);
    const c = getMetric('cut_nodes').create(g);
    const mask = createMask(g);
    for (let trial = 0; trial < 40; trial++) {
      for (let v = 0; v < g.n; v++) mask.node[v] = r() < 0.1 ? 1 : 0;
      for (let e = 0; e < g.m; e++) mask.link[e] = r() < 0.15 ? 1 : 0;
      const ref = findCutElements(g, mask);
      expect(b(mask).raw).toBe(ref.bridges.length);
      expect(c(mask).raw).toBe(ref.cutNodes.length);
    }
  });
});

describe('link connectivity counts parallel links', () => {
  it('three parallel links: λ = 3 (score capped at 1); a cycle with one doubled link: λ = 2; κ ignores parallels', () => {
    const triple = graphFromEdges(2, [
      [0, 1],
      [0, 1],
      [0, 1],
    ]);
    expect(value('link_connectivity', triple)).toEqual({ raw: 3, normalized: 1 });
    expect(value('node_connectivity', triple).raw).toBe(1);
    const ring = graphFromEdges(5, [
      [0, 1],
      [1, 2],
      [2, 3],
      [3, 4],
      [4, 0],
      [0, 1],
    ]);
    expect(value('link_connectivity', ring).raw).toBe(2);
    const chain = graphFromEdges(4, [
      [0, 1],
      [0, 1],
      [1, 2],
      [1, 2],
      [2, 3],
      [2, 3],
      [2, 3],
    ]);
    expect(value('link_connectivity', chain).raw).toBe(2);
  });
});

describe('node and link connectivity against brute force', () => {
  /** Smallest set of nodes (or links) whose removal disconnects the survivors, by enumeration. */
  function brute(n: number, edges: [number, number][], nodes: boolean): number {
    const connected = (_deadNode: number, deadLinks: Set<number>, deadNodes: Set<number>) => {
      const alive = [...Array(n).keys()].filter((v) => !deadNodes.has(v));
      if (alive.length < 2) return true;
      const seen = new Set([alive[0]]);
      const stack = [alive[0]];
      while (stack.length) {
        const v = stack.pop()!;
        edges.forEach(([a, b], e) => {
          if (deadLinks.has(e) || deadNodes.has(a) || deadNodes.has(b)) return;
          const w = a === v ? b : b === v ? a : -1;
          if (w >= 0 && !seen.has(w)) (seen.add(w), stack.push(w));
        });
      }
      return seen.size === alive.length;
    };
    const items = nodes ? n : edges.length;
    for (let k = 0; k <= items; k++) {
      // all k-subsets
      const idx = Array.from({ length: k }, (_, i) => i);
      for (;;) {
        const set = new Set(idx);
        const ok = nodes ? connected(-1, new Set(), set) && n - k >= 2 : connected(-1, set, new Set());
        if (!ok) return k;
        let i = k - 1;
        while (i >= 0 && idx[i] === items - k + i) i--;
        if (i < 0) break;
        idx[i]++;
        for (let j = i + 1; j < k; j++) idx[j] = idx[j - 1] + 1;
      }
      if (nodes && n - k - 1 < 2) return n - 1; // removing more would leave < 2 nodes: complete-like
    }
    return items;
  }
  it('matches exhaustive enumeration on seeded random graphs (κ ≤ λ ≤ δ_min holds throughout)', () => {
    for (let seed = 1; seed <= 12; seed++) {
      const n = 6 + (seed % 4);
      const edges = randomEdges(n, Math.min((n * (n - 1)) / 2, 2 * n + (seed % 5)), seed);
      const g = graphFromEdges(n, edges);
      const k = value('node_connectivity', g).raw;
      const l = value('link_connectivity', g).raw;
      expect(k).toBe(brute(n, edges, true));
      expect(l).toBe(brute(n, edges, false));
      expect(k).toBeLessThanOrEqual(l);
    }
  });
});
