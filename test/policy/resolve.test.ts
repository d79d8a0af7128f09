import { describe, expect, it } from 'vitest';
import { PolicyError } from '../../src/errors.js';
import { BUILTIN_POLICY_NAME, STARTER_POLICY } from '../../src/policy/defaults.js';
import { parsePolicyFile } from '../../src/policy/load.js';
import {
  builtinPolicy,
  designNeedsHeader,
  isDesignPath,
  isDesignText,
  loadPolicy,
  policyForFile,
} from '../../src/policy/resolve.js';
import type { Requirement } from '../../src/policy/types.js';

const repo = (files: Record<string, string>) => (p: string) => files[p] ?? null;
const floor = (reqs: Requirement[], id: string) => {
  const r = reqs.find((x) => x.id === id);
  return r && 'min' in r ? r.min : undefined;
};

describe('built-in policy', () => {
  it('is the starter file, read by the same loader', () => {
    const p = builtinPolicy();
    expect(p.source).toBe('builtin');
    expect(p.requirements.map((r) => r.id)).toEqual([
      'no-new-spof',
      'area-floor:node-failures',
      'area-floor:link-failures',
      'area-floor:degree-attack',
    ]);
    expect(p.requirements[0].where.file).toBe(BUILTIN_POLICY_NAME);
    expect(p.weakening).toMatchObject({ allowedDrop: 0.02, errorMultiple: 2, severity: 'fail' });
    expect(p.removedDesigns.severity).toBe('notice');
    expect(parsePolicyFile(STARTER_POLICY, 'x').challenges?.map((c) => c.engine)).toEqual([
      'random-nodes',
      'random-links',
      'degree-adaptive',
    ]);
  });

  it('treats GraphML, GML and our own extensions as designs', () => {
    const p = builtinPolicy();
    for (const f of ['a.graphml', 'x/y/b.gml', 'c.net.yaml', 'd/e.net.yml', 'f.net.json', '.hidden/g.gml']) {
      expect(isDesignPath(p, f)).toBe(true);
    }
    for (const f of ['a.yaml', 'policy.json', 'README.md', 'a.graphml.bak', 'net.yaml'])
      expect(isDesignPath(p, f)).toBe(false);
  });

  it('a CSV that only the built-in glob selects is a design when its header has source and target', () => {
    const p = builtinPolicy();
    expect(isDesignPath(p, 'links/metro.csv')).toBe(true);
    expect(designNeedsHeader(p, 'links/metro.csv')).toBe(true);
    expect(designNeedsHeader(p, 'a.gml')).toBe(false);
    expect(isDesignText(p, 'links/metro.csv', 'Source, Target ,length\na,b,1\n')).toBe(true);
    expect(isDesignText(p, 'budget.csv', 'item,quantity\nducts,4\n')).toBe(false);
    expect(isDesignText(p, 'budget.csv', null)).toBe(false);
    // Listed by a glob of its own (or with a format forced), a CSV is judged whatever its header says.
    const listed = loadPolicy(
      'p.yaml',
      repo({ 'p.yaml': 'designs:\n  - paths: ["**/*.csv", "links/*.csv"]\n  - paths: "raw/**"\n    format: csv\n' }),
    );
    expect([
      designNeedsHeader(listed, 'links/a.csv'),
      designNeedsHeader(listed, 'other/a.csv'),
      designNeedsHeader(listed, 'raw/a.csv'),
    ]).toEqual([false, true, false]);
    expect(isDesignText(listed, 'links/a.csv', 'item,quantity\n')).toBe(true);
  });

  it('fills what a policy file leaves out', () => {
    const p = loadPolicy('p.yaml', repo({ 'p.yaml': 'seed: 9\n' }));
    expect(p.source).toBe('file');
    expect(p.seed).toBe(9);
    expect(p.requirements.map((r) => r.id)).toEqual(builtinPolicy().requirements.map((r) => r.id));
    expect(p.rValue).toEqual(builtinPolicy().rValue);
  });

  it('keeps only the built-in requirements whose challenge a policy with its own challenges defines', () => {
    const p = loadPolicy('p.yaml', repo({ 'p.yaml': 'challenges:\n  hubs:\n    remove: nodes\n    order: degree\n' }));
    expect(p.requirements.map((r) => r.id)).toEqual(['no-new-spof']);
    expect(p.challenges.map((c) => c.engine)).toEqual(['degree']);
  });

  it('bridges and cut nodes can be ruled separately, each with its own id and severity', () => {
    const text = [
      'requirements:',
      '  - kind: no-new-spof',
      '    elements: [bridges]',
      '    severity: fail',
      '  - kind: no-new-spof',
      '    elements: [cut-nodes]',
      '    severity: warn',
      '',
    ].join('\n');
    const p = loadPolicy('p.yaml', repo({ 'p.yaml': text }));
    expect(p.requirements.map((r) => [r.id, r.severity])).toEqual([
      ['no-new-spof:bridges', 'fail'],
      ['no-new-spof:cut-nodes', 'warn'],
    ]);
  });

  it('an explicit empty list means no requirements', () => {
    expect(loadPolicy('p.yaml', repo({ 'p.yaml': 'requirements: []\n' })).requirements).toEqual([]);
  });
});

describe('inherits and scopes', () => {
  const org = [
    'challenges:',
    '  fail:',
    '    remove: nodes',
    '    until: 0.4',
    'requirements:',
    '  - kind: r-threshold',
    '    challenge: fail',
    '    at: 0.2',
    '    statistic: quantile',
    '    q: 0.1',
    '    min: 0.5',
    'scopes:',
    '  - paths: "core/**"',
    '    requirements:',
    '      - kind: n-1',
    '        min: 0.6',
    '',
  ].join('\n');

  it('a tightened floor replaces the base one', () => {
    const team =
      'inherits: ../org.yaml\nrequirements:\n  - kind: r-threshold\n    challenge: fail\n    at: 0.2\n    statistic: quantile\n    q: 0.1\n    min: 0.55\n';
    const p = loadPolicy('team/p.yaml', repo({ 'org.yaml': org, 'team/p.yaml': team }));
    expect(p.files).toEqual(['team/p.yaml', 'org.yaml']);
    expect(floor(p.requirements, 'r-threshold:fail@0.2:q0.1')).toBe(0.55);
    expect(p.requirements.find((r) => r.id === 'r-threshold:fail@0.2:q0.1')!.valueWhere).toEqual({
      file: 'team/p.yaml',
      line: 8,
      column: 10,
    });
  });

  it('a requirement written as the median of a targeted attack is its value', () => {
    const p = loadPolicy(
      'p.yaml',
      repo({
        'p.yaml':
          'challenges:\n  hubs:\n    remove: nodes\n    order: degree\nrequirements:\n  - kind: r-threshold\n    challenge: hubs\n    at: 0.1\n    min: 0.3\n',
      }),
    );
    expect(p.requirements.map((r) => r.id)).toEqual(['r-threshold:hubs@0.1:value']);
  });

  it('scopes apply only to the files they match, and may tighten', () => {
    const team =
      'inherits: org.yaml\nscopes:\n  - paths: "core/metro/**"\n    requirements:\n      - kind: n-1\n        min: 0.7\n';
    const p = loadPolicy('p.yaml', repo({ 'org.yaml': org, 'p.yaml': team }));
    expect(floor(policyForFile(p, 'edge/a.graphml').requirements, 'n-1:link')).toBeUndefined();
    expect(floor(policyForFile(p, 'core/a.graphml').requirements, 'n-1:link')).toBe(0.6);
    expect(floor(policyForFile(p, 'core/metro/a.graphml').requirements, 'n-1:link')).toBe(0.7);
  });

  it('a scope that loosens a base scope on the same file is an error naming both lines', () => {
    const team =
      'inherits: org.yaml\nscopes:\n  - paths: "core/metro/**"\n    requirements:\n      - kind: n-1\n        min: 0.4\n';
    const p = loadPolicy('p.yaml', repo({ 'org.yaml': org, 'p.yaml': team }));
    expect(() => policyForFile(p, 'edge/a.graphml')).not.toThrow();
    let error: PolicyError | undefined;
    try {
      policyForFile(p, 'core/metro/a.graphml');
    } catch (e) {
      error = e as PolicyError;
    }
    expect(error).toBeInstanceOf(PolicyError);
    expect(error!.message).toContain('loosens n-1:link: min 0.4 where min 0.6 is required');
    expect([error!.file, error!.line]).toEqual(['p.yaml', 6]);
    expect(error!.related.map((r) => [r.file, r.line])).toEqual([['org.yaml', 16]]);
  });

  it('a looser floor of a more basic file is outvoted, not an error', () => {
    // The team raises the n-1 floor for everything; the org scope for core/** (0.6) is then looser.
    const team = 'inherits: org.yaml\nrequirements:\n  - kind: n-1\n    min: 0.8\n';
    const p = loadPolicy('p.yaml', repo({ 'org.yaml': org, 'p.yaml': team }));
    expect(floor(policyForFile(p, 'core/a.graphml').requirements, 'n-1:link')).toBe(0.8);
  });

  it('a format hint applies to the files of its glob', () => {
    const p = loadPolicy(
      'p.yaml',
      repo({
        'p.yaml': 'designs:\n  - paths: "**/*.graphml"\n  - paths: "legacy/*.xml"\n    format: graphml\n',
      }),
    );
    expect(isDesignPath(p, 'legacy/a.xml')).toBe(true);
    expect(policyForFile(p, 'legacy/a.xml').format).toBe('graphml');
    expect(policyForFile(p, 'x.graphml').format).toBeUndefined();
    expect(isDesignPath(p, 'x.gml')).toBe(false);
  });

  it('exclude wins over designs', () => {
    const p = loadPolicy('p.yaml', repo({ 'p.yaml': 'exclude: "archive/**"\n' }));
    expect(isDesignPath(p, 'archive/old.graphml')).toBe(false);
    expect(isDesignPath(p, 'live/new.graphml')).toBe(true);
  });

  it('challenge parameters left out take the documented defaults', () => {
    const p = loadPolicy(
      'p.yaml',
      repo({
        'p.yaml':
          'challenges:\n  fail:\n    remove: links\n  hubs:\n    remove: nodes\n    order: betweenness\n    adaptive: true\n',
      }),
    );
    expect(p.challenges[0].params).toEqual({
      challenge: 'random-links',
      until: 0.5,
      points: 11,
      realizations: 200,
      band: [0.1, 0.9],
      worstCase: 0,
    });
    expect(p.challenges[1].params).toEqual({ challenge: 'betweenness-adaptive', until: 0.5 });
  });
});
