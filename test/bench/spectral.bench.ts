// Spectral metrics on large designs, side by side with SciPy/NumPy (spectral_peer.py):
// - algebraic connectivity (Fiedler value) of seeded Barabási–Albert designs (m = 2) and of
//   the largest component of seeded Erdős–Rényi graphs (mean degree 6), 5,000 to 20,000
//   nodes: netbrace's plain Lanczos recurrence (kernels/extremal-lanczos.ts, the constant
//   vector deflated, residual ≤ 1e-10·a) against eigsh(L, k=2, which='SM', tol=1e-10); the
//   values must agree to 1e-8 relative;
// - natural connectivity: exact (dense) up to 2,000 nodes against NumPy's eigvalsh, and above
//   it the estimate with its stated error (2·se relative to λ̄).
// Each netbrace figure is one warm call (the evaluator is created once per design, as the
// engine does). Timings on a shared machine are noisy: compare within one run.
// Targets: algebraic connectivity no slower than eigsh at 5,000–20,000 nodes;
// natural connectivity exact to 2,000 nodes, stated error ≤ 1e-3 relative beyond.
// NETBRACE_SPECTRAL_SIZES=5000 limits the sizes (default 5000,20000).
import { rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { findComponents } from '../../src/graph/structure.js';
import { getMetric } from '../../src/metrics/registry.js';
import { barabasiAlbert, mulberry32, pythonPeer, targetLine, tempDir } from './bench-util.js';

const sizes = (process.env.NETBRACE_SPECTRAL_SIZES ?? '5000,20000').split(',').map(Number);

function erLcc(n: number, seed: number): { n: number; edges: [number, number][] } {
  const r = mulberry32(seed);
  const seen = new Set<number>();
  const edges: [number, number][] = [];
  while (edges.length < 3 * n) {
    const a = Math.floor(r() * n);
    const b = Math.floor(r() * n);
    const key = a < b ? a * n + b : b * n + a;
    if (a === b || seen.has(key)) continue;
    seen.add(key);
    edges.push([a, b]);
  }
  const c = findComponents(graphFromEdges(n, edges));
  const index = new Int32Array(n).fill(-1);
  let k = 0;
  for (let v = 0; v < n; v++) if (c.label[v] === c.largest) index[v] = k++;
  return {
    n: k,
    edges: edges.filter(([a, b]) => index[a] >= 0 && index[b] >= 0).map(([a, b]) => [index[a], index[b]]),
  };
}

type Spec = { n: number; edges: [number, number][]; fiedler?: boolean; dense?: boolean };
const graphs: Record<string, Spec> = {};
for (const n of sizes) {
  graphs[`BA(${n / 1000}k, m=2)`] = { n, edges: barabasiAlbert(n, 2, n), fiedler: true };
  graphs[`ER-LCC(${n / 1000}k)`] = { ...erLcc(n, n), fiedler: true };
}
for (const n of [1000, 2000])
  graphs[`BA(${n / 1000}k, m=2) natural`] = { n, edges: barabasiAlbert(n, 2, n + 1), dense: true };
for (const n of [5000]) graphs[`BA(${n / 1000}k, m=2) natural`] = { n, edges: barabasiAlbert(n, 2, n + 1) };

const dir = tempDir();
const specFile = path.join(dir, 'graphs.json');
writeFileSync(specFile, JSON.stringify(graphs));
console.log('peer: /usr/bin/python3 test/bench/spectral_peer.py …');
const peer = pythonPeer('spectral_peer.py', [specFile]) as
  | {
      out: {
        scipy: string;
        numpy: string;
        graphs: Record<
          string,
          { fiedler?: number; fiedler_seconds?: number; natural?: number; natural_seconds?: number }
        >;
      };
    }
  | undefined;
rmSync(dir, { recursive: true, force: true });

function timed(g: CompactGraph, id: 'algebraic_connectivity' | 'natural_connectivity') {
  const ev = getMetric(id).create(g);
  const mask = createMask(g);
  ev(mask); // warm-up
  const t = performance.now();
  const v = ev(mask);
  return { v, seconds: (performance.now() - t) / 1000 };
}

const lines: string[] = [];
let fiedlerAllMet = true;
let fiedlerAny = false;
for (const [name, spec] of Object.entries(graphs)) {
  const g = graphFromEdges(spec.n, spec.edges);
  const p = peer?.out.graphs[name];
  if (spec.fiedler) {
    const { v, seconds } = timed(g, 'algebraic_connectivity');
    const agree = p?.fiedler !== undefined ? Math.abs(v.raw - p.fiedler) / p.fiedler : Number.NaN;
    const ratio = p?.fiedler_seconds !== undefined ? p.fiedler_seconds / seconds : Number.NaN;
    if (Number.isFinite(ratio)) {
      fiedlerAny = true;
      if (ratio < 1) fiedlerAllMet = false;
    }
    lines.push(
      `${name.padEnd(22)} a = ${v.raw.toPrecision(10)}  netbrace ${seconds.toFixed(2)} s  eigsh ${p?.fiedler_seconds?.toFixed(2) ?? 'peer unavailable'} s  speed ${Number.isFinite(ratio) ? `${ratio.toFixed(2)}×` : '–'}  values agree to ${Number.isFinite(agree) ? agree.toExponential(1) : '–'}${agree > 1e-8 ? '  (DIFFER)' : ''}`,
    );
  } else {
    const { v, seconds } = timed(g, 'natural_connectivity');
    const err = p?.natural !== undefined ? Math.abs(v.raw - p.natural) / p.natural : Number.NaN;
    const stated = v.se !== undefined ? (2 * v.se) / v.raw : 0;
    lines.push(
      `${name.padEnd(22)} λ̄ = ${v.raw.toPrecision(10)}  netbrace ${seconds.toFixed(2)} s (${v.se === undefined ? 'exact' : `estimate, stated error ${stated.toExponential(1)}`})  NumPy eigvalsh ${p?.natural_seconds?.toFixed(2) ?? '–'} s${Number.isFinite(err) ? `  actual error ${err.toExponential(1)}` : ''}`,
    );
    if (v.se !== undefined)
      lines.push(
        targetLine(
          `natural connectivity stated error, ${name}`,
          '≤ 1e-3',
          stated.toExponential(1),
          'no peer estimate',
          stated <= 1e-3,
        ),
      );
  }
}
console.log(`SciPy ${peer?.out.scipy ?? '–'}, NumPy ${peer?.out.numpy ?? '–'}\n${lines.join('\n')}\n`);
console.log(
  targetLine(
    'algebraic connectivity vs eigsh(SM)',
    'no slower',
    fiedlerAny ? (fiedlerAllMet ? 'all sizes' : 'slower on some') : '–',
    peer ? 'eigsh SM tol 1e-10' : 'peer unavailable',
    fiedlerAny ? fiedlerAllMet : undefined,
  ),
);
