// Deterministic pseudo-random numbers keyed by (original element index, stream): start
// vectors and probe vectors of the iterative spectral kernels are built from these, so an
// evaluation is a pure function of the graph and the mask, whatever was evaluated before.
// The mixer is the splitmix32-style finaliser of MurmurHash3 (fmix32, public domain).

/** murmur3's 32-bit finaliser (Appleby, MurmurHash3, public domain): a bijective avalanche mix.
 *  The one copy in the project; the envelope's seeded keys use it too. */
export function mix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

export function hash32(a: number, b: number): number {
  return mix32(Math.imul(a ^ 0x9e3779b9, 0x85ebca6b) ^ Math.imul(b + 0x632be5ab, 0xc2b2ae35));
}

/** Uniform in [-1, 1). */
export function noise(a: number, b: number): number {
  return hash32(a, b) / 2147483648 - 1;
}

/** A Rademacher sign, ±1. */
export function sign(a: number, b: number): number {
  return hash32(a, b) & 1 ? 1 : -1;
}
