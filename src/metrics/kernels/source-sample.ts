// Seeded source samples for the all-pairs metrics on large designs. A metric that sums over
// every source s (efficiency: E = mean over the N0 original nodes of y_s, y_s = Σ_t 1/d(s,t)
// / (N0 − 1)) can instead search from k sources drawn without replacement and report the
// sample mean, which is unbiased for E, with its standard error from the finite-population
// formula se² = (1 − k/N0) · s²/k, s² the sample variance of the y_s (Cochran, Sampling
// Techniques, 3rd ed., Wiley 1977, §2.4–2.5 — from memory). Removed sources count with y = 0,
// exactly as in E, so the estimator stays unbiased under every mask.
// The sample is the k nodes with the smallest hash(seed, node id) ("bottom-k"): a uniformly
// random k-subset when the hash behaves like a random function, keyed by id — never by the
// node's index or its place in the file — so base and head of a change draw the same sources
// among the nodes they share, and an unchanged design, in any order, draws the same sample.
// Ties of the 32-bit hash fall back to the natural id order (graph/canonical.ts).

import { compareIds } from '../../graph/canonical.js';
import { mix32 } from '../../random.js';

/** Which sources an all-pairs metric searches from: all of them, or a seeded sample of k. */
export type SourceChoice = number | 'all';

/** A 32-bit hash of (seed, id): murmur3-style over the UTF-16 units, seeded. */
export function sourceHash(id: string, seed: number): number {
  let h = mix32((Math.floor(seed / 0x1_0000_0000) ^ 0x736f7572) >>> 0) ^ (seed >>> 0);
  for (let i = 0; i < id.length; i++) {
    let k = Math.imul(id.charCodeAt(i), 0xcc9e2d51);
    k = (k << 15) | (k >>> 17);
    h ^= Math.imul(k, 0x1b873593);
    h = (h << 13) | (h >>> 19);
    h = (Math.imul(h, 5) + 0xe6546b64) | 0;
  }
  return mix32(h ^ id.length);
}

/**
 * The k sampled sources among nodes with these ids (indices into `ids`, ascending), or null
 * when `choice` asks for all of them or k ≥ the node count (the exact value is then cheaper).
 */
export function sampleSources(
  ids: readonly string[],
  choice: SourceChoice | undefined,
  seed: number,
): Int32Array | null {
  if (choice === undefined || choice === 'all') return null;
  if (!Number.isInteger(choice) || choice < 1)
    throw new RangeError(`sources must be a whole number of at least 1 or 'all', got ${String(choice)}`);
  if (choice >= ids.length) return null;
  const keys = new Uint32Array(ids.length);
  for (let i = 0; i < ids.length; i++) keys[i] = sourceHash(ids[i], seed);
  const order = Array.from({ length: ids.length }, (_, i) => i);
  order.sort((a, b) => keys[a] - keys[b] || compareIds(ids[a], ids[b]));
  return Int32Array.from(order.slice(0, choice)).sort();
}

/** Sample mean of y[0..k) and its finite-population standard error for a population of N. */
export function sampleMean(y: Float64Array, k: number, population: number): { mean: number; se: number } {
  let sum = 0;
  for (let i = 0; i < k; i++) sum += y[i];
  const mean = sum / k;
  if (k < 2) return { mean, se: Number.POSITIVE_INFINITY };
  let ss = 0;
  for (let i = 0; i < k; i++) ss += (y[i] - mean) * (y[i] - mean);
  const variance = ss / (k - 1);
  return { mean, se: Math.sqrt(Math.max(0, 1 - k / population) * (variance / k)) };
}
