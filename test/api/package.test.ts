// The published entry: `import … from 'netbrace'` resolves (package.json exports) to the
// committed bundle and its generated type declarations, in a separate Node process.
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(import.meta.dirname, '..', '..');

describe("import from 'netbrace'", () => {
  it('exports readDesign, toGraph, fromGraph, evaluate and check, and gates a ring that lost a span', () => {
    const script = `
      import { readFileSync } from 'node:fs';
      import { readDesign, toGraph, fromGraph, check } from 'netbrace';
      const t = readDesign(readFileSync('fixtures/designs/ring.net.yaml', 'utf8'), 'ring.net.yaml');
      const g = toGraph(t);
      const chain = g.copy();
      chain.dropEdge(chain.edges()[0]);
      const r = await check({ base: { 'ring.net.json': fromGraph(g) }, head: { 'ring.net.json': fromGraph(chain) } });
      console.log(JSON.stringify({ order: g.order, verdict: r.report.verdict, rules: r.report.files[0].findings.map((f) => f.rule) }));
    `;
    const out = execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: root, encoding: 'utf8' });
    const r = JSON.parse(out.trim().split('\n').at(-1)!) as { order: number; verdict: string; rules: string[] };
    expect(r.order).toBeGreaterThan(2);
    expect(r.verdict).toBe('fail');
    expect(r.rules).toContain('new-bridge');
  });

  it('ships type declarations for every exported name', () => {
    const pkg = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8')) as {
      exports: Record<string, { types: string; import: string }>;
    };
    const types = path.join(root, pkg.exports['.'].types);
    expect(existsSync(types)).toBe(true);
    const text = readFileSync(types, 'utf8');
    for (const name of ['readDesign', 'toGraph', 'fromGraph', 'evaluate', 'check'])
      expect(text).toMatch(new RegExp(`\\b${name}\\b`));
  });
});
