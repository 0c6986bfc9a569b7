import { describe, expect, it } from 'vitest';
import { createRng, derive, deriveSeed, shuffleInPlace } from '../../src/util/rng.js';

describe('createRng(seed)', () => {
  it('repeats the same sequence for the same seed and differs for another', () => {
    const a = createRng(7), b = createRng(7), c = createRng(8);
    const sa = Array.from({ length: 5 }, () => a.nextU32());
    const sb = Array.from({ length: 5 }, () => b.nextU32());
    const sc = Array.from({ length: 5 }, () => c.nextU32());
    expect(sa).toEqual(sb);
    expect(sa).not.toEqual(sc);
  });

  it('next() is uniform on [0, 1): mean 1/2, variance 1/12 (common practice)', () => {
    const r = createRng(1);
    const n = 200_000;
    let s = 0, s2 = 0;
    for (let i = 0; i < n; i++) { const x = r.next(); expect(x >= 0 && x < 1).toBe(true); s += x; s2 += x * x; }
    const mean = s / n, v = s2 / n - mean * mean;
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(v - 1 / 12)).toBeLessThan(0.002);
  });

  it('int(n) covers 0..n-1 evenly (chi-square, 9 df, 0.999 quantile 27.88)', () => {
    const r = createRng(3);
    const counts = new Array(10).fill(0);
    const n = 100_000;
    for (let i = 0; i < n; i++) counts[r.int(10)]++;
    const chi = counts.reduce((acc, c) => acc + (c - n / 10) ** 2 / (n / 10), 0);
    expect(chi).toBeLessThan(27.88);
  });

  it('normal() has mean 0 and variance 1', () => {
    const r = createRng(11);
    const n = 100_000;
    let s = 0, s2 = 0;
    for (let i = 0; i < n; i++) { const x = r.normal(); s += x; s2 += x * x; }
    expect(Math.abs(s / n)).toBeLessThan(0.02);
    expect(Math.abs(s2 / n - 1)).toBeLessThan(0.03);
  });

  it('rejects a non-finite seed', () => {
    expect(() => createRng(NaN)).toThrow(/seed/);
  });
});

describe('derive(seed, ...ids)', () => {
  it('depends on seed and ids only, and ids are order-sensitive', () => {
    expect(deriveSeed(5, 1, 2)).toBe(deriveSeed(5, 1, 2));
    expect(deriveSeed(5, 1, 2)).not.toBe(deriveSeed(5, 2, 1));
    expect(derive(5, 3).nextU32()).toBe(derive(5, 3).nextU32());
  });
});

describe('shuffleInPlace(rng, a)', () => {
  it('is a permutation and repeatable under a seed', () => {
    const a = shuffleInPlace(createRng(2), Array.from({ length: 50 }, (_, i) => i));
    const b = shuffleInPlace(createRng(2), Array.from({ length: 50 }, (_, i) => i));
    expect(a).toEqual(b);
    expect([...a].sort((x, y) => x - y)).toEqual(Array.from({ length: 50 }, (_, i) => i));
  });
});
