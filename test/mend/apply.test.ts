// Applying a suggestion: the edited text of a design, parsed again, must compile to exactly the
// design the search judged (applyToTopology) — the same ids, stable keys (which seed the random
// orders), lengths, latencies, ducts and hardened flags — or the verdict promised would not be
// the verdict `check` gives.
import { describe, expect, it } from 'vitest';
import { compileTopology, type CompactGraph } from '../../src/graph/compact.js';
import { applyToText, applyToTopology, type Change } from '../../src/mend/apply.js';
import { parseDesign } from '../../src/topology/parse.js';

const YAML_DESIGN = `# a small design, comments kept
nodes:
  - id: a
    site: {lat: 1, lon: 1}
  - {id: b, hardened: false}
  - id: c
links:
  - between: [a, b]      # no id: named by its ends
  - {id: bc, between: [b, c], length_km: 5, latency_ms: 0.1}
  - {between: [b, b]}    # a self-loop, dropped by the reader
  - between: [a, b]      # a parallel twin
`;

const change: Change = {
  links: [
    { id: 'ac', between: ['a', 'c'], lengthKm: 7.5, latencyMs: 0.14, riskGroups: ['duct-9'], source: 'generated' },
    { id: 'ab-3', between: ['b', 'a'], lengthKm: 2, source: 'list' },
  ],
  harden: [
    { id: 'c', kind: 'node', line: 6 },
    { id: 'a\u2014b#2', kind: 'link', line: 11 },
  ],
};

function facts(g: CompactGraph) {
  return {
    nodes: g.nodeIds,
    nodeHardened: Array.from(g.nodeHardened),
    links: g.linkIds,
    keys: g.linkKeys,
    ends: Array.from(g.linkSource).map((s, e) => [s, g.linkTarget[e]]),
    length: g.length ? Array.from(g.length) : null,
    latency: g.latency ? Array.from(g.latency) : null,
    linkHardened: Array.from(g.linkHardened),
    groups: g.groupIds,
    groupLinks: Array.from(g.groupLinks),
  };
}

describe('applying a suggestion', () => {
  it('YAML: the edited file compiles to the design the search judged, and keeps its comments', () => {
    const t = parseDesign(YAML_DESIGN, 'd.net.yaml');
    const text = applyToText(YAML_DESIGN, 'native-yaml', t, change);
    expect(text).toContain('# a small design, comments kept');
    expect(text).toContain('# a parallel twin');
    expect(text).toContain(
      '  - id: ac\n    between: [a, c]\n    length_km: 7.5\n    latency_ms: 0.14\n    risk_groups: [duct-9]\n',
    );
    const edited = compileTopology(parseDesign(text, 'd.net.yaml'));
    const judged = compileTopology(applyToTopology(t, change));
    expect(facts(edited)).toEqual(facts(judged));
    // The parallel twin is hardened, not the first a–b link; the new b–a link is the third of the pair.
    expect(judged.linkHardened[judged.linkIndex.get('a\u2014b#2')!]).toBe(1);
    expect(judged.linkHardened[judged.linkIndex.get('a\u2014b')!]).toBe(0);
    expect(judged.linkKeys[judged.linkIndex.get('ab-3')!]).toBe('a\u2014b#3');
    expect(judged.nodeHardened[judged.nodeIndex.get('c')!]).toBe(1);
  });

  it('JSON: the same', () => {
    const json = JSON.stringify({
      nodes: [{ id: 'a' }, { id: 'b' }, { id: 'c' }],
      links: [
        { between: ['a', 'b'] },
        { id: 'bc', between: ['b', 'c'], length_km: 5, latency_ms: 0.1 },
        { between: ['a', 'b'] },
      ],
    });
    const t = parseDesign(json, 'd.net.json');
    const text = applyToText(json, 'native-json', t, change);
    expect(facts(compileTopology(parseDesign(text, 'd.net.json')))).toEqual(
      facts(compileTopology(applyToTopology(t, change))),
    );
  });

  it('refuses formats it cannot edit, with a hint', () => {
    const t = parseDesign('source,target\na,b\n', 'd.csv');
    expect(() => applyToText('source,target\na,b\n', 'csv', t, change)).toThrow(/cannot be edited by netbrace/);
  });
});
