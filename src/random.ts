// Every hash and every random number of netbrace, in one bottom-layer module (pure, no imports):
// - mix32, murmur3's finaliser, and hash32 (two words → one), behind the seeded keys below and
//   the start and probe vectors of the spectral kernels (metrics/kernels/hash-noise.ts);
// - fnv1a32 and stableHash (FNV-1a over UTF-8 bytes, 32 and 64 bit): parts by path, report
//   fingerprints and digests;
// and, for the envelope engine:
// - element keys: key = hash(seed, realization, stable element id). A random removal order is
//   the eligible elements sorted by key, so two versions of a design (base and head) give the
//   elements they share the same relative order in every realization (common random numbers,
//   docs/METHODS.md §7.4), and the order never depends on the thread that computes it.
// - a small generator (xoshiro128**, Blackman & Vigna, "Scrambled linear pseudorandom number
//   generators", ACM TOMS 47:36, 2021) seeded from (seed, stream) through the murmur3
//   finaliser, for the few places that need a stream of numbers (bootstrap resampling).
// All arithmetic is 32-bit integer (Math.imul, >>>), so results are identical on every engine.

/** murmur3's 32-bit finaliser (Appleby, MurmurHash3, public domain): a bijective avalanche mix. */
export function mix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/** Two 32-bit words mixed into one (keys of the spectral kernels' pseudo-random vectors). */
export function hash32(a: number, b: number): number {
  return mix32(Math.imul(a ^ 0x9e3779b9, 0x85ebca6b) ^ Math.imul(b + 0x632be5ab, 0xc2b2ae35));
}

/** FNV-1a 32-bit hash of a text's UTF-8 bytes (Fowler, Noll, Vo; common practice for stable bucketing). */
export function fnv1a32(text: string): number {
  let h = 0x811c9dc5;
  const bytes = new TextEncoder().encode(text);
  for (const b of bytes) {
    h ^= b;
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h >>> 0;
}

/**
 * FNV-1a 32-bit over a text's UTF-16 code units, as a signed 32-bit integer: the spectral
 * kernels' start and probe vectors are keyed by it (differs from fnv1a32 only beyond ASCII;
 * kept so their values stay the same).
 */
export function fnv1a32CodeUnits(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h | 0;
}

const FNV64_OFFSET = 0xcbf29ce484222325n;
const FNV64_PRIME = 0x100000001b3n;
const MASK64 = 0xffffffffffffffffn;

/**
 * A short stable hash for fingerprints and digests, 16 lowercase hex digits: FNV-1a, 64 bit,
 * over the UTF-8 bytes (parameters from the published FNV reference: offset basis
 * 0xcbf29ce484222325, prime 0x100000001b3). Not cryptographic: it only has to be the same on
 * every machine and every run for the same text.
 */
export function stableHash(text: string): string {
  let h = FNV64_OFFSET;
  for (const byte of new TextEncoder().encode(text)) {
    h ^= BigInt(byte);
    h = (h * FNV64_PRIME) & MASK64;
  }
  return h.toString(16).padStart(16, '0');
}

/** A 32-bit hash of a string's UTF-16 code units (murmur3-style body, mix32 finaliser). */
export function hashString(s: string, seed: number): number {
  let h = seed >>> 0;
  for (let i = 0; i < s.length; i++) {
    let k = Math.imul(s.charCodeAt(i), 0xcc9e2d51);
    k = (k << 15) | (k >>> 17);
    h ^= Math.imul(k, 0x1b873593);
    h = (h << 13) | (h >>> 19);
    h = (Math.imul(h, 5) + 0xe6546b64) | 0;
  }
  return mix32(h ^ s.length);
}

/** Folds an arbitrary integer seed (up to 2^53) into 32 bits without losing its high part. */
export function seedWord(seed: number): number {
  if (!Number.isSafeInteger(seed) || seed < 0) throw new RangeError(`seed must be a non-negative integer, got ${seed}`);
  const lo = seed >>> 0;
  const hi = Math.floor(seed / 0x1_0000_0000) >>> 0;
  return mix32(lo ^ mix32(hi ^ 0x9e3779b9));
}

/** Stable per-element hashes, computed once per design: one 32-bit word per id. */
export function hashIds(ids: readonly string[]): Uint32Array {
  const out = new Uint32Array(ids.length);
  for (let i = 0; i < ids.length; i++) out[i] = hashString(ids[i], 0x6e627263);
  return out;
}

/** The key of one element in one realization: hash(seed, realization, element id). */
export function elementKey(seedW: number, realization: number, idHash: number): number {
  return keyOf(realizationWord(seedW, realization), idHash);
}

/** The part of a key shared by every element of one realization. */
function realizationWord(seedW: number, realization: number): number {
  return mix32((Math.imul(realization + 1, 0x9e3779b9) ^ seedW) >>> 0);
}

function keyOf(r: number, idHash: number): number {
  return mix32((idHash ^ r) + Math.imul(r, 0x27d4eb2d) + 0x165667b1);
}

/** Scratch space of randomOrder for up to `capacity` elements. */
export interface OrderWorkspace {
  keys: Uint32Array;
  keys2: Uint32Array;
  idx2: Int32Array;
  counts: Uint32Array;
}

export function createOrderWorkspace(capacity: number): OrderWorkspace {
  return {
    keys: new Uint32Array(capacity),
    keys2: new Uint32Array(capacity),
    idx2: new Int32Array(capacity),
    counts: new Uint32Array(2048),
  };
}

/**
 * The random removal order of one realization: the eligible elements (eligible[i] === 1, or all
 * when `eligible` is null) in ascending key order; equal keys (a 2^-32 event) keep index (canonical id) order.
 * Writes into `out` and returns how many elements it holds. A stable LSD radix sort (11, 11 and
 * 10 bits) keeps the cost linear: O(n) per realization instead of O(n log n).
 */
export function randomOrder(
  idHash: Uint32Array,
  eligible: Uint8Array | null,
  seedW: number,
  realization: number,
  out: Int32Array,
  ws: OrderWorkspace = createOrderWorkspace(idHash.length),
): number {
  const n = idHash.length;
  let { keys, keys2, idx2 } = ws;
  const counts = ws.counts;
  let idx = out;
  let count = 0;
  const r = realizationWord(seedW, realization);
  for (let i = 0; i < n; i++) {
    if (eligible !== null && eligible[i] === 0) continue;
    keys[count] = keyOf(r, idHash[i]);
    idx[count++] = i;
  }
  for (let shift = 0; shift < 32; shift += 11) {
    const bits = shift === 22 ? 10 : 11;
    const mask = (1 << bits) - 1;
    counts.fill(0, 0, mask + 1);
    for (let j = 0; j < count; j++) counts[(keys[j] >>> shift) & mask]++;
    let sum = 0;
    for (let b = 0; b <= mask; b++) {
      const c = counts[b];
      counts[b] = sum;
      sum += c;
    }
    for (let j = 0; j < count; j++) {
      const pos = counts[(keys[j] >>> shift) & mask]++;
      keys2[pos] = keys[j];
      idx2[pos] = idx[j];
    }
    [keys, keys2] = [keys2, keys];
    [idx, idx2] = [idx2, idx];
  }
  // Three passes: the sorted indices sit in the scratch array; copy them home.
  if (idx !== out) out.set(idx.subarray(0, count));
  return count;
}

/** xoshiro128**: a fast 32-bit generator with a 2^128 − 1 period. */
export class Xoshiro128 {
  private a: number;
  private b: number;
  private c: number;
  private d: number;

  constructor(seed: number, stream = 0) {
    const s = seedWord(seed);
    const t = mix32((Math.imul(stream + 1, 0x9e3779b9) ^ s) >>> 0);
    this.a = mix32(s ^ 0x243f6a88) | 1;
    this.b = mix32(t ^ 0x85a308d3);
    this.c = mix32((s + t) ^ 0x13198a2e);
    this.d = mix32((t - s) ^ 0x03707344);
  }

  /** Next uniform 32-bit unsigned integer. */
  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.b, 5), 7), 9) >>> 0;
    const t = this.b << 9;
    this.c ^= this.a;
    this.d ^= this.b;
    this.b ^= this.c;
    this.a ^= this.d;
    this.c ^= t;
    this.d = rotl(this.d, 11);
    return result;
  }

  /** Uniform in [0, 1) with 32 random bits. */
  nextFloat(): number {
    return this.nextUint32() / 0x1_0000_0000;
  }

  /** Uniform integer in [0, n), unbiased (rejection of the short tail). */
  nextInt(n: number): number {
    const limit = 0x1_0000_0000 - (0x1_0000_0000 % n);
    for (;;) {
      const u = this.nextUint32();
      if (u < limit) return u % n;
    }
  }
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}
