import { describe, expect, it } from 'vitest';
import { elementKey, hashIds, hashString, randomOrder, seedWord, Xoshiro128 } from '../../src/random.js';

describe('element keys and random orders', () => {
  it('are a pure function of (seed, realization, id)', () => {
    const ids = Array.from({ length: 500 }, (_, i) => `n${i}`);
    const h = hashIds(ids);
    const a = new Int32Array(500);
    const b = new Int32Array(500);
    randomOrder(h, null, seedWord(42), 3, a);
    randomOrder(hashIds(ids), null, seedWord(42), 3, b);
    expect(Array.from(a)).toEqual(Array.from(b));
    randomOrder(h, null, seedWord(42), 4, b);
    expect(Array.from(a)).not.toEqual(Array.from(b));
    expect([...a].sort((x, y) => x - y)).toEqual(ids.map((_, i) => i));
  });

  it('give shared elements the same relative order in two versions of a design', () => {
    const base = Array.from({ length: 300 }, (_, i) => `site-${i}`);
    // head: two sites removed, three added, and everything renumbered (shuffled file order).
    const head = [...base.filter((id) => id !== 'site-7' && id !== 'site-100'), 'new-a', 'new-b', 'new-c'].reverse();
    for (const r of [0, 1, 17]) {
      const ob = new Int32Array(base.length);
      const oh = new Int32Array(head.length);
      randomOrder(hashIds(base), null, seedWord(9), r, ob);
      randomOrder(hashIds(head), null, seedWord(9), r, oh);
      const shared = new Set(head);
      const fromBase = [...ob].map((i) => base[i]).filter((id) => shared.has(id) && !id.startsWith('new'));
      const fromHead = [...oh].map((i) => head[i]).filter((id) => !id.startsWith('new'));
      expect(fromHead).toEqual(fromBase);
    }
  });

  it('skip elements that are not eligible (hardened)', () => {
    const h = hashIds(['a', 'b', 'c', 'd']);
    const out = new Int32Array(4);
    const count = randomOrder(h, Uint8Array.from([1, 0, 1, 1]), seedWord(1), 0, out);
    expect(count).toBe(3);
    expect([...out.subarray(0, 3)].sort()).toEqual([0, 2, 3]);
  });

  it('put each element first about equally often (chi-square, 8 elements, 8000 realizations)', () => {
    const h = hashIds(['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h']);
    const counts = new Array(8).fill(0);
    const out = new Int32Array(8);
    for (let r = 0; r < 8000; r++) {
      randomOrder(h, null, seedWord(5), r, out);
      counts[out[0]]++;
    }
    const chi2 = counts.reduce((s, c) => s + (c - 1000) ** 2 / 1000, 0);
    // 7 degrees of freedom: P(chi2 > 24.3) = 0.001.
    expect(chi2, `first-place counts ${counts.join(',')}`).toBeLessThan(24.3);
  });

  it('rejects seeds that are not safe non-negative integers', () => {
    expect(() => seedWord(-1)).toThrow(RangeError);
    expect(() => seedWord(1.5)).toThrow(RangeError);
    expect(seedWord(2 ** 40)).not.toBe(seedWord(0));
  });

  it('hashes strings and keys to 32-bit words', () => {
    expect(hashString('a', 0)).not.toBe(hashString('b', 0));
    const k = elementKey(seedWord(1), 0, hashString('x', 0));
    expect(Number.isInteger(k) && k >= 0 && k < 2 ** 32).toBe(true);
  });
});

describe('xoshiro128**', () => {
  it('is reproducible per (seed, stream) and differs between streams', () => {
    const a = new Xoshiro128(7, 0);
    const b = new Xoshiro128(7, 0);
    const c = new Xoshiro128(7, 1);
    const xs = Array.from({ length: 5 }, () => a.nextUint32());
    expect(Array.from({ length: 5 }, () => b.nextUint32())).toEqual(xs);
    expect(Array.from({ length: 5 }, () => c.nextUint32())).not.toEqual(xs);
  });

  it('draws uniform floats: mean 0.5 and variance 1/12 within 4 standard errors (n = 100,000)', () => {
    const rng = new Xoshiro128(123);
    const n = 100_000;
    let s = 0;
    let s2 = 0;
    let outside = 0;
    for (let i = 0; i < n; i++) {
      const u = rng.nextFloat();
      if (!(u >= 0 && u < 1)) outside++;
      s += u;
      s2 += u * u;
    }
    const mean = s / n;
    expect(outside).toBe(0);
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(s2 / n - mean * mean - 1 / 12)).toBeLessThan(0.002);
  });
});
