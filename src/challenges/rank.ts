// Ranking rules shared by the targeted attacks. Ties go to the lowest index: the element whose
// id comes first in natural order (graph/canonical.ts), whatever the file's order. Scores from
// floating-point kernels (betweenness, eigenvector, closeness) are compared after rounding to
// 2^-32 of the largest score, so that rounding noise — which differs between implementations
// summing in different orders — cannot split a tie that is exact in real arithmetic. Integer
// scores (degree) are compared exactly.

const QUANTUM = 2 ** 32;

/** Scores rounded to multiples of max/2^32 (integers 0..2^32); all-zero scores stay 0. */
export function quantizeScores(score: Float64Array, eligible: Uint8Array): Float64Array {
  let max = 0;
  for (let i = 0; i < score.length; i++) if (eligible[i] && score[i] > max) max = score[i];
  const q = new Float64Array(score.length);
  if (max > 0) for (let i = 0; i < score.length; i++) q[i] = Math.round((score[i] / max) * QUANTUM);
  return q;
}

/** Eligible indices by descending score, ties to the lower index; the first `steps` of them. */
export function rankDescending(score: ArrayLike<number>, eligible: Uint8Array, steps: number): Int32Array {
  const idx: number[] = [];
  for (let i = 0; i < eligible.length; i++) if (eligible[i]) idx.push(i);
  idx.sort((a, b) => score[b] - score[a] || a - b);
  return Int32Array.from(idx.slice(0, Math.max(0, steps)));
}

/** Static attack order from floating-point scores (quantized first). */
export function rankScores(score: Float64Array, eligible: Uint8Array, steps: number): Int32Array {
  return rankDescending(quantizeScores(score, eligible), eligible, steps);
}

/**
 * The candidate with the highest score (after rounding to 2^-32 of the maximum), lowest index
 * on ties; -1 when there is no candidate.
 */
export function argmaxTied(score: Float64Array, candidate: Uint8Array): number {
  let max = -Infinity;
  let first = -1;
  for (let i = 0; i < score.length; i++) {
    if (!candidate[i]) continue;
    if (first < 0) first = i;
    if (score[i] > max) max = score[i];
  }
  if (first < 0 || !(max > 0)) return first;
  for (let i = first; i < score.length; i++) {
    if (candidate[i] && Math.round((score[i] / max) * QUANTUM) === QUANTUM) return i;
  }
  return first;
}
