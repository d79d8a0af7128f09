import { describe, expect, it } from 'vitest';
import { PolicyError } from '../../src/errors.js';
import { loadPolicy } from '../../src/policy/resolve.js';
import { BROKEN } from './broken-cases.js';

function errorOf(policy: string, files: Record<string, string> = {}): PolicyError {
  const all: Record<string, string> = { 'policy.yaml': policy, ...files };
  try {
    loadPolicy('policy.yaml', (p) => all[p] ?? null);
  } catch (error) {
    if (error instanceof PolicyError) return error;
    throw error;
  }
  throw new Error('the policy was accepted');
}

describe('broken policies are reported at their line', () => {
  it('covers at least 20 kinds', () => {
    expect(BROKEN.length).toBeGreaterThanOrEqual(20);
    expect(new Set(BROKEN.map((c) => c.name)).size).toBe(BROKEN.length);
  });

  for (const c of BROKEN) {
    it(c.name, () => {
      const e = errorOf(c.policy, c.files);
      expect(e.kind).toBe('policy');
      expect(e.message).toContain(c.message);
      expect({ file: e.file, line: e.line, column: e.column }).toEqual({
        file: c.file ?? 'policy.yaml',
        line: c.line,
        column: c.column,
      });
      if (c.hint) expect(e.hint).toContain(c.hint);
      if (c.related) expect(e.related.map((r) => ({ file: r.file, line: r.line }))).toEqual(c.related);
      // The one format every shell prints.
      expect(
        e
          .format()
          .split('\n')[0]
          .startsWith(`${c.file ?? 'policy.yaml'}:${c.line}:${c.column}: `),
      ).toBe(true);
    });
  }
});

describe('keys renamed before the first release are refused, naming the new key', () => {
  // [old key, policy using it, new key, line, column of the old key]
  const RENAMED: [string, string, string, number, number][] = [
    ['extends', 'extends: org.yaml\n', 'inherits', 1, 1],
    ['ignore', 'ignore: ["archive/**"]\n', 'exclude', 1, 1],
    ['files', 'designs:\n  - files: "**/*.gml"\n', 'paths', 2, 5],
    ['overrides', 'overrides:\n  - paths: "core/**"\n', 'scopes', 1, 1],
    ['files', 'scopes:\n  - files: "core/**"\n', 'paths', 2, 5],
    ['regression', 'regression:\n  allowed-drop: 0.02\n', 'weakening', 1, 1],
    ['regression', 'scopes:\n  - paths: "core/**"\n    regression:\n      allowed-drop: 0.01\n', 'weakening', 3, 5],
    ['noise-factor', 'weakening:\n  noise-factor: 2\n', 'error-multiple', 2, 3],
  ];
  for (const [old, policy, now, line, column] of RENAMED) {
    it(`${JSON.stringify(policy.split('\n').slice(0, line).join(' / '))}: "${old}" → "${now}"`, () => {
      const e = errorOf(policy, { 'org.yaml': 'seed: 1\n' });
      expect(e.message).toMatch(new RegExp(`^unknown key "${old}" in `));
      expect(e.hint).toBe(`did you mean "${now}"?`);
      expect([e.line, e.column]).toEqual([line, column]);
      // The renamed key is the whole story: no "missing" error for its new name.
      expect(e.related).toEqual([]);
    });
  }
});
