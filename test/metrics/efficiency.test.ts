import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { getMetric } from '../../src/metrics/registry.js';
import { complete, cycle, expectRelative, harmonic, path, petersen, randomEdges, rng, star } from './families.js';

const eff = getMetric('efficiency');
const value = (g: ReturnType<typeof path>, mask = createMask(g)) => eff.create(g)(mask).raw;

/** Plain BFS from every node: the textbook definition, for cross-checks. */
function bruteEfficiency(n: number, edges: [number, number][], dead: Set<number>): number {
  const adj: number[][] = Array.from({ length: n }, () => []);
  for (const [a, b] of edges) {
    if (dead.has(a) || dead.has(b)) continue;
    adj[a].push(b);
    adj[b].push(a);
  }
  let sum = 0;
  for (let s = 0; s < n; s++) {
    if (dead.has(s)) continue;
    const dist = new Array<number>(n).fill(-1);
    dist[s] = 0;
    const q = [s];
    for (let h = 0; h < q.length; h++)
      for (const w of adj[q[h]]) if (dist[w] < 0) ((dist[w] = dist[q[h]] + 1), q.push(w));
    for (let t = 0; t < n; t++) if (t !== s && dist[t] > 0) sum += 1 / dist[t];
  }
  return sum / (n * (n - 1));
}

describe('efficiency closed forms (docs/METHODS.md §9.2; Latora & Marchiori, PRL 87:198701, 2001)', () => {
  it('K_n = 1', () => {
    for (const n of [2, 5, 40]) expectRelative(value(complete(n)), 1);
  });
  it('star on N nodes = (N+2)/(2N) (derived in docs/METHODS.md §9.2)', () => {
    for (const n of [3, 10, 70]) expectRelative(value(star(n)), (n + 2) / (2 * n));
  });
  it('path P_N = 2H_{N-1}/(N-1) - 2/N (derived in docs/METHODS.md §9.2)', () => {
    expectRelative(value(path(10)), 0.428659612, 1e-8);
    for (const n of [2, 7, 33, 100]) expectRelative(value(path(n)), (2 * harmonic(n - 1)) / (n - 1) - 2 / n);
  });
  it('cycle C_N, odd and even forms (derived in docs/METHODS.md §9.2)', () => {
    expectRelative(value(cycle(10)), 0.485185185, 1e-8);
    for (const n of [7, 31, 65]) expectRelative(value(cycle(n)), (2 * harmonic((n - 1) / 2)) / (n - 1));
    for (const n of [10, 32, 64]) expectRelative(value(cycle(n)), (2 * harmonic(n / 2 - 1) + 2 / n) / (n - 1));
  });
  it('Petersen = 2/3 (docs/METHODS.md §9.2, V)', () => {
    expectRelative(value(petersen()), 2 / 3);
  });
});

describe('efficiency under removal', () => {
  it('uses N0: P5 minus an end node gives 0.433333, not 0.722222 (docs/METHODS.md §2.2, V)', () => {
    const g = path(5);
    const mask = createMask(g);
    expectRelative(value(g, mask), 0.641667, 1e-6);
    mask.node[4] = 1;
    expectRelative(value(g, mask), 0.433333, 1e-6);
  });
  it('is 0 when nothing or one node survives, and for graphs under two nodes', () => {
    const g = path(4);
    const mask = createMask(g);
    mask.node.fill(1);
    expect(value(g, mask)).toBe(0);
    mask.node[2] = 0;
    expect(value(g, mask)).toBe(0);
    expect(value(graphFromEdges(1, []))).toBe(0);
    expect(value(graphFromEdges(0, []))).toBe(0);
  });
  it('ignores parallel links and self-loops', () => {
    const g = graphFromEdges(3, [
      [0, 1],
      [0, 1],
      [1, 2],
      [2, 2],
    ]);
    expectRelative(value(g), value(path(3)));
  });
  it('matches single-source BFS on long thin graphs (the one-source-at-a-time path) and under masks', () => {
    const r = rng(5);
    const n = 400;
    const edges: [number, number][] = [];
    for (let i = 0; i + 1 < n; i++) {
      edges.push([i, i + 1]);
      if (r() < 0.3 && i + 3 < n) edges.push([i, i + 2 + Math.floor(r() * 2)]);
    }
    const g = graphFromEdges(n, edges);
    const evaluate = eff.create(g);
    const mask = createMask(g);
    const dead = new Set<number>();
    expectRelative(evaluate(mask).raw, bruteEfficiency(n, edges, dead), 1e-10);
    for (const v of [17, 150, 151, 333]) {
      mask.node[v] = 1;
      dead.add(v);
    }
    expectRelative(evaluate(mask).raw, bruteEfficiency(n, edges, dead), 1e-10);
  });
  it('matches single-source BFS on random graphs and masks across batch widths (32..256 sources)', () => {
    const r = rng(11);
    for (const [n, m] of [
      [20, 30],
      [45, 60],
      [130, 260],
      [300, 500],
      [700, 1400],
    ] as const) {
      const edges = randomEdges(n, m, n);
      const g = graphFromEdges(n, edges);
      const evaluate = eff.create(g);
      const mask = createMask(g);
      for (let trial = 0; trial < 3; trial++) {
        const dead = new Set<number>();
        for (let v = 0; v < n; v++) {
          mask.node[v] = trial > 0 && r() < 0.15 ? 1 : 0;
          if (mask.node[v]) dead.add(v);
        }
        expectRelative(evaluate(mask).raw, bruteEfficiency(n, edges, dead), 1e-10);
      }
    }
  });
});
