// The published policy schema, key by key: every key it defines is used by the full example
// (fixtures/policy/full.yaml, shown in the README), and every key given a value of the wrong
// type is rejected at the line of that key.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Document, isMap, isScalar, parseDocument } from 'yaml';
import { describe, expect, it } from 'vitest';
import { PolicyError } from '../../src/errors.js';
import { metrics } from '../../src/metrics/registry.js';
import { loadPolicy } from '../../src/policy/resolve.js';
import { YamlSource, type Segment } from '../../src/policy/yaml-source.js';
import schema from '../../src/policy/policy.schema.json' with { type: 'json' };

const repoRoot = path.resolve(import.meta.dirname, '..', '..');
const fixtures = path.join(repoRoot, 'fixtures', 'policy');
const read = (p: string) => {
  try {
    return readFileSync(path.join(fixtures, p), 'utf8');
  } catch {
    return null;
  }
};

type S = Record<string, unknown>;
const defs = (schema as S).definitions as Record<string, S>;
const deref = (s: S): S => (typeof s.$ref === 'string' ? deref(defs[(s.$ref as string).split('/').pop()!]) : s);

/** Every key path the schema defines; map keys of free names are "*", list items vanish. */
function schemaKeys(node: S, prefix: string, out: Set<string>): Set<string> {
  const s = deref(node);
  for (const branch of [...((s.oneOf as S[]) ?? []), ...((s.anyOf as S[]) ?? [])]) schemaKeys(branch, prefix, out);
  if (s.items && typeof s.items === 'object') schemaKeys(s.items as S, prefix, out);
  for (const [k, v] of Object.entries((s.properties as Record<string, S>) ?? {})) {
    // Metric ids are the values of a choice, not keys of the format: one "*" stands for them.
    const key = prefix === 'r-value.metrics' ? '*' : k;
    out.add(prefix ? `${prefix}.${key}` : key);
    schemaKeys(v, prefix ? `${prefix}.${key}` : key, out);
  }
  if (s.additionalProperties && typeof s.additionalProperties === 'object') {
    out.add(`${prefix}.*`);
    schemaKeys(s.additionalProperties as S, `${prefix}.*`, out);
  }
  return out;
}

/** Key paths used in a YAML value, in the same notation, with the path of each for mutation. */
function usedKeys(value: unknown, prefix: string, at: Segment[], out: Map<string, Segment[][]>): void {
  if (Array.isArray(value)) {
    value.forEach((v, i) => usedKeys(v, prefix, [...at, i], out));
  } else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      const free = prefix === 'challenges' || prefix === 'r-value.metrics';
      const key = prefix ? `${prefix}.${free ? '*' : k}` : k;
      out.set(key, [...(out.get(key) ?? []), [...at, k]]);
      usedKeys(v, key, [...at, k], out);
    }
  }
}

const fullText = read('full.yaml')!;
const used = new Map<string, Segment[][]>();
usedKeys(parseDocument(fullText).toJS(), '', [], used);

describe('policy schema', () => {
  it('the full example uses every key the schema defines, and nothing else', () => {
    // Scopes reuse the definitions of the top level: count their keys once.
    const canon = (k: string) => k.replace(/^scopes\.(requirements|weakening|budget)\./, '$1.');
    const defined = [...new Set([...schemaKeys(schema as S, '', new Set())].map(canon))].sort();
    expect([...new Set([...used.keys()].map(canon))].sort()).toEqual(defined);
  });

  it('the full example loads, inherits its base and tightens it', () => {
    const p = loadPolicy('full.yaml', read);
    expect(p.files).toEqual(['full.yaml', 'base.yaml']);
    const q = p.requirements.find((r) => r.id === 'r-threshold:node-failures@0.1:q0.05');
    expect(q && 'min' in q ? q.min : undefined).toBe(0.5);
    expect(p.weakening.allowedDrop).toBe(0.02);
    expect(p.challenges.map((c) => c.engine)).toEqual(['random-nodes', 'random-links', 'degree-adaptive']);
  });

  it('every metric of the registry can be named in r-value', () => {
    const names = Object.keys(((((schema as S).properties as S)['r-value'] as S).properties as S).metrics as S);
    const listed = Object.keys(
      (((((schema as S).properties as S)['r-value'] as S).properties as S).metrics as S).properties as S,
    );
    expect(names.length).toBeGreaterThan(0);
    for (const m of metrics) expect(listed).toContain(m.id);
  });

  // A value of the wrong shape for each key: a list where a mapping or scalar belongs, a mapping elsewhere.
  for (const [key, paths] of used) {
    it(`rejects a wrong value for ${key} at its line`, () => {
      const at = paths[0];
      const doc = parseDocument(fullText) as Document;
      const current = doc.getIn(at, true);
      const wrong = isMap(current) ? [1] : isScalar(current) && typeof current.value === 'object' ? [1] : { x: [1] };
      doc.setIn(at, doc.createNode(wrong, { flow: true }));
      const text = doc.toString();
      const files: Record<string, string | null> = { 'full.yaml': text, 'base.yaml': read('base.yaml') };
      let error: unknown;
      try {
        loadPolicy('full.yaml', (p) => files[p] ?? null);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(PolicyError);
      const e = error as PolicyError;
      expect(e.file).toBe('full.yaml');
      expect(e.line).toBe(new YamlSource(text, 'full.yaml').where(at).line);
    });
  }
});
