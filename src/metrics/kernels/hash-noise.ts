// Deterministic pseudo-random numbers keyed by (original element index, stream): start
// vectors and probe vectors of the iterative spectral kernels are built from these, so an
// evaluation is a pure function of the graph and the mask, whatever was evaluated before.
// The mixer (hash32, murmur3's finaliser) lives with every other hash in src/random.ts.

import { hash32 } from '../../random.js';

/** Uniform in [-1, 1). */
export function noise(a: number, b: number): number {
  return hash32(a, b) / 2147483648 - 1;
}

/** A Rademacher sign, ±1. */
export function sign(a: number, b: number): number {
  return hash32(a, b) & 1 ? 1 : -1;
}
