// The layers of src/ point one way. LAYERS below is the order, written once (DEVELOPERS.md
// draws the same): a file may import files of its own layer or of layers above it in the
// list, never of a layer below it. Every source file must belong to exactly one layer, so a new
// folder has to be placed here before it can be used. Imports are read from the text (static,
// `import type`, re-exports and dynamic `import()`), and the files must not import each other
// in a circle (type-only imports count too), with one pair of mutually recursive report types
// as the only exception.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from './topology/helpers.js';

/** Lowest first. Entries are files or folders under src/ (a folder takes everything below it). */
export const LAYERS: readonly { name: string; paths: readonly string[] }[] = [
  { name: 'base', paths: ['errors.ts', 'decode.ts', 'version.ts', 'random.ts'] },
  { name: 'topology', paths: ['topology/'] },
  { name: 'graph', paths: ['graph/'] },
  { name: 'metrics', paths: ['metrics/'] },
  { name: 'challenges', paths: ['challenges/'] },
  { name: 'envelope', paths: ['envelope/'] },
  { name: 'parallel', paths: ['parallel/'] },
  // The report's data and its words: what every view reads and the gate, map and mend steps
  // write, and how a status, a rule, a number or a consequence is said (no markup). The map and
  // mend parts of a file report are declared beside the code that computes them.
  {
    name: 'report contract',
    paths: [
      'report/report.ts',
      'report/labels.ts',
      'report/vocabulary.ts',
      'report/format.ts',
      'report/story.ts',
      'report/rank.ts',
      'map/types.ts',
      'mend/types.ts',
    ],
  },
  { name: 'policy', paths: ['policy/'] },
  { name: 'map', paths: ['map/'] },
  { name: 'mend', paths: ['mend/'] },
  { name: 'gate', paths: ['gate/'] },
  { name: 'run', paths: ['gate-request.ts', 'map-mend-step.ts', 'run-gate.ts'] },
  { name: 'report views', paths: ['report/'] },
  { name: 'api', paths: ['api/'] },
  { name: 'shell', paths: ['shell/'] },
];

/**
 * Type-only imports allowed to form a circle: FileReport holds a MendReport, whose suggestions
 * hold the findings and statuses of FileReport. Types only, erased at run time.
 */
const TYPE_CYCLES_ALLOWED: readonly (readonly [string, string])[] = [['src/report/report.ts', 'src/mend/types.ts']];

export interface Import {
  from: string;
  to: string;
  typeOnly: boolean;
  line: number;
}

function stripComments(source: string): string {
  return source.replace(/\/\*[\s\S]*?\*\//g, (c) => c.replace(/[^\n]/g, ' ')).replace(/(^|[^:'"`\\])\/\/.*$/gm, '$1');
}

/** The relative imports of one file (repository paths, `.js` read as `.ts`). */
export function importsOf(source: string, file: string): Import[] {
  const text = stripComments(source);
  const found: Import[] = [];
  const add = (spec: string, typeOnly: boolean, index: number) => {
    if (!spec.startsWith('.')) return;
    const to = path.posix.normalize(path.posix.join(path.posix.dirname(file), spec)).replace(/\.js$/, '.ts');
    found.push({ from: file, to, typeOnly, line: text.slice(0, index).split('\n').length });
  };
  for (const m of text.matchAll(/\b(import|export)\s+(type\s+)?(?:[\w*{}\s,$]*?\s+from\s+)?['"]([^'"]+)['"]/g))
    add(m[3], Boolean(m[2]), m.index ?? 0);
  for (const m of text.matchAll(/\bimport\s*\(\s*['"]([^'"]+)['"]\s*\)/g)) add(m[1], false, m.index ?? 0);
  return found;
}

export function layerOf(file: string, layers = LAYERS): number {
  const rel = file.replace(/^src\//, '');
  // The most specific entry wins (a file named in a layer, before its folder's layer).
  let best = -1;
  let bestLength = -1;
  layers.forEach((l, i) => {
    for (const p of l.paths) {
      if ((p.endsWith('/') ? rel.startsWith(p) : rel === p) && p.length > bestLength) {
        best = i;
        bestLength = p.length;
      }
    }
  });
  return best;
}

/** Imports that point down the list: "a (layer) → b (layer)". */
export function upwardImports(imports: readonly Import[], layers = LAYERS): string[] {
  return imports
    .filter((i) => i.to.endsWith('.ts') && layerOf(i.to, layers) > layerOf(i.from, layers))
    .map(
      (i) =>
        `${i.from}:${i.line} (${layers[layerOf(i.from, layers)].name}) imports ${i.to} (${layers[layerOf(i.to, layers)].name})`,
    );
}

/** The circles among the files (strongly connected components of more than one file, or a self-import). */
export function cycles(imports: readonly Import[]): string[][] {
  const next = new Map<string, string[]>();
  for (const i of imports) next.set(i.from, [...(next.get(i.from) ?? []), i.to]);
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const out: string[][] = [];
  let counter = 0;
  const visit = (v: string) => {
    index.set(v, counter);
    low.set(v, counter++);
    stack.push(v);
    onStack.add(v);
    for (const w of next.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || (next.get(v) ?? []).includes(v)) out.push(component.sort());
    }
  };
  for (const v of next.keys()) if (!index.has(v)) visit(v);
  return out;
}

function sourceFiles(dir: string, root: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...sourceFiles(full, root));
    else if (entry.name.endsWith('.ts')) out.push(path.relative(root, full).split(path.sep).join('/'));
  }
  return out.sort();
}

const root = repoRoot;
const files = sourceFiles(path.join(root, 'src'), root);
const imports = files.flatMap((f) => importsOf(readFileSync(path.join(root, f), 'utf8'), f));

describe('layers', () => {
  it('every source file belongs to a layer', () => {
    expect(files.length).toBeGreaterThan(100);
    expect(files.filter((f) => layerOf(f) < 0)).toEqual([]);
  });

  it('no file imports a layer below it in the order', () => {
    expect(imports.length).toBeGreaterThan(500);
    expect(upwardImports(imports)).toEqual([]);
  });

  it('no import circle among the files', () => {
    const allowed = (i: Import) =>
      i.typeOnly && TYPE_CYCLES_ALLOWED.some(([a, b]) => (i.from === a && i.to === b) || (i.from === b && i.to === a));
    expect(cycles(imports.filter((i) => !allowed(i)))).toEqual([]);
    // The exception stays what it says: type-only imports, both ways.
    for (const [a, b] of TYPE_CYCLES_ALLOWED) {
      const between = imports.filter((i) => (i.from === a && i.to === b) || (i.from === b && i.to === a));
      expect(
        between.every((i) => i.typeOnly),
        JSON.stringify(between),
      ).toBe(true);
    }
  });

  it('the checks find what they look for', () => {
    const found = importsOf(
      "import { a } from './x.js';\nimport type {\n  B,\n} from '../gate/y.js';\nexport { c } from './z.js';\n// import { no } from './comment.js';\nconst m = await import('../shell/w.js');\nimport 'node:fs';\n",
      'src/graph/f.ts',
    );
    expect(found.map((i) => [i.to, i.typeOnly, i.line])).toEqual([
      ['src/graph/x.ts', false, 1],
      ['src/gate/y.ts', true, 2],
      ['src/graph/z.ts', false, 5],
      ['src/shell/w.ts', false, 7],
    ]);
    expect(upwardImports(found)).toEqual([
      'src/graph/f.ts:2 (graph) imports src/gate/y.ts (gate)',
      'src/graph/f.ts:7 (graph) imports src/shell/w.ts (shell)',
    ]);
    const circle: Import[] = [
      { from: 'a.ts', to: 'b.ts', typeOnly: false, line: 1 },
      { from: 'b.ts', to: 'c.ts', typeOnly: true, line: 1 },
      { from: 'c.ts', to: 'a.ts', typeOnly: false, line: 1 },
      { from: 'c.ts', to: 'd.ts', typeOnly: false, line: 1 },
    ];
    expect(cycles(circle)).toEqual([['a.ts', 'b.ts', 'c.ts']]);
    expect(layerOf('src/report/report.ts')).toBeLessThan(layerOf('src/gate/compare.ts'));
    expect(layerOf('src/report/markdown.ts')).toBeGreaterThan(layerOf('src/gate/compare.ts'));
  });
});
