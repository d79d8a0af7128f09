/** murmur3's 32-bit finaliser (Appleby, MurmurHash3, public domain): a bijective avalanche mix. */
export declare function mix32(h: number): number;
/** Two 32-bit words mixed into one (keys of the spectral kernels' pseudo-random vectors). */
export declare function hash32(a: number, b: number): number;
/** FNV-1a 32-bit hash of a text's UTF-8 bytes (Fowler, Noll, Vo; common practice for stable bucketing). */
export declare function fnv1a32(text: string): number;
/**
 * FNV-1a 32-bit over a text's UTF-16 code units, as a signed 32-bit integer: the spectral
 * kernels' start and probe vectors are keyed by it (differs from fnv1a32 only beyond ASCII;
 * kept so their values stay the same).
 */
export declare function fnv1a32CodeUnits(text: string): number;
/**
 * A short stable hash for fingerprints and digests, 16 lowercase hex digits: FNV-1a, 64 bit,
 * over the UTF-8 bytes (parameters from the published FNV reference: offset basis
 * 0xcbf29ce484222325, prime 0x100000001b3). Not cryptographic: it only has to be the same on
 * every machine and every run for the same text.
 */
export declare function stableHash(text: string): string;
/** A 32-bit hash of a string's UTF-16 code units (murmur3-style body, mix32 finaliser). */
export declare function hashString(s: string, seed: number): number;
/** Folds an arbitrary integer seed (up to 2^53) into 32 bits without losing its high part. */
export declare function seedWord(seed: number): number;
/** Stable per-element hashes, computed once per design: one 32-bit word per id. */
export declare function hashIds(ids: readonly string[]): Uint32Array;
/** The key of one element in one realization: hash(seed, realization, element id). */
export declare function elementKey(seedW: number, realization: number, idHash: number): number;
/** Scratch space of randomOrder for up to `capacity` elements. */
export interface OrderWorkspace {
    keys: Uint32Array;
    keys2: Uint32Array;
    idx2: Int32Array;
    counts: Uint32Array;
}
export declare function createOrderWorkspace(capacity: number): OrderWorkspace;
/**
 * The random removal order of one realization: the eligible elements (eligible[i] === 1, or all
 * when `eligible` is null) in ascending key order; equal keys (a 2^-32 event) keep index (canonical id) order.
 * Writes into `out` and returns how many elements it holds. A stable LSD radix sort (11, 11 and
 * 10 bits) keeps the cost linear: O(n) per realization instead of O(n log n).
 */
export declare function randomOrder(idHash: Uint32Array, eligible: Uint8Array | null, seedW: number, realization: number, out: Int32Array, ws?: OrderWorkspace): number;
/** xoshiro128**: a fast 32-bit generator with a 2^128 − 1 period. */
export declare class Xoshiro128 {
    private a;
    private b;
    private c;
    private d;
    constructor(seed: number, stream?: number);
    /** Next uniform 32-bit unsigned integer. */
    nextUint32(): number;
    /** Uniform in [0, 1) with 32 random bits. */
    nextFloat(): number;
    /** Uniform integer in [0, n), unbiased (rejection of the short tail). */
    nextInt(n: number): number;
}
