import { preferentialGraph } from '../envelope/graphs.js';
import { createMask } from '../../src/graph/mask.js';
import { createSurvivorBuilder } from '../../src/metrics/kernels/subgraph.js';
import { createHopHistogram } from '../../src/metrics/kernels/bit-bfs.js';
const g = preferentialGraph(1000, 2, 1);
const mask = createMask(g);
for (const frac of [0, 0.25, 0.5]) {
  mask.link.fill(0);
  for (let e = 0; e < g.m; e++) if ((e * 2654435761 >>> 0) % 1000 < frac * 1000) mask.link[e] = 1;
  const local = createSurvivorBuilder(g, true)(mask);
  const bfs = createHopHistogram(g.n);
  const src = Int32Array.from({ length: local.n }, (_, i) => i);
  for (let i = 0; i < 30; i++) bfs.run(local, src, local.n);
  let best = Infinity;
  for (let r = 0; r < 5; r++) { const t = performance.now(); for (let i = 0; i < 20; i++) bfs.run(local, src, local.n); best = Math.min(best, (performance.now() - t) / 20); }
  const h = bfs.run(local, src, local.n);
  // plain sweep: 64 lanes gather-OR
  const F = new Uint32Array(2 * local.n).fill(0x5555), N = new Uint32Array(2 * local.n);
  const { offsets, neighbors } = local;
  let sb = Infinity;
  for (let r = 0; r < 200; r++) { const t = performance.now(); for (let v = 0; v < local.n; v++) { let a0 = 0, a1 = 0; for (let p = offsets[v]; p < offsets[v + 1]; p++) { const u = 2 * neighbors[p]; a0 |= F[u]; a1 |= F[u + 1]; } N[2 * v] = a0 & ~F[2*v]; N[2 * v + 1] = a1; } sb = Math.min(sb, performance.now() - t); }
  console.log(`removed ${frac}: n ${local.n} entries ${local.entries} maxD ${h.maxDistance} kernel ${best.toFixed(2)} ms; one 64-lane sweep ${(sb * 1000).toFixed(1)} us; bound ceil(n/64)*(maxD)*sweep = ${(Math.ceil(local.n / 64) * h.maxDistance * sb).toFixed(2)} ms`);
}
