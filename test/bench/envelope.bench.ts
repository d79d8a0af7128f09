// Envelope engine benchmark, side by side in one run with networkx and python-igraph doing
// the same jobs (test/bench/envelope_peer.py, run with Debian's /usr/bin/python3):
//   (a) random-link-failure envelope of efficiency, 1,000-node preferential-attachment graph
//       (3 links per new node), M = 20, 11 grid points up to 50 %;
//   (b) random-node-failure envelope of the largest component, 20,000-node G(N, L) with mean
//       degree 4, M = 200, 11 grid points up to 50 %;
//   (c) adaptive degree attack to 20 % on a 5,000-node preferential-attachment graph
//       (2 links per node), the largest component after every removal.
// Targets (issue 4): (a) ≥ 5× faster than igraph; (b) under 1 s of engine time; (c) ≥ 100×
// faster than networkx; never slower than igraph. networkx is run on a subset of the
// realizations for (a) and (b) and extrapolated linearly; the output says so.
// Usage: npm run bench [-- --skip-networkx]
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import type { CompactGraph } from '../../src/graph/compact.js';
import { evaluateDesign, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { build } from 'esbuild';
import { preferentialGraph, randomGraph } from '../envelope/graphs.js';

interface Job {
  name: string;
  g: CompactGraph;
  spec: EvaluationSpec;
  extra: Record<string, number>;
}

const metric = (id: 'efficiency' | 'largest_component') => ({ metrics: [{ id, weight: 1 }], combine: 'mean' as const });
const budget = { maxWork: 1e13 };
const jobs: Job[] = [
  {
    name: 'a',
    g: preferentialGraph(1000, 3, 1),
    spec: {
      r: metric('efficiency'),
      seed: 1,
      budget,
      challenges: [{ challenge: 'random-links', realizations: 20, until: 0.5, points: 11 }],
    },
    extra: { realizations: 20, until: 0.5, points: 11, networkx_realizations: 2 },
  },
  {
    name: 'b',
    g: randomGraph(20_000, 40_000, 2),
    spec: {
      r: metric('largest_component'),
      seed: 1,
      budget,
      challenges: [{ challenge: 'random-nodes', realizations: 200, until: 0.5, points: 11 }],
    },
    extra: { realizations: 200, until: 0.5, points: 11, networkx_realizations: 20 },
  },
  {
    name: 'c',
    g: preferentialGraph(5000, 2, 3),
    spec: {
      r: metric('largest_component'),
      seed: 1,
      budget,
      challenges: [{ challenge: 'degree-adaptive', until: 0.2 }],
    },
    extra: { until: 0.2 },
  },
];

const dir = mkdtempSync(join(tmpdir(), 'netbrace-bench-'));
// The parallel path is measured as it ships: the pool and its worker bundled by esbuild (as
// .ci/build.mjs does for dist/), so worker threads start without compiling TypeScript.
const bundleOptions = {
  bundle: true,
  platform: 'node' as const,
  format: 'esm' as const,
  target: 'node20',
  logLevel: 'warning' as const,
};
await build({
  ...bundleOptions,
  entryPoints: [new URL('../../src/parallel/pool.ts', import.meta.url).pathname],
  outfile: join(dir, 'pool.js'),
});
await build({
  ...bundleOptions,
  entryPoints: [new URL('../../src/parallel/worker.ts', import.meta.url).pathname],
  outfile: join(dir, 'worker.js'),
});
const { evaluateDesignParallel } = (await import(join(dir, 'pool.js'))) as typeof import('../../src/parallel/pool.js');
const engine: Record<string, { one: number; two: number; sequence?: string[] }> = {};
let peakRss = 0;
const sample = () => (peakRss = Math.max(peakRss, process.memoryUsage().rss));

for (const job of jobs) {
  const edges = Array.from({ length: job.g.m }, (_, e) => [job.g.linkSource[e], job.g.linkTarget[e]]);
  writeFileSync(join(dir, `${job.name}.json`), JSON.stringify({ n: job.g.n, edges, ...job.extra }));
  evaluateDesign(job.g, job.spec); // warm-up: JIT, so both sides are measured hot
  let t = performance.now();
  const ev = evaluateDesign(job.g, job.spec);
  const one = (performance.now() - t) / 1000;
  sample();
  await evaluateDesignParallel(job.g, job.spec, 2); // the bundle is a second copy of the engine: warm it too
  t = performance.now();
  const par = await evaluateDesignParallel(job.g, job.spec, 2);
  const two = (performance.now() - t) / 1000;
  sample();
  if (JSON.stringify(par.evaluation) !== JSON.stringify(ev.evaluation))
    throw new Error(`job ${job.name}: 1 and 2 threads differ`);
  engine[job.name] = { one, two, sequence: ev.evaluation.attacks[0]?.sequence };
  console.log(`engine (${job.name}): ${one.toFixed(3)} s on 1 thread, ${two.toFixed(3)} s on 2 threads`);
}
const engineRss = Math.max(peakRss, process.resourceUsage().maxRSS * 1024) / 2 ** 20;

console.log('running the python peers (networkx, python-igraph)…');
const args = [new URL('./envelope_peer.py', import.meta.url).pathname, dir, ...process.argv.slice(2)];
const py = spawnSync('/usr/bin/python3', args, { encoding: 'utf8', maxBuffer: 64 * 2 ** 20 });
rmSync(dir, { recursive: true, force: true });
if (py.status !== 0) {
  console.error(py.stderr);
  throw new Error('the python peer failed');
}
type PeerJob = { seconds: number; extrapolated: boolean; factor?: number; measured?: number; sequence?: number[] };
const peers = JSON.parse(py.stdout) as {
  igraph: Record<string, PeerJob> & { version: string };
  networkx: Record<string, PeerJob> & { version: string };
  peak_rss_mb: number;
};

// Same tie rule on both sides: the adaptive degree sequences must agree.
for (const lib of ['igraph', 'networkx'] as const) {
  const seq = peers[lib].c?.sequence;
  if (seq && seq.join() !== engine.c.sequence!.join())
    console.log(`warning: ${lib}'s adaptive degree sequence differs from netbrace's`);
  else if (seq) console.log(`(c) ${lib}'s adaptive degree sequence equals netbrace's (${seq.length} removals)`);
}

const fmt = (s: number) => (s >= 100 ? s.toFixed(0) : s >= 10 ? s.toFixed(1) : s.toFixed(3));
console.log(`\nseconds (lower is better); ratio = peer time / netbrace time on 1 thread [2 threads]`);
console.log(
  `job  netbrace 1t  netbrace 2t    igraph ${peers.igraph.version}  ratio          networkx ${peers.networkx.version}  ratio`,
);
for (const name of ['a', 'b', 'c']) {
  const e = engine[name];
  const ig = peers.igraph[name];
  const nx = peers.networkx[name];
  const r = (p: number) => `${(p / e.one).toFixed(1)}× [${(p / e.two).toFixed(1)}×]`;
  const nxText = nx
    ? `${fmt(nx.seconds)}${nx.extrapolated ? ` (extrapolated ×${nx.factor} from ${fmt(nx.measured!)} s)` : ''}  ${r(nx.seconds)}`
    : 'skipped';
  console.log(
    `(${name})  ${fmt(e.one).padStart(10)}  ${fmt(e.two).padStart(11)}  ${fmt(ig.seconds).padStart(15)}  ${r(ig.seconds).padEnd(13)}  ${nxText}`,
  );
}
console.log(
  `peak memory: netbrace process ${engineRss.toFixed(0)} MB (RSS); python peers ${peers.peak_rss_mb.toFixed(0)} MB (max RSS)`,
);

const checks: [string, boolean][] = [
  ['(a) at least 5× faster than igraph (1 thread)', peers.igraph.a.seconds / engine.a.one >= 5],
  ['(b) under 1 s of engine time (1 thread)', engine.b.one < 1],
  ['(c) at least 100× faster than networkx', peers.networkx.c ? peers.networkx.c.seconds / engine.c.one >= 100 : false],
  ['never slower than igraph', ['a', 'b', 'c'].every((n) => engine[n].one <= peers.igraph[n].seconds)],
];
for (const [what, ok] of checks) console.log(`${ok ? 'met   ' : 'MISSED'}  ${what}`);
