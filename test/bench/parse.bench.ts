// Reading a large design: a generated ring of 50,000 sites and 50,000 links (100,000
// elements) in our YAML format, read by netbrace's design reader (src/topology/parse.ts,
// bundled as it ships) in a fresh process — time and peak RSS — beside PyYAML's C loader
// (test/bench/parse_peer.py), which keeps no positions. Also the same ring with 100,000 sites
// (200,000 elements). The check that error positions still hold is in
// test/topology/fast-yaml.test.ts, not here.
// Target (in the issue): 100,000 elements in under 3 s and 300 MB.
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { rmSync } from 'node:fs';
import { build } from 'esbuild';
import { bestRun, bundleOptions, pythonPeer, repo, targetLine, tempDir, writeDesign } from './bench-util.js';

const dir = tempDir();
const entry = path.join(dir, 'read.ts');
writeFileSync(
  entry,
  `import { readFileSync } from 'node:fs';
import { parseDesign } from ${JSON.stringify(path.join(repo, 'src/topology/parse.ts'))};
const t = performance.now();
const d = parseDesign(readFileSync(process.argv[2], 'utf8'), process.argv[2]);
console.log(JSON.stringify({ seconds: (performance.now() - t) / 1000, elements: d.nodes.length + d.links.length }));
`,
);
const reader = path.join(dir, 'read.js');
await build({ ...bundleOptions, entryPoints: [entry], outfile: reader });

const ring = (n: number) => Array.from({ length: n }, (_, i) => [i, (i + 1) % n] as [number, number]);
const rows: string[] = [];
let check: string | undefined;
for (const n of [50_000, 100_000]) {
  const file = writeDesign(dir, `ring${n}.net.yaml`, n, ring(n));
  const run = bestRun(process.execPath, [reader, file], 2);
  if (run.status !== 0) throw new Error(run.stderr);
  const inner = JSON.parse(run.stdout) as { seconds: number; elements: number };
  const peer = pythonPeer('parse_peer.py', [file]) as { out: { seconds: number; version: string } } | undefined;
  rows.push(
    `${String(inner.elements).padStart(7)} elements: whole process ${run.seconds.toFixed(2)} s (reading ${inner.seconds.toFixed(2)} s), peak RSS ${run.maxRssMb.toFixed(0)} MB;` +
      ` PyYAML ${peer ? `${peer.out.version} CSafeLoader ${peer.out.seconds.toFixed(2)} s` : 'peer unavailable'}`,
  );
  if (inner.elements === 100_000) {
    check = targetLine(
      'read 100,000 elements (whole process)',
      '< 3 s, < 300 MB',
      `${run.seconds.toFixed(2)} s, ${run.maxRssMb.toFixed(0)} MB`,
      peer ? `CSafeLoader ${peer.out.seconds.toFixed(2)} s` : 'peer unavailable',
      run.seconds < 3 && run.maxRssMb < 300,
    );
  }
}
rmSync(dir, { recursive: true, force: true });
console.log(rows.join('\n'));
console.log('');
console.log(check);
