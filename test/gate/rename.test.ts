// Matching base and head elements: ids first, then renamed ids recognised by an unchanged
// neighbourhood (colour refinement on the unmatched remainder; common practice for diffing
// labelled graphs), links by their matched ends, groups by their members.
import { describe, expect, it } from 'vitest';
import { compileTopology, type CompactGraph } from '../../src/graph/compact.js';
import { matchDesigns } from '../../src/gate/rename.js';
import { parseDesign } from '../../src/topology/parse.js';

function design(nodes: string[], links: [string, string, string[]?][]): CompactGraph {
  const text = [
    'nodes:',
    ...nodes.map((id) => `  - id: ${id}`),
    'links:',
    ...links.map(([a, b, g]) => `  - between: [${a}, ${b}]${g ? `\n    risk_groups: [${g.join(', ')}]` : ''}`),
  ].join('\n');
  return compileTopology(parseDesign(`${text}\n`, 'x.net.yaml'));
}

const renamedPairs = (base: CompactGraph, head: CompactGraph) =>
  matchDesigns(base, head).renamedNodes.map(([b, h]) => [base.nodeIds[b], head.nodeIds[h]]);

describe('matchDesigns', () => {
  const ring = ['a', 'b', 'c', 'd'];
  const ringLinks: [string, string][] = [
    ['a', 'b'],
    ['b', 'c'],
    ['c', 'd'],
    ['d', 'a'],
  ];

  it('a renamed node with the same neighbours is matched, and so are its links', () => {
    const base = design([...ring, 'x'], [...ringLinks, ['c', 'x']]);
    const head = design([...ring, 'x2'], [...ringLinks, ['c', 'x2']]);
    const m = matchDesigns(base, head);
    expect(renamedPairs(base, head)).toEqual([['x', 'x2']]);
    expect([...m.linkToHead].every((h) => h >= 0)).toBe(true);
    expect([...m.nodeToBase].every((b) => b >= 0)).toBe(true);
  });

  it('two adjacent renamed nodes are matched in two rounds', () => {
    const base = design([...ring, 'x', 'y'], [...ringLinks, ['c', 'x'], ['x', 'y']]);
    const head = design([...ring, 'x2', 'y2'], [...ringLinks, ['c', 'x2'], ['x2', 'y2']]);
    expect(renamedPairs(base, head)).toEqual([
      ['x', 'x2'],
      ['y', 'y2'],
    ]);
  });

  it('a renamed node that also gained a neighbour is not a rename', () => {
    const base = design([...ring, 'x'], [...ringLinks, ['c', 'x']]);
    const head = design([...ring, 'x2'], [...ringLinks, ['c', 'x2'], ['x2', 'a']]);
    const m = matchDesigns(base, head);
    expect(m.renamedNodes).toEqual([]);
    expect(m.nodeToHead[base.nodeIndex.get('x')!]).toBe(-1);
  });

  it('two candidates with the same neighbourhood stay unmatched', () => {
    // x and y hang off c at base; at head both are renamed: which is which cannot be told.
    const base = design([...ring, 'x', 'y'], [...ringLinks, ['c', 'x'], ['c', 'y']]);
    const head = design([...ring, 'p', 'q'], [...ringLinks, ['c', 'p'], ['c', 'q']]);
    expect(matchDesigns(base, head).renamedNodes).toEqual([]);
  });

  it('a node removed and another added elsewhere are not a rename', () => {
    const base = design([...ring, 'x'], [...ringLinks, ['c', 'x']]);
    const head = design([...ring, 'y'], [...ringLinks, ['a', 'y']]);
    expect(matchDesigns(base, head).renamedNodes).toEqual([]);
  });

  it('a renamed shared-risk group with the same links is matched; a regrouped one is not', () => {
    const base = design(ring, [
      ['a', 'b', ['duct-1']],
      ['b', 'c'],
      ['c', 'd', ['duct-1']],
      ['d', 'a', ['duct-2']],
    ]);
    const renamed = design(ring, [
      ['a', 'b', ['canal']],
      ['b', 'c'],
      ['c', 'd', ['canal']],
      ['d', 'a', ['duct-2']],
    ]);
    const m = matchDesigns(base, renamed);
    expect(m.renamedGroups.map(([b, h]) => [base.groupIds[b], renamed.groupIds[h]])).toEqual([['duct-1', 'canal']]);
    const regrouped = design(ring, [
      ['a', 'b', ['canal']],
      ['b', 'c', ['canal']],
      ['c', 'd'],
      ['d', 'a', ['duct-2']],
    ]);
    const r = matchDesigns(base, regrouped);
    expect(r.renamedGroups).toEqual([]);
    expect(r.groupToHead[base.groupIds.indexOf('duct-1')]).toBe(-1);
  });

  it('parallel links are matched in file order, and a third one at head is added', () => {
    const base = design(
      ['a', 'b'],
      [
        ['a', 'b'],
        ['a', 'b'],
      ],
    );
    const head = design(
      ['a', 'b'],
      [
        ['a', 'b'],
        ['a', 'b'],
        ['a', 'b'],
      ],
    );
    const m = matchDesigns(base, head);
    expect([...m.linkToHead]).toEqual([0, 1]);
    expect([...m.linkToBase]).toEqual([0, 1, -1]);
  });
});
