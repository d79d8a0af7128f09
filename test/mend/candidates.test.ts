// Candidate links: the planner's list (located errors), or generated site pairs whose length
// is the great-circle distance × the route factor. The demo's own link lengths were made by
// its generator (fixtures/demo/tools/generate.mjs) as great-circle distance × 1.3, rounded to
// 0.1 km — independently of netbrace — so a generated candidate between two demo sites that the
// base joins must come out at the length the base gives that link.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { PolicyError } from '../../src/errors.js';
import { compileTopology } from '../../src/graph/compact.js';
import { greatCircleKm } from '../../src/metrics/kernels/link-cost.js';
import { DEFAULT_ROUTE_FACTOR, generateCandidates, parseCandidateFile } from '../../src/mend/candidates.js';
import { parseDesign } from '../../src/topology/parse.js';
import { repoRoot } from '../topology/helpers.js';

const DEMO = readFileSync(
  path.join(repoRoot, 'fixtures', 'demo', 'base', 'designs', 'lunmere-backbone.net.yaml'),
  'utf8',
);

describe('generated candidates', () => {
  const full = parseDesign(DEMO, 'd.net.yaml');
  // Take the two retired links of the demo's first change out: their lengths are the reference.
  const retired = ['ibberlin-tarnquist', 'kaskeld-fenwhistle'];
  const head = compileTopology({ ...full, links: full.links.filter((l) => !retired.includes(l.id)) });
  const set = generateCandidates(head);

  it(`give the length the demo's generator gave: great circle × ${DEFAULT_ROUTE_FACTOR} (common practice), to 0.1 km`, () => {
    expect(set.source).toBe('generated');
    expect(set.unit).toBe('km');
    for (const id of retired) {
      const link = full.links.find((l) => l.id === id)!;
      const c = set.list.find(
        (x) => [head.nodeIds[x.a], head.nodeIds[x.b]].sort().join() === [link.source, link.target].sort().join(),
      );
      expect(c, id).toBeDefined();
      expect(c!.lengthKm).toBe(link.length);
    }
    for (const c of set.list) {
      const d = greatCircleKm(head.lat![c.a], head.lon![c.a], head.lat![c.b], head.lon![c.b]);
      expect(c.lengthKm).toBe(Math.round(d * 1.3 * 10) / 10);
    }
  });

  it('join only sites not yet joined, within the longest span the design has (the default limit)', () => {
    let longest = 0;
    const joined = new Set<string>();
    for (let e = 0; e < head.m; e++) {
      const [s, t] = [head.linkSource[e], head.linkTarget[e]];
      joined.add([s, t].sort((a, b) => a - b).join());
      longest = Math.max(longest, greatCircleKm(head.lat![s], head.lon![s], head.lat![t], head.lon![t]));
    }
    expect(set.maxKm).toBe(Math.round(longest * 10) / 10);
    for (const c of set.list) {
      expect(joined.has([c.a, c.b].sort((a, b) => a - b).join())).toBe(false);
      expect(c.lengthKm! / 1.3).toBeLessThanOrEqual(longest + 0.1);
    }
    // Shortest first.
    for (let i = 1; i < set.list.length; i++)
      expect(set.list[i].lengthKm!).toBeGreaterThanOrEqual(set.list[i - 1].lengthKm!);
    expect(
      generateCandidates(head, { maxKm: 30, routeFactor: 1.5 }).list.every((c) => c.lengthKm! <= 30 * 1.5 + 0.05),
    ).toBe(true);
  });

  it('without coordinates: every pair not yet joined, priced per link', () => {
    const g = compileTopology(
      parseDesign(
        'nodes: [{id: a}, {id: b}, {id: c}, {id: d}]\nlinks: [{between: [a, b]}, {between: [b, c]}]\n',
        'x.net.yaml',
      ),
    );
    const s = generateCandidates(g);
    expect(s.unit).toBe('link');
    expect(s.list.map((c) => [g.nodeIds[c.a], g.nodeIds[c.b]].join('-'))).toEqual(['a-c', 'a-d', 'b-d', 'c-d']);
  });
});

describe("the planner's candidate list", () => {
  const g = compileTopology(
    parseDesign('nodes: [{id: a}, {id: b}, {id: c}]\nlinks: [{between: [a, b]}]\n', 'x.net.yaml'),
  );

  it('reads links with lengths, costs, latencies and ducts; a site the design lacks is skipped with a note', () => {
    const text = [
      '# leased and new-build options',
      'candidates:',
      '  - {between: [a, c], length_km: 12.5, cost: 40, risk_groups: [duct-1], note: lease}',
      '  - {between: [b, c], length_km: 8, latency_ms: 0.2, cost: 55, id: new-bc}',
      '  - {between: [b, zed], length_km: 3, cost: 1}',
    ].join('\n');
    const s = parseCandidateFile(text, 'plan/c.yaml', g);
    expect(s.source).toBe('list');
    expect(s.unit).toBe('cost');
    expect(s.list).toEqual([
      { a: 0, b: 2, source: 'list', line: 3, lengthKm: 12.5, cost: 40, riskGroups: ['duct-1'], note: 'lease' },
      { a: 1, b: 2, source: 'list', line: 4, id: 'new-bc', lengthKm: 8, latencyMs: 0.2, cost: 55 },
    ]);
    expect(s.notes.join()).toContain('zed');
    expect(parseCandidateFile('candidates:\n  - {between: [a, c], length_km: 1}\n', 'c.yaml', g).unit).toBe('km');
  });

  const cases: [string, string, number, RegExp][] = [
    ['not a mapping', '- a\n', 1, /must be a mapping with a "candidates" list/],
    ['no list', 'links: []\n', 1, /no "candidates" list/],
    ['unknown key', 'candidates:\n  - between: [a, c]\n    lenght_km: 3\n', 3, /unknown key "lenght_km"/],
    ['one end', 'candidates:\n  - between: [a]\n    length_km: 3\n', 2, /"between" must list two site ids/],
    ['self-loop', 'candidates:\n  - {between: [a, a], length_km: 3}\n', 2, /to itself/],
    ['no price', 'candidates:\n  - between: [a, c]\n', 2, /neither "length_km" nor "cost"/],
    ['negative', 'candidates:\n  - between: [a, c]\n    length_km: -2\n', 3, /"length_km" must be a number ≥ 0/],
    ['bad yaml', 'candidates:\n  - {between: [a, c\n', 3, /not valid YAML/],
  ];
  for (const [name, text, line, message] of cases) {
    it(`reports ${name} at its line`, () => {
      let error: unknown;
      try {
        parseCandidateFile(text, 'plan/c.yaml', g);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(PolicyError);
      const e = error as PolicyError;
      expect(e.message).toMatch(message);
      expect(e.file).toBe('plan/c.yaml');
      expect(e.line).toBe(line);
    });
  }
});
