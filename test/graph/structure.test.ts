import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findComponents, findCutElements, findStrandingGroups } from '../../src/graph/structure.js';
import { parseDesign } from '../../src/topology/parse.js';

const path = (n: number) =>
  graphFromEdges(
    n,
    Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as const),
  );
const cycle = (n: number) =>
  graphFromEdges(
    n,
    Array.from({ length: n }, (_, i) => [i, (i + 1) % n] as const),
  );

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
    const g = graphFromEdges(3, [
      [0, 1],
      [0, 1],
      [1, 2],
    ]);
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

describe('stranding shared-risk groups', () => {
  // A four-site ring 0–1–2–3 with a spur 3–4 (link 4, a bridge) and a twin of link 0 (link 5).
  const g = compileTopology(
    parseDesign(
      [
        'nodes: [{id: "0"}, {id: "1"}, {id: "2"}, {id: "3"}, {id: "4"}]',
        'links:',
        '  - {between: ["0", "1"], risk_groups: [twins, pair]}',
        '  - {between: ["1", "2"], risk_groups: [hard]}',
        '  - {between: ["2", "3"], risk_groups: [pair]}',
        '  - {between: ["3", "0"], risk_groups: [hard, spur], hardened: true}',
        '  - {between: ["3", "4"], risk_groups: [spur]}',
        '  - {between: ["0", "1"], risk_groups: [twins]}',
        '',
      ].join('\n'),
      'g.net.yaml',
    ),
  );
  const names = (list: number[]) => list.map((k) => g.groupIds[k]);

  it('a group counts for what its links do together, not for a bridge among them', () => {
    // pair: 0–1 (with a twin) and 2–3 cut the ring only with the twin gone too, so no;
    // twins: both 0–1 links at once cut nothing while the ring's other side stands, so no;
    // spur: its bridge 3–4 is left out, and 3–0 alone cuts nothing, so no;
    // hard: 1–2 and 3–0 cut the ring into {0, 1} and {2, 3, 4}.
    expect(names(findStrandingGroups(g, false))).toEqual(['hard']);
  });

  it('honouring hardening, a hardened link is never lost, so the group cuts nothing', () => {
    expect(names(findStrandingGroups(g, true))).toEqual([]);
  });

  it('parallel twins in one duct are one point of failure', () => {
    const spurTwins = graphFromEdges(3, [
      [0, 1],
      [1, 2],
      [1, 2],
    ]);
    expect(findStrandingGroups(spurTwins, false)).toEqual([]); // no group at all
    const t = compileTopology(
      parseDesign(
        'nodes: [{id: a}, {id: b}, {id: c}]\nlinks:\n  - {between: [a, b]}\n  - {between: [b, c], risk_groups: [d]}\n  - {between: [b, c], risk_groups: [d]}\n',
        't.net.yaml',
      ),
    );
    expect(findStrandingGroups(t, false)).toEqual([0]);
  });
});
