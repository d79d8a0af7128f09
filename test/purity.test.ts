// The core is pure: everything outside src/shell/ is synchronous computation with no I/O.
// This test reads every source file outside src/shell/ and fails on any import of the file
// system, child processes, threads or the Actions toolkit, and on any use of `process`.
// One exception: src/parallel/ is the thread shell (the worker pool), so it may import
// node:worker_threads and node:os (to size the pool); it still may not touch files or process.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from './topology/helpers.js';

const FORBIDDEN_MODULES = [/^(node:)?fs(\/.*)?$/, /^(node:)?child_process$/, /^(node:)?worker_threads$/, /^@actions\//];
const PARALLEL_ALLOWED = [/^(node:)?worker_threads$/, /^(node:)?os$/];

/** Drops comments so that prose about "the process" does not count; strings are kept. */
function stripComments(source: string): string {
  return source.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:'"`\\])\/\/.*$/gm, '$1');
}

/** Every violation in one file's text, as "line: what". */
export function violations(source: string, relPath: string): string[] {
  const inParallel = relPath.startsWith('src/parallel/');
  const found: string[] = [];
  const lines = stripComments(source).split('\n');
  lines.forEach((line, i) => {
    const specifiers = [
      ...line.matchAll(/(?:\bfrom\s*|\bimport\s*\(\s*|\bimport\s+|\brequire\s*\(\s*)['"]([^'"]+)['"]/g),
    ].map((m) => m[1]);
    for (const spec of specifiers) {
      if (!FORBIDDEN_MODULES.some((re) => re.test(spec))) continue;
      if (inParallel && PARALLEL_ALLOWED.some((re) => re.test(spec))) continue;
      found.push(`${relPath}:${i + 1}: imports ${spec}`);
    }
    if (/(^|[^\w$.])process\s*(\.|\[)/.test(line) || /\bglobalThis\s*\.\s*process\b/.test(line)) {
      found.push(`${relPath}:${i + 1}: reads process`);
    }
  });
  return found;
}

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...sourceFiles(full));
    else if (/\.(ts|mts|js|mjs)$/.test(entry.name)) out.push(full);
  }
  return out;
}

describe('the core is pure', () => {
  it('the scanner catches every kind of violation (so the real check can fail)', () => {
    const bad = [
      "import { readFileSync } from 'node:fs';",
      "import fs from 'fs/promises';",
      "const cp = await import('node:child_process');",
      "import { Worker } from 'node:worker_threads';",
      "import * as core from '@actions/core';",
      'const home = process.env.HOME;',
      'const x = globalThis.process;',
      "const y = require('fs');",
    ];
    bad.forEach((line) => expect(violations(line, 'src/metrics/x.ts'), line).toHaveLength(1));
    const fine = [
      '// reads process.env in the shell, not here',
      '/* import x from "node:fs" */',
      "const url = 'https://example.invalid/a'; // process.exit",
      'const processed = subprocess.length + myprocess.x;',
      "import { tmpdir } from 'node:os';",
    ];
    fine.forEach((line) => expect(violations(line, 'src/metrics/x.ts'), line).toEqual([]));
    expect(
      violations("import { Worker } from 'node:worker_threads';\nimport os from 'node:os';", 'src/parallel/pool.ts'),
    ).toEqual([]);
    expect(violations("import fs from 'node:fs';\nprocess.cwd();", 'src/parallel/pool.ts')).toHaveLength(2);
  });

  it('no file outside src/shell/ does I/O or reads process', () => {
    const src = path.join(repoRoot, 'src');
    const files = sourceFiles(src).filter((f) => !path.relative(src, f).startsWith(`shell${path.sep}`));
    expect(files.length).toBeGreaterThan(10);
    const found = files.flatMap((f) =>
      violations(readFileSync(f, 'utf8'), path.relative(repoRoot, f).split(path.sep).join('/')),
    );
    expect(found).toEqual([]);
  });
});
