// A short stable hash for fingerprints and digests: FNV-1a, 64 bit, over the UTF-8 bytes
// (Fowler, Noll, Vo; parameters from the published FNV reference: offset basis
// 0xcbf29ce484222325, prime 0x100000001b3). Not cryptographic: it only has to be the same on
// every machine and every run for the same text. Pure.

const OFFSET = 0xcbf29ce484222325n;
const PRIME = 0x100000001b3n;
const MASK = 0xffffffffffffffffn;

/** 16 lowercase hex digits. */
export function stableHash(text: string): string {
  let h = OFFSET;
  for (const byte of new TextEncoder().encode(text)) {
    h ^= BigInt(byte);
    h = (h * PRIME) & MASK;
  }
  return h.toString(16).padStart(16, '0');
}
