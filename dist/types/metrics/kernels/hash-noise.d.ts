/** murmur3's 32-bit finaliser (Appleby, MurmurHash3, public domain): a bijective avalanche mix.
 *  The one copy in the project; the envelope's seeded keys use it too. */
export declare function mix32(h: number): number;
export declare function hash32(a: number, b: number): number;
/** Uniform in [-1, 1). */
export declare function noise(a: number, b: number): number;
/** A Rademacher sign, ±1. */
export declare function sign(a: number, b: number): number;
