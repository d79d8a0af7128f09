import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { getMetric } from '../../src/metrics/registry.js';
import type { Topology } from '../../src/topology/model.js';
import { expectRelative } from './families.js';

const pos = { line: 0, column: 0 };

/** Index of the link the sketch lists as `id` (links are numbered by their ends, not by the sketch's order). */
const linkOf = (g: CompactGraph, id: string): number => g.linkIndex.get(id)!;

interface LinkSpec {
  a: string;
  b: string;
  length?: number;
  latency?: number;
}

function design(
  nodes: (string | { id: string; lat: number; lon: number })[],
  links: LinkSpec[],
  demands: [string, string, number][] = [],
  latencyBudget?: number,
): CompactGraph {
  const t: Topology = {
    file: 'test',
    format: 'native-yaml',
    nodes: nodes.map((v) =>
      typeof v === 'string' ? { id: v, hardened: false, pos, attrs: {} } : { ...v, hardened: false, pos, attrs: {} },
    ),
    links: links.map((l, e) => ({
      id: `l${e}`,
      key: `l${e}`,
      source: l.a,
      target: l.b,
      riskGroups: [],
      hardened: false,
      pos,
      attrs: {},
      ...(l.length !== undefined ? { length: l.length } : {}),
      ...(l.latency !== undefined ? { latency: l.latency } : {}),
    })),
    riskGroups: [],
    demands: demands.map(([s, d, volume]) => ({ source: s, target: d, volume, pos })),
    metadata: {},
    warnings: [],
    ...(latencyBudget !== undefined ? { latencyBudget } : {}),
  };
  return compileTopology(t);
}

const we = getMetric('weighted_efficiency');
const ds = getMetric('demand_served');

describe('weighted_efficiency', () => {
  it('triangle with lengths 1, 1, 3: E_w = (1 + 1 + 1/2)/3 (docs/METHODS.md §9.2, hand check); score ℓ_min·E_w without coordinates', () => {
    const g = design(
      ['a', 'b', 'c'],
      [
        { a: 'a', b: 'b', length: 1 },
        { a: 'b', b: 'c', length: 1 },
        { a: 'a', b: 'c', length: 3 },
      ],
    );
    const v = we.create(g)(createMask(g));
    expectRelative(v.raw, 0.833333333333, 1e-9);
    expectRelative(v.normalized, 0.833333333333, 1e-9);
  });
  it('prefers latency over length and needs the column on every link', () => {
    const both = design(['a', 'b'], [{ a: 'a', b: 'b', length: 100, latency: 2 }]);
    expectRelative(we.create(both)(createMask(both)).raw, 0.5);
    const partial = design(
      ['a', 'b', 'c'],
      [
        { a: 'a', b: 'b', latency: 2 },
        { a: 'b', b: 'c' },
      ],
    );
    expect(we.appliesTo(partial)).toBe(false);
    expect(we.appliesTo(graphFromEdges(3, [[0, 1]]))).toBe(false);
    const zero = design(['a', 'b'], [{ a: 'a', b: 'b', length: 0 }]);
    expect(we.appliesTo(zero)).toBe(false);
  });
  it('with coordinates the ideal is the great-circle distance: a straight chain of links along a meridian scores below 1 only through detours', () => {
    // Three sites on one meridian, 1° apart (≈ 111.2 km per degree, haversine with 6371.0088 km).
    const km = (Math.PI / 180) * 6371.0088;
    const nodes = [0, 1, 2].map((i) => ({ id: `s${i}`, lat: i, lon: 10 }));
    const straight = design(nodes, [
      { a: 's0', b: 's1', length: km },
      { a: 's1', b: 's2', length: km },
    ]);
    expectRelative(we.create(straight)(createMask(straight)).normalized, 1, 1e-9);
    // A 50 % longer first link lowers the score: ideal Σ = 2(2/km + 1/(2km)); actual Σ = 2(1/(1.5km) + 1/km + 1/(2.5km)).
    const bent = design(nodes, [
      { a: 's0', b: 's1', length: 1.5 * km },
      { a: 's1', b: 's2', length: km },
    ]);
    const expected = (1 / 1.5 + 1 + 1 / 2.5) / (2 + 1 / 2);
    expectRelative(we.create(bent)(createMask(bent)).normalized, expected, 1e-9);
  });
  it('uses N0 and parallel links offer the cheaper route', () => {
    const g = design(
      ['a', 'b', 'c'],
      [
        { a: 'a', b: 'b', length: 4 },
        { a: 'a', b: 'b', length: 2 },
        { a: 'b', b: 'c', length: 2 },
      ],
    );
    const mask = createMask(g);
    // pairs: a-b 2, b-c 2, a-c 4 → Σ over ordered pairs 2(1/2 + 1/2 + 1/4) / 6
    expectRelative(we.create(g)(mask).raw, (2 * (0.5 + 0.5 + 0.25)) / 6);
    mask.node[2] = 1;
    expectRelative(we.create(g)(mask).raw, (2 * 0.5) / 6);
  });
});

describe('demand_served', () => {
  const ring = () =>
    design(
      ['a', 'b', 'c', 'd'],
      [
        { a: 'a', b: 'b', latency: 1 },
        { a: 'b', b: 'c', latency: 1 },
        { a: 'c', b: 'd', latency: 1 },
        { a: 'd', b: 'a', latency: 5 },
      ],
      [
        ['a', 'c', 10],
        ['a', 'd', 30],
        ['b', 'b', 5],
        ['a', 'a', 0],
      ],
    );
  it('applies only with positive demand volume', () => {
    expect(ds.appliesTo(graphFromEdges(3, [[0, 1]]))).toBe(false);
    expect(ds.appliesTo(ring())).toBe(true);
  });
  it('counts volume whose ends survive and are connected; a self-demand needs only its site', () => {
    const g = ring();
    const evaluate = ds.create(g);
    const mask = createMask(g);
    expect(evaluate(mask)).toEqual({ raw: 45, normalized: 1 });
    mask.link[linkOf(g, 'l1')] = 1;
    mask.link[linkOf(g, 'l3')] = 1; // a-b | c-d
    expect(evaluate(mask)).toEqual({ raw: 5, normalized: 5 / 45 });
    mask.node[1] = 1;
    expect(evaluate(mask).raw).toBe(0);
  });
  it('with a latency budget, the detour must stay within budget × the intact latency', () => {
    const g = ring();
    const mask = createMask(g);
    mask.link[linkOf(g, 'l0')] = 1; // a-b gone. a→c: intact 2 (a-b-c), now 6 (a-d-c); a→d: intact 3 (a-b-c-d), now 5.
    // budget 1.5: a→c 6 > 3 and a→d 5 > 4.5, so only the self-demand b→b (5) is served.
    expect(ds.create(g, { latencyBudget: 1.5 })(mask).raw).toBe(5);
    // budget 2: a→d 5 ≤ 6 yes; a→c 6 ≤ 4 no.
    expect(ds.create(g, { latencyBudget: 2 })(mask).raw).toBe(35);
    // budget 3: both.
    expect(ds.create(g, { latencyBudget: 3 })(mask).raw).toBe(45);
    // budget 1: the intact paths themselves are within budget (no rounding loss).
    expect(ds.create(g, { latencyBudget: 1 })(createMask(g)).raw).toBe(45);
  });
  it("takes the design's latencyBudget unless the option overrides it, and hop counts without link costs", () => {
    const g = design(
      ['a', 'b', 'c'],
      [
        { a: 'a', b: 'b' },
        { a: 'b', b: 'c' },
        { a: 'a', b: 'c' },
      ],
      [['a', 'c', 1]],
      1.5,
    );
    const mask = createMask(g);
    mask.link[linkOf(g, 'l2')] = 1; // a-c: 1 hop → 2 hops
    expect(ds.create(g)(mask).raw).toBe(0);
    expect(ds.create(g, { latencyBudget: 2 })(mask).raw).toBe(1);
  });
});
