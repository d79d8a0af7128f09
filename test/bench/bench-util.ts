// Shared pieces of the benchmarks: the CLI bundled as it ships (esbuild, as .ci/build.mjs
// does for dist/, into a temporary directory so dist/ is never touched), seeded
// Barabási–Albert designs written in our YAML format, timing of whole processes, and the
// python peers run with Debian's interpreter (a missing peer prints "peer unavailable").
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { build } from 'esbuild';
import { precompiledValidators } from '../../.ci/validators.mjs';

export const repo = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..', '..');

export function tempDir(): string {
  return mkdtempSync(path.join(tmpdir(), 'netbrace-bench-'));
}

/** dist/cli.js and dist/worker.js as .ci/build.mjs makes them, in `dir`; returns the CLI path. */
/** esbuild options of .ci/build.mjs (ESM for node 20, a require() for CommonJS dependencies). */
export const bundleOptions = {
  bundle: true,
  platform: 'node' as const,
  format: 'esm' as const,
  target: 'node20',
  logLevel: 'warning' as const,
  charset: 'utf8' as const,
  banner: {
    js: "import { createRequire as __nbCreateRequire } from 'node:module';\nconst require = __nbCreateRequire(import.meta.url);",
  },
  plugins: [precompiledValidators()],
};

export async function bundleCli(dir: string): Promise<string> {
  const options = {
    bundle: true,
    platform: 'node' as const,
    format: 'esm' as const,
    target: 'node20',
    logLevel: 'warning' as const,
    charset: 'utf8' as const,
    banner: {
      js: "import { createRequire as __nbCreateRequire } from 'node:module';\nconst require = __nbCreateRequire(import.meta.url);",
    },
    plugins: [precompiledValidators()],
  };
  await build({ ...options, entryPoints: [path.join(repo, 'src/shell/cli.ts')], outfile: path.join(dir, 'cli.js') });
  await build({
    ...options,
    entryPoints: [path.join(repo, 'src/parallel/worker.ts')],
    outfile: path.join(dir, 'worker.js'),
  });
  return path.join(dir, 'cli.js');
}

/** mulberry32 (Tommy Ettinger, public domain): a small seeded generator. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Barabási–Albert preferential attachment: m links per new node, from a K_{m+1} seed. */
export function barabasiAlbert(n: number, m: number, seed: number): [number, number][] {
  const r = mulberry32(seed);
  const edges: [number, number][] = [];
  const ends: number[] = [];
  for (let v = 0; v <= m && v < n; v++)
    for (let u = 0; u < v; u++) {
      edges.push([u, v]);
      ends.push(u, v);
    }
  for (let v = m + 1; v < n; v++) {
    const chosen = new Set<number>();
    while (chosen.size < m) chosen.add(ends[Math.floor(r() * ends.length)]);
    for (const u of chosen) {
      edges.push([u, v]);
      ends.push(u, v);
    }
  }
  return edges;
}

/** A design in our YAML format: nodes n0…, links between them (invented, for benchmarks). */
export function designYaml(n: number, edges: readonly (readonly [number, number])[], name: string): string {
  const out = ['network:', `  name: ${name}`, 'nodes:'];
  for (let v = 0; v < n; v++) out.push(`  - id: n${v}`);
  out.push('links:');
  for (const [a, b] of edges) out.push(`  - between: [n${a}, n${b}]`);
  return out.join('\n') + '\n';
}

export function writeDesign(
  dir: string,
  file: string,
  n: number,
  edges: readonly (readonly [number, number])[],
): string {
  const p = path.join(dir, file);
  writeFileSync(p, designYaml(n, edges, file));
  return p;
}

export interface ProcessRun {
  seconds: number;
  maxRssMb: number;
  status: number | null;
  stdout: string;
  stderr: string;
}

/** Runs a command to its end; wall time and the child's peak RSS (GNU time, else unknown). */
export function runProcess(
  cmd: string,
  args: string[],
  cwd = repo,
  timeoutMs?: number,
): ProcessRun & { timedOut: boolean } {
  const t = performance.now();
  const r = spawnSync('/usr/bin/time', ['-f', '%M', cmd, ...args], {
    cwd,
    encoding: 'utf8',
    maxBuffer: 256 * 2 ** 20,
    ...(timeoutMs ? { timeout: timeoutMs, killSignal: 'SIGKILL' as const } : {}),
  });
  if (r.signal)
    return {
      seconds: (performance.now() - t) / 1000,
      maxRssMb: Number.NaN,
      status: null,
      stdout: r.stdout ?? '',
      stderr: r.stderr ?? '',
      timedOut: true,
    };
  const seconds = (performance.now() - t) / 1000;
  if (r.error) {
    const plain = spawnSync(cmd, args, { cwd, encoding: 'utf8', maxBuffer: 256 * 2 ** 20 });
    return {
      seconds: (performance.now() - t) / 1000,
      maxRssMb: Number.NaN,
      status: plain.status,
      stdout: plain.stdout,
      stderr: plain.stderr,
      timedOut: false,
    };
  }
  const lines = r.stderr.trimEnd().split('\n');
  const kb = Number(lines.pop());
  return {
    seconds,
    maxRssMb: kb / 1024,
    status: r.status,
    stdout: r.stdout,
    stderr: lines.join('\n'),
    timedOut: false,
  };
}

/** Best of `times` runs (wall time), with the largest peak RSS seen. */
export function bestRun(cmd: string, args: string[], times: number, cwd = repo): ProcessRun {
  let best: ProcessRun | undefined;
  let rss = 0;
  for (let i = 0; i < times; i++) {
    const r = runProcess(cmd, args, cwd);
    if (r.status !== 0) return r;
    rss = Math.max(rss, r.maxRssMb);
    if (!best || r.seconds < best.seconds) best = r;
  }
  return { ...best!, maxRssMb: rss };
}

/** Runs a python peer with /usr/bin/python3; undefined (and a note) when it cannot run. */
export function pythonPeer(script: string, args: string[]): { out: unknown; seconds: number } | undefined {
  const t = performance.now();
  const r = spawnSync('/usr/bin/python3', [path.join(repo, 'test/bench', script), ...args], {
    encoding: 'utf8',
    maxBuffer: 64 * 2 ** 20,
  });
  const seconds = (performance.now() - t) / 1000;
  if (r.error || r.status !== 0) {
    console.log(`peer unavailable (${script}): ${(r.error?.message ?? r.stderr).trim().split('\n').pop()}`);
    return undefined;
  }
  return { out: JSON.parse(r.stdout), seconds };
}

/** One line of a targets table: what is aimed at, what was measured, the peer, met or not. */
export function targetLine(
  what: string,
  target: string,
  measured: string,
  peer: string,
  met: boolean | undefined,
): string {
  const mark = met === undefined ? 'n/a   ' : met ? 'met   ' : 'MISSED';
  return `${mark}  ${what.padEnd(44)} target ${target.padEnd(16)} measured ${measured.padEnd(18)} peer ${peer}`;
}
