// Bundles the two entries into dist/ with esbuild. The output must be byte-stable
// (CI rebuilds it and fails on any diff), so no timestamps, no absolute paths.
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { precompiledValidators } from './validators.mjs';

const banner = {
  // Some CommonJS dependencies call require(); give the ESM bundle one.
  js: "import { createRequire as __nbCreateRequire } from 'node:module';\nconst require = __nbCreateRequire(import.meta.url);",
};

const common = {
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: false,
  legalComments: 'none',
  logLevel: 'warning',
  charset: 'utf8',
  // The schema validators as ajv's standalone code, not compiled at start (validators.mjs).
  plugins: [precompiledValidators()],
};

mkdirSync('dist', { recursive: true });
await build({ ...common, entryPoints: ['src/shell/action.ts'], outfile: 'dist/index.js', banner });
await build({
  ...common,
  entryPoints: ['src/shell/cli.ts'],
  outfile: 'dist/cli.js',
  banner: { js: '#!/usr/bin/env node\n' + banner.js },
});
// The library API (`import … from 'netbrace'`): graphology stays external, so the graphs it
// returns and takes are the caller's own graphology's.
if (existsSync('src/api/index.ts')) {
  await build({ ...common, entryPoints: ['src/api/index.ts'], outfile: 'dist/api.js', banner, external: ['graphology'] });
}
// Its type declarations, generated from the sources (tsc is deterministic). Scratch builds of
// the Action bundle (the end-to-end tests) have no tsconfig and need none.
if (existsSync('src/api/index.ts') && existsSync('tsconfig.api.json')) {
  rmSync('dist/types', { recursive: true, force: true });
  const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
  execFileSync(process.execPath, [tsc, '-p', 'tsconfig.api.json'], { stdio: 'inherit' });
}
// The worker pool's thread entry is bundled on its own; the pool loads it beside cli/index.
if (existsSync('src/parallel/worker.ts')) {
  await build({ ...common, entryPoints: ['src/parallel/worker.ts'], outfile: 'dist/worker.js', banner });
}
// Published schemas travel with the bundle so editors and users can point at them.
for (const [from, to] of [
  ['src/topology/design.schema.json', 'dist/design.schema.json'],
  ['src/policy/policy.schema.json', 'dist/policy.schema.json'],
  ['src/report/report.schema.json', 'dist/report.schema.json'],
]) {
  try { copyFileSync(from, to); } catch (e) { if (e.code !== 'ENOENT') throw e; }
}
