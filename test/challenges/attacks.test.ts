// Incremental and component-restricted kernels against plain recomputation from scratch.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask, type Mask } from '../../src/graph/mask.js';
import { adaptiveDegreeOrder, staticDegreeOrder } from '../../src/challenges/degree.js';
import { adaptiveBetweennessOrder, nodeBetweenness } from '../../src/challenges/betweenness.js';
import { adaptiveLinkBetweennessOrder } from '../../src/challenges/link-betweenness.js';
import { accumulateBetweenness, allNodes } from '../../src/challenges/brandes.js';
import { argmaxTied } from '../../src/challenges/rank.js';
import { randomGraph } from '../envelope/graphs.js';

function naiveAdaptiveDegree(g: CompactGraph, steps: number): number[] {
  const mask = createMask(g);
  const out: number[] = [];
  while (out.length < steps) {
    let best = -1;
    let bestDeg = -1;
    for (let v = 0; v < g.n; v++) {
      if (mask.node[v] || g.nodeHardened[v]) continue;
      let d = 0;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) if (!mask.node[g.neighbors[p]]) d++;
      if (d > bestDeg) {
        bestDeg = d;
        best = v;
      }
    }
    if (best < 0) break;
    out.push(best);
    mask.node[best] = 1;
  }
  return out;
}

function naiveAdaptive(g: CompactGraph, kind: 'node' | 'link', steps: number): number[] {
  const mask: Mask = createMask(g);
  const out: number[] = [];
  while (out.length < steps) {
    const score = new Float64Array(kind === 'node' ? g.n : g.m);
    accumulateBetweenness(g, mask, allNodes(g), kind === 'node' ? score : null, kind === 'link' ? score : null);
    const cand = new Uint8Array(score.length);
    for (let i = 0; i < score.length; i++) cand[i] = (kind === 'node' ? mask.node[i] : mask.link[i]) ? 0 : 1;
    const pick = argmaxTied(score, cand);
    if (pick < 0) break;
    out.push(pick);
    if (kind === 'node') mask.node[pick] = 1;
    else mask.link[pick] = 1;
  }
  return out;
}

const graphArb = fc.record({
  n: fc.integer({ min: 1, max: 30 }),
  l: fc.integer({ min: 0, max: 70 }),
  seed: fc.nat(10_000),
});

describe('targeted attack kernels', () => {
  it('adaptive degree with buckets equals recomputing every degree at each step', () => {
    fc.assert(
      fc.property(graphArb, ({ n, l, seed }) => {
        const g = randomGraph(n, Math.min(l, (n * (n - 1)) / 2), seed);
        expect(Array.from(adaptiveDegreeOrder(g, n))).toEqual(naiveAdaptiveDegree(g, n));
      }),
      { numRuns: 100, seed: 11 },
    );
  });

  it('adaptive betweenness recomputing one component equals recomputing the whole graph', () => {
    fc.assert(
      fc.property(graphArb, ({ n, l, seed }) => {
        const g = randomGraph(n, Math.min(l, (n * (n - 1)) / 2), seed);
        expect(Array.from(adaptiveBetweennessOrder(g, n))).toEqual(naiveAdaptive(g, 'node', n));
      }),
      { numRuns: 60, seed: 12 },
    );
  });

  it('adaptive link betweenness recomputing one component equals recomputing the whole graph', () => {
    fc.assert(
      fc.property(graphArb, ({ n, l, seed }) => {
        const g = randomGraph(n, Math.min(l, (n * (n - 1)) / 2), seed);
        expect(Array.from(adaptiveLinkBetweennessOrder(g, g.m))).toEqual(naiveAdaptive(g, 'link', g.m));
      }),
      { numRuns: 60, seed: 13 },
    );
  });

  it('break ties to the element first in the file and never remove hardened nodes', () => {
    // A 4-cycle: every node has degree 2 and the same betweenness.
    const c4 = graphFromEdges(4, [
      [0, 1],
      [1, 2],
      [2, 3],
      [3, 0],
    ]);
    expect(Array.from(staticDegreeOrder(c4, 4))).toEqual([0, 1, 2, 3]);
    // After node 0 goes, node 2 is the only one left with degree 2.
    expect(Array.from(adaptiveDegreeOrder(c4, 4))).toEqual([0, 2, 1, 3]);
    const bc = nodeBetweenness(c4);
    expect(bc[0]).toBeCloseTo(bc[1], 12);
    // Star with a hardened hub: the hub never goes.
    const star = graphFromEdges(4, [
      [0, 1],
      [0, 2],
      [0, 3],
    ]);
    const hardened = { ...star, nodeHardened: Uint8Array.from([1, 0, 0, 0]) };
    expect(Array.from(adaptiveDegreeOrder(hardened, 4))).toEqual([1, 2, 3]);
    expect(Array.from(adaptiveBetweennessOrder(hardened, 4))).toEqual([1, 2, 3]);
  });
});
