import { describe, expect, it } from 'vitest';
import { boundsFromDistinct, distinctUpTo, equalCountCuts, midpoint, numericBounds } from '../../src/table/bin-edges.js';

const opts = { limit: 255, exactRows: 1 << 20, sketchK: 800 };

describe('midpoint(a, b)', () => {
  it('is (a + b) / 2 and stays below b for neighbouring doubles', () => {
    expect(midpoint(1, 2)).toBe(1.5);
    const b = 1 + Number.EPSILON;
    expect(midpoint(1, b)).toBe(1);
    expect(midpoint(Number.MAX_VALUE / 2, Number.MAX_VALUE)).toBeLessThan(Number.MAX_VALUE);
    expect(midpoint(-Number.MAX_VALUE, Number.MAX_VALUE)).toBe(0);
  });
});

describe('distinctUpTo(values, limit)', () => {
  it('returns sorted distinct values, ignoring NaN, or null past the limit', () => {
    expect(Array.from(distinctUpTo(Float64Array.of(3, NaN, 1, 3, 2), 3)!)).toEqual([1, 2, 3]);
    expect(distinctUpTo(Float64Array.of(3, 1, 2), 2)).toBeNull();
    expect(distinctUpTo(new Float64Array(0), 2)!.length).toBe(0);
  });
});

describe('equalCountCuts(weights, limit)', () => {
  it('cuts at equal shares of the weight left (hand-computed)', () => {
    // total 8, limit 4 -> targets 2, 4, 6
    expect(equalCountCuts(Float64Array.of(1, 1, 1, 1, 1, 1, 1, 1), 4)).toEqual([1, 3, 5]);
    // a heavy value takes its own share; the rest is split among the bins left
    expect(equalCountCuts(Float64Array.of(1, 5, 1, 1), 4)).toEqual([1, 2]);
    expect(equalCountCuts(Float64Array.of(10), 4)).toEqual([]);
  });
});

describe('numericBounds(values, opts)', () => {
  it('one bin per distinct value with midpoint bounds (the exact grower candidates)', () => {
    expect(Array.from(numericBounds(Float64Array.of(1, 2, 2, 5, NaN), opts))).toEqual([1.5, 3.5, Infinity]);
  });

  it('an all-missing or empty column has one bin', () => {
    expect(Array.from(numericBounds(Float64Array.of(NaN, NaN), opts))).toEqual([Infinity]);
    expect(Array.from(numericBounds(new Float64Array(0), opts))).toEqual([Infinity]);
    expect(Array.from(boundsFromDistinct(Float64Array.of(4)))).toEqual([Infinity]);
  });

  it('many distinct values: at most limit bins of near-equal counts', () => {
    const xs = Float64Array.from({ length: 10_000 }, (_, i) => i);
    const u = numericBounds(xs, { ...opts, limit: 10 });
    expect(u.length).toBe(10);
    expect(Array.from(u.subarray(0, 9))).toEqual([999.5, 1999.5, 2999.5, 3999.5, 4999.5, 5999.5, 6999.5, 7999.5, 8999.5]);
  });

  it('sketch path (more rows than exactRows) gives bins within 1% of equal counts', () => {
    const n = 100_000;
    const xs = Float64Array.from({ length: n }, (_, i) => (i * 7919) % n);
    const u = numericBounds(xs, { limit: 50, exactRows: 1000, sketchK: 800 });
    expect(u.length).toBe(50);
    // bound b should sit near the (b+1)/50 quantile, i.e. near (b+1)·2000 - 1 (KLL rank error, see bin-sketch test)
    for (let b = 0; b < 49; b++) expect(Math.abs(u[b] - ((b + 1) * 2000 - 1))).toBeLessThan(0.01 * n);
    expect(u[49]).toBe(Infinity);
  });
});
