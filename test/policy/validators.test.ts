// The schema validators the bundles ship (ajv's standalone code, made by .ci/validators.mjs at
// build time) against the ones the sources compile at run time: the same options, and on every
// policy and design fixture, the broken policies and many variants of them with a value of the
// wrong type or a key the schema does not know, the same verdict and the same errors.
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { ValidateFunction } from 'ajv';
import { build } from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { precompiledValidators, VALIDATORS } from '../../.ci/validators.mjs';
import { POLICY_AJV_OPTIONS, policyValidator } from '../../src/policy/policy-validator.js';
import { DESIGN_AJV_OPTIONS, designValidator } from '../../src/topology/design-validator.js';
import { BROKEN } from './broken-cases.js';

const repoRoot = path.resolve(import.meta.dirname, '..', '..');

/** Files under `dir` whose names end with `suffix`. */
function filesUnder(dir: string, suffix: string): string[] {
  return readdirSync(dir, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith(suffix))
    .map((f) => path.join(dir, f));
}

function parsed(text: string): unknown {
  try {
    return parse(text);
  } catch {
    return undefined;
  }
}

/** The document, then variants: each value (to depth 3) of the wrong type, and an unknown key beside it. */
function variants(doc: unknown): unknown[] {
  const out: unknown[] = [doc];
  const walk = (node: unknown, edit: (f: (x: unknown) => unknown) => unknown, depth: number) => {
    if (depth > 3 || node === null || typeof node !== 'object') return;
    const entries: [string | number, unknown][] = Array.isArray(node)
      ? node.slice(0, 2).map((v, i) => [i, v])
      : Object.entries(node);
    out.push(edit((x) => (Array.isArray(x) ? [...x, 'odd'] : { ...(x as object), 'no-such-key': 1 })));
    for (const [k, v] of entries) {
      const set = (f: (x: unknown) => unknown) =>
        edit((x) => {
          const copy = Array.isArray(x) ? [...x] : { ...(x as Record<string, unknown>) };
          (copy as Record<string | number, unknown>)[k] = f((x as Record<string | number, unknown>)[k]);
          return copy;
        });
      out.push(set((x) => (typeof x === 'object' && x !== null ? 'text' : { wrong: [true] })));
      out.push(set((x) => (typeof x === 'number' ? -1e9 : typeof x === 'string' ? '' : 0)));
      walk(v, set, depth + 1);
    }
  };
  walk(doc, (f) => f(doc), 0);
  return out;
}

/** Verdict and errors of a validator on a document (errors as plain data). */
function answer(v: ValidateFunction, doc: unknown): unknown {
  const ok = v(structuredClone(doc));
  return { ok, errors: JSON.parse(JSON.stringify(v.errors ?? null)) };
}

let dir: string;
let shipped: { policyValidator(): ValidateFunction; designValidator(): ValidateFunction };

beforeAll(async () => {
  dir = mkdtempSync(path.join(tmpdir(), 'nb-validators-'));
  const entry = path.join(dir, 'entry.ts');
  writeFileSync(
    entry,
    [
      `export { policyValidator } from ${JSON.stringify(path.join(repoRoot, 'src/policy/policy-validator.ts'))};`,
      `export { designValidator } from ${JSON.stringify(path.join(repoRoot, 'src/topology/design-validator.ts'))};`,
    ].join('\n'),
  );
  const outfile = path.join(dir, 'validators.mjs');
  await build({
    entryPoints: [entry],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    logLevel: 'warning',
    plugins: [precompiledValidators()],
  });
  const text = readFileSync(outfile, 'utf8');
  // The bundle holds standalone code, not ajv's compiler.
  expect(text).not.toContain('compileSchema');
  shipped = await import(pathToFileURL(outfile).href);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('precompiled schema validators', () => {
  it('compile with the options the modules use', () => {
    expect(VALIDATORS['policy/policy-validator.ts'].options).toEqual(POLICY_AJV_OPTIONS);
    expect(VALIDATORS['topology/design-validator.ts'].options).toEqual(DESIGN_AJV_OPTIONS);
  });

  it('answer every policy as ajv compiling at run time does', () => {
    const docs = [
      ...filesUnder(path.join(repoRoot, 'fixtures'), '.netbrace.yaml').map((f) => readFileSync(f, 'utf8')),
      ...filesUnder(path.join(repoRoot, 'fixtures', 'policy'), '.yaml').map((f) => readFileSync(f, 'utf8')),
      ...BROKEN.map((c) => c.policy),
    ]
      .map(parsed)
      .filter((d) => d !== undefined);
    expect(docs.length).toBeGreaterThan(40);
    const all = docs.flatMap(variants);
    let rejected = 0;
    for (const doc of all) {
      const want = answer(policyValidator(), doc);
      expect(answer(shipped.policyValidator(), doc)).toEqual(want);
      if (!(want as { ok: boolean }).ok) rejected++;
    }
    expect(rejected).toBeGreaterThan(all.length / 2);
  });

  it('answer every design as ajv compiling at run time does', () => {
    const docs = filesUnder(path.join(repoRoot, 'fixtures'), '.net.yaml')
      .map((f) => parsed(readFileSync(f, 'utf8')))
      .filter((d) => d !== undefined);
    expect(docs.length).toBeGreaterThan(40);
    const all = docs.flatMap(variants);
    let rejected = 0;
    for (const doc of all) {
      const want = answer(designValidator(), doc);
      expect(answer(shipped.designValidator(), doc)).toEqual(want);
      if (!(want as { ok: boolean }).ok) rejected++;
    }
    expect(rejected).toBeGreaterThan(all.length / 2);
  });
});
