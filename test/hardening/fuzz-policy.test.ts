// Property-based fuzzing of the policy loader: the real policies of the repository (the full
// example and its base, the gate's, the demo's, the starter policy `netbrace init` writes),
// mutated by a few edits, plus token soup in the policy's own vocabulary and policies drawn
// at random from its keys and hostile values. The only outcomes allowed are a Policy (whose
// per-file rules and engine plans can then be built without an exception), or a PolicyError
// naming one of the files read and a line of it. Seeded, counts bounded.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stringify as yamlStringify } from 'yaml';
import { planEvaluation } from '../../src/envelope/evaluate.js';
import { graphFromEdges } from '../../src/graph/compact.js';
import { STARTER_POLICY } from '../../src/policy/defaults.js';
import { isDesignPath, loadPolicy, policyForFile } from '../../src/policy/resolve.js';
import type { Policy } from '../../src/policy/types.js';
import { evaluationSpecs } from '../../src/gate-request.js';
import { attempt, fixtureText, locationProblems, reportCount, SEED, Tally } from './support.js';

const HANG_MS = 10_000;
const RUNS = 1500;

const ENTRY = 'policies/team.yaml';
const BASE = 'policies/base.yaml';

const SEEDS: { name: string; text: string; base?: string }[] = [
  {
    name: 'fixtures/policy/full.yaml',
    text: fixtureText('policy', 'full.yaml'),
    base: fixtureText('policy', 'base.yaml'),
  },
  { name: 'fixtures/policy/base.yaml', text: fixtureText('policy', 'base.yaml') },
  { name: 'fixtures/gate/policy.yaml', text: fixtureText('gate', 'policy.yaml') },
  {
    name: 'fixtures/gate/inherits/team.yaml',
    text: fixtureText('gate', 'inherits', 'team.yaml'),
    base: fixtureText('gate', 'inherits', 'org.yaml'),
  },
  { name: 'fixtures/demo/policy.yaml', text: fixtureText('demo', 'policy.yaml') },
  { name: 'STARTER_POLICY', text: STARTER_POLICY },
];

const TOKENS = [
  'version: 1',
  'version: 2',
  'inherits: base.yaml',
  'inherits: team.yaml',
  'inherits: ../../../etc/passwd',
  'inherits: /etc/passwd',
  'inherits: ""',
  'designs:',
  '  - paths: "../**"',
  '  - paths: "/etc/*"',
  '  - paths: "**/*"',
  '    format: graphml',
  '    format: exe',
  'exclude: ["**"]',
  'seed: -1',
  'seed: 4294967296',
  'seed: 1e20',
  'seed: .nan',
  'r-value:',
  '  metrics:',
  '    efficiency: 0',
  '    efficiency: -1',
  '    pair_connectivity: 1e999',
  '    bogus_metric: 1',
  '  combine: min',
  'challenges:',
  '  c1:',
  '    remove: nodes',
  '    remove: region',
  '    remove: risk-groups',
  '    order: worst-first',
  '    order: sideways',
  '    adaptive: true',
  '    until: 0',
  '    until: 1e999',
  '    until: 1.5',
  '    points: 1',
  '    points: 1001',
  '    realizations: 0',
  '    realizations: 1000000',
  '    band: [0.9, 0.1]',
  '    band: [0, 1]',
  '    worst-case: 10',
  '    beam: 0',
  'requirements:',
  '  - kind: r-threshold',
  '  - kind: n-1',
  '  - kind: no-new-spof',
  '    challenge: c1',
  '    challenge: missing',
  '    at: 0.1',
  '    at: 99',
  '    statistic: quantile',
  '    statistic: worst-case',
  '    q: 0',
  '    q: 1',
  '    removals: 11',
  '    min: 2',
  '    min: -1',
  '    max: 0',
  '    element: group',
  '    severity: fatal',
  '    elements: [bridges]',
  'weakening:',
  '  allowed-drop: -1',
  '  error-multiple: 1e999',
  'removed-designs: ignore',
  'scopes:',
  '  - paths: "networks/core/**"',
  '    requirements: []',
  '&a ',
  '*a',
  '<<: *a',
  '!!binary',
  '? ',
  '- ',
  '{',
  '}',
  '[',
  ']',
  '"',
  "'",
  '|',
  '>',
  '---',
  '...',
  '__proto__:',
  'constructor:',
  '\t',
  '\n',
  '  ',
  '#',
  ': ',
  ',',
  '~',
  '\u2028',
  '\uFEFF',
];

type Edit =
  | { op: 'insert'; at: number; s: string }
  | { op: 'replace'; at: number; s: string }
  | { op: 'delete'; at: number; len: number }
  | { op: 'line'; at: number; to: number; dup: boolean };

function applyEdit(text: string, e: Edit): string {
  const at = (f: number, n: number) => Math.min(n, Math.floor(f * (n + 1)));
  if (e.op === 'insert' || e.op === 'replace') {
    const i = at(e.at, text.length);
    return text.slice(0, i) + e.s + text.slice(e.op === 'insert' ? i : i + e.s.length);
  }
  if (e.op === 'delete') {
    const i = at(e.at, text.length);
    return text.slice(0, i) + text.slice(i + e.len);
  }
  const lines = text.split('\n');
  const i = Math.min(lines.length - 1, at(e.at, lines.length - 1));
  const j = Math.min(lines.length - 1, at(e.to, lines.length - 1));
  if (e.dup) lines.splice(j, 0, lines[i]);
  else [lines[i], lines[j]] = [lines[j], lines[i]];
  return lines.join('\n');
}

const frac = fc.double({ min: 0, max: 1, noNaN: true });
const piece = fc.oneof(fc.constantFrom(...TOKENS), fc.string({ unit: 'binary', maxLength: 6 }));
const edit: fc.Arbitrary<Edit> = fc.oneof(
  fc.record({
    op: fc.constantFrom('insert' as const, 'replace' as const),
    at: frac,
    s: fc.oneof(
      piece,
      piece.map((p) => `\n${p}`),
    ),
  }),
  fc.record({ op: fc.constant('delete' as const), at: frac, len: fc.integer({ min: 1, max: 60 }) }),
  fc.record({ op: fc.constant('line' as const), at: frac, to: frac, dup: fc.boolean() }),
);

/** A policy drawn from the policy's keys with values that are often out of range. */
const NUMBER = fc.oneof(
  fc.constantFrom(0, 1, -1, 0.5, 2, 1001, 1e6, Number.POSITIVE_INFINITY, Number.NaN),
  fc.double({ noNaN: false }),
);
const drawnPolicy = fc
  .record(
    {
      version: fc.constantFrom(1, 2, '1'),
      seed: NUMBER,
      'r-value': fc.record(
        {
          metrics: fc.dictionary(
            fc.constantFrom('efficiency', 'pair_connectivity', 'largest_component', 'bogus'),
            NUMBER,
            { maxKeys: 3 },
          ),
          combine: fc.constantFrom('mean', 'min', 'max'),
        },
        { requiredKeys: ['metrics'] },
      ),
      challenges: fc.dictionary(
        fc.constantFrom('c1', 'c2', '__proto__', 'a b'),
        fc.record(
          {
            remove: fc.constantFrom('nodes', 'links', 'risk-groups', 'region', 'all'),
            order: fc.constantFrom('random', 'degree', 'betweenness', 'eigenvector', 'closeness', 'worst-first', 'x'),
            adaptive: fc.boolean(),
            until: NUMBER,
            points: NUMBER,
            realizations: NUMBER,
            band: fc.tuple(NUMBER, NUMBER),
            'worst-case': NUMBER,
            beam: NUMBER,
            seed: NUMBER,
          },
          { requiredKeys: ['remove'] },
        ),
        { maxKeys: 2 },
      ),
      requirements: fc.array(
        fc.record(
          {
            kind: fc.constantFrom('r-threshold', 'area-floor', 'spread-ceiling', 'n-1', 'no-new-spof', 'other'),
            challenge: fc.constantFrom('c1', 'c2', 'missing'),
            at: NUMBER,
            statistic: fc.constantFrom('quantile', 'median', 'mean', 'min', 'worst-case', 'value'),
            q: NUMBER,
            removals: NUMBER,
            min: NUMBER,
            max: NUMBER,
            element: fc.constantFrom('node', 'link', 'group'),
            severity: fc.constantFrom('fail', 'warn', 'notice', 'fatal'),
          },
          { requiredKeys: ['kind'] },
        ),
        { maxLength: 3 },
      ),
      weakening: fc.record(
        {
          'allowed-drop': NUMBER,
          'allowed-relative-drop': NUMBER,
          'error-multiple': NUMBER,
          severity: fc.constantFrom('fail', 'warn'),
        },
        { requiredKeys: [] },
      ),
      'removed-designs': fc.constantFrom('fail', 'warn', 'notice', 'ignore', 'never'),
      inherits: fc.constantFrom('base.yaml', 'team.yaml', '../../x.yaml', '/etc/passwd'),
    },
    { requiredKeys: [] },
  )
  .map((p) => yamlStringify(p));

interface Case {
  entry: string;
  base: string | undefined;
}

const cases: fc.Arbitrary<Case> = fc.oneof(
  {
    weight: 6,
    arbitrary: fc
      .record({
        seed: fc.integer({ min: 0, max: SEEDS.length - 1 }),
        edits: fc.array(edit, { minLength: 1, maxLength: 3 }),
        baseEdits: fc.array(edit, { maxLength: 2 }),
      })
      .map(({ seed, edits, baseEdits }) => {
        const s = SEEDS[seed];
        const entry = edits.reduce(
          applyEdit,
          s.base !== undefined ? s.text.replace(/^inherits: .*$/m, 'inherits: base.yaml') : s.text,
        );
        return { entry, base: s.base !== undefined ? baseEdits.reduce(applyEdit, s.base) : undefined };
      }),
  },
  { weight: 3, arbitrary: fc.record({ entry: drawnPolicy, base: fc.option(drawnPolicy, { nil: undefined }) }) },
  {
    weight: 1,
    arbitrary: fc.record({
      entry: fc.array(piece, { maxLength: 40 }).map((p) => p.join('')),
      base: fc.constant(undefined),
    }),
  },
);

/** A ring of six sites, to plan the policy's challenges on. */
const RING = graphFromEdges(6, [
  [0, 1],
  [1, 2],
  [2, 3],
  [3, 4],
  [4, 5],
  [5, 0],
  [0, 3],
]);

/** What a loaded policy must allow without an exception other than PolicyError. */
function usePolicy(policy: Policy): void {
  for (const path of ['networks/core/a.net.yaml', 'legacy/x.xml', 'a.graphml', '../outside.gml']) {
    isDesignPath(policy, path);
    const fp = policyForFile(policy, path);
    for (const spec of evaluationSpecs(fp, fp.seed)) planEvaluation(RING, spec);
  }
}

describe('fuzzing the policy loader (seeded)', () => {
  it(`a Policy or a located PolicyError, for ${RUNS} mutated, drawn and random policies`, () => {
    const tally = new Tally();
    let planned = 0;
    fc.assert(
      fc.property(cases, ({ entry, base }) => {
        const asked: string[] = [];
        const texts: Record<string, string | undefined> = { [ENTRY]: entry, [BASE]: base };
        const read = (p: string): string | null => {
          asked.push(p);
          return texts[p] ?? null;
        };
        const o = attempt(() => loadPolicy(ENTRY, read));
        tally.add(o);
        expect(o.ms, 'load time (hang guard)').toBeLessThan(HANG_MS);
        if (!o.ok) {
          expect(o.error.kind).toBe('policy');
          const text = texts[o.error.file] ?? '';
          // "does not exist" concerns a file that has no text: it must point at the inherits line instead.
          expect(locationProblems(o.error, text || entry, asked), o.error.format()).toEqual([]);
          return;
        }
        const used = attempt(() => usePolicy(o.value));
        if (used.ok) planned++;
        else expect(used.error.kind, used.error.format()).toBe('policy');
      }),
      { seed: SEED, numRuns: RUNS },
    );
    reportCount('fuzz', 'policy', tally.cases, `${tally.summary()}; ${planned} planned on a ring`);
    expect(tally.cases).toBe(RUNS);
    expect(tally.parsed).toBeGreaterThan(0);
    expect(tally.refused).toBeGreaterThan(0);
  });
});
