// Bundles the two entries into dist/ with esbuild. The output must be byte-stable
// (CI rebuilds it and fails on any diff), so no timestamps, no absolute paths.
import { build } from 'esbuild';
import { copyFileSync, existsSync, mkdirSync } from 'node:fs';

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
};

mkdirSync('dist', { recursive: true });
await build({ ...common, entryPoints: ['src/shell/action.ts'], outfile: 'dist/index.js', banner });
await build({
  ...common,
  entryPoints: ['src/shell/cli.ts'],
  outfile: 'dist/cli.js',
  banner: { js: '#!/usr/bin/env node\n' + banner.js },
});
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
