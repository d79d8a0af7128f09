// The policy's work budget: seconds become element visits at the one documented rate (never
// the clock), the built-in default, scopes and inheriting policies that raise it, and the
// regional radius that the policy fixes so that base and head share one grid.
import { describe, expect, it } from 'vitest';
import { PolicyError } from '../../src/errors.js';
import { budgetWork, DEFAULT_BUDGET_SECONDS, ENGINE_VISITS_PER_SECOND } from '../../src/policy/budget.js';
import { REGIONAL_UNTIL_KM } from '../../src/policy/defaults.js';
import { builtinPolicy, loadPolicy, policyForFile } from '../../src/policy/resolve.js';
import { evaluationSpecs } from '../../src/gate-request.js';

const repo = (files: Record<string, string>) => (p: string) => files[p] ?? null;
const budgetOf = (files: Record<string, string>, path = 'a.graphml') =>
  policyForFile(loadPolicy('p.yaml', repo(files)), path).budget;

describe('seconds become work at one fixed rate', () => {
  it('the rate is the documented 5e7 element visits per second', () => {
    expect(ENGINE_VISITS_PER_SECOND).toBe(5e7);
    expect(budgetWork({ seconds: 2 })).toBe(1e8);
    expect(budgetWork({ seconds: 0.5 })).toBe(25_000_000);
  });

  it('with both keys the smaller limit applies', () => {
    expect(budgetWork({ visits: 4e7, seconds: 2 })).toBe(4e7);
    expect(budgetWork({ visits: 4e9, seconds: 2 })).toBe(1e8);
  });

  it('a fraction of a visit rounds down, but a budget never reaches 0', () => {
    expect(budgetWork({ visits: 10.9 })).toBe(10);
    expect(budgetWork({ seconds: 1e-12 })).toBe(1);
  });

  it('the same policy gives the same work every time (a function of the text, not of the machine)', () => {
    const files = { 'p.yaml': 'budget:\n  seconds: 7.5\n' };
    const first = budgetOf(files);
    for (let i = 0; i < 5; i++) expect(budgetOf(files)).toEqual(first);
    expect(first).toEqual({ seconds: 7.5, maxWork: 375_000_000 });
  });
});

describe('the default budget and the engine request', () => {
  it(`the built-in policy allows ${DEFAULT_BUDGET_SECONDS} s, i.e. 3e9 element visits, and every engine request carries it`, () => {
    const fp = policyForFile(builtinPolicy(), 'x.graphml');
    expect(fp.budget).toEqual({ seconds: 60, maxWork: 3e9 });
    const n1 = {
      ...fp,
      requirements: [
        ...fp.requirements,
        ...loadPolicy(
          'p.yaml',
          repo({
            'p.yaml': 'requirements:\n  - kind: n-1\n    element: node\n    min: 0.1\n  - kind: n-1\n    min: 0.1\n',
          }),
        ).requirements,
      ],
    };
    const specs = evaluationSpecs(n1, 1);
    expect(specs.length).toBe(2);
    for (const spec of specs) expect(spec.budget).toEqual({ maxWork: 3e9 });
  });

  it('a policy that leaves the budget out has the built-in one; one that writes it has its own, whole', () => {
    expect(budgetOf({ 'p.yaml': 'seed: 2\n' })).toEqual({ seconds: 60, maxWork: 3e9 });
    // Written at the root, the block replaces the built-in one: work alone, no seconds limit.
    expect(budgetOf({ 'p.yaml': 'budget:\n  visits: 2e10\n' })).toEqual({ visits: 2e10, maxWork: 2e10 });
    expect(budgetOf({ 'p.yaml': 'budget:\n  visits: 1000\n' })).toEqual({ visits: 1000, maxWork: 1000 });
  });
});

describe('scopes and inheriting policies may raise the budget, never lower it', () => {
  const org = 'budget:\n  seconds: 10\nscopes:\n  - paths: "core/**"\n    budget:\n      seconds: 40\n';

  it('a scope raises it for the files it matches only', () => {
    const files = { 'p.yaml': org };
    expect(budgetOf(files, 'edge/a.graphml')).toEqual({ seconds: 10, maxWork: 5e8 });
    expect(budgetOf(files, 'core/a.graphml')).toEqual({ seconds: 40, maxWork: 2e9 });
  });

  it('an inheriting policy raises it, and keys it leaves out keep the value in force', () => {
    const files = { 'org.yaml': org, 'p.yaml': 'inherits: org.yaml\nbudget:\n  visits: 9e8\n  seconds: 30\n' };
    expect(budgetOf(files, 'edge/a.graphml')).toEqual({ visits: 9e8, seconds: 30, maxWork: 9e8 });
    // The org scope (40 s) raises it further for core/**; visits 9e8 stays in force and binds.
    expect(budgetOf(files, 'core/a.graphml')).toEqual({ visits: 9e8, seconds: 40, maxWork: 9e8 });
  });

  it('a more basic file\u2019s smaller scope is outvoted by a larger budget of the inheriting file', () => {
    const files = { 'org.yaml': org, 'p.yaml': 'inherits: org.yaml\nbudget:\n  seconds: 100\n' };
    expect(budgetOf(files, 'core/a.graphml')).toEqual({ seconds: 100, maxWork: 5e9 });
  });

  it('lowering it for some files is a policy error naming both lines, whether or not a file matches', () => {
    const files = {
      'p.yaml': 'budget:\n  seconds: 60\nscopes:\n  - paths: "lab/**"\n    budget:\n      seconds: 10\n',
    };
    let error: unknown;
    try {
      loadPolicy('p.yaml', repo(files));
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(PolicyError);
    const e = error as PolicyError;
    expect(e.message).toBe(
      'scope 1 lowers the budget to 5e8 element visits (seconds 10) where 3e9 (seconds 60) is in force',
    );
    expect([e.line, e.column]).toEqual([6, 16]);
    expect(e.related.map((r) => [r.file, r.line, r.column])).toEqual([['p.yaml', 2, 12]]);
  });
});

describe('regional challenges share one grid', () => {
  it(`a region without "until" runs to the fixed ${REGIONAL_UNTIL_KM} km, whatever the design`, () => {
    const p = loadPolicy('p.yaml', repo({ 'p.yaml': 'challenges:\n  quakes:\n    remove: region\n    points: 6\n' }));
    expect(p.challenges[0].params.until).toBe(50);
    expect(REGIONAL_UNTIL_KM).toBe(50);
  });

  it('an explicit "until" is kept, and a threshold beyond the default radius is refused', () => {
    const p = loadPolicy('p.yaml', repo({ 'p.yaml': 'challenges:\n  quakes:\n    remove: region\n    until: 120\n' }));
    expect(p.challenges[0].params.until).toBe(120);
    const beyond =
      'challenges:\n  quakes:\n    remove: region\nrequirements:\n  - kind: r-threshold\n    challenge: quakes\n    at: 80\n    min: 0.5\n';
    expect(() => loadPolicy('p.yaml', repo({ 'p.yaml': beyond }))).toThrow(
      /judges R at 80, beyond the end of challenge "quakes" \(until 50\)/,
    );
  });
});
