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
      expect({ file: e.file, line: e.line, column: e.column }).toEqual({ file: c.file ?? 'policy.yaml', line: c.line, column: c.column });
      if (c.hint) expect(e.hint).toContain(c.hint);
      if (c.related) expect(e.related.map((r) => ({ file: r.file, line: r.line }))).toEqual(c.related);
      // The one format every shell prints.
      expect(e.format().split('\n')[0].startsWith(`${c.file ?? 'policy.yaml'}:${c.line}:${c.column}: `)).toBe(true);
    });
  }
});
