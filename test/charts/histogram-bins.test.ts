import { describe, expect, it } from 'vitest';
import { binValues, niceStep } from '../../src/charts/histogram-bins.js';
import { createRng } from '../../src/util/rng.js';

describe('niceStep(raw)', () => {
  it('rounds up to 1, 2, 2.5 or 5 × 10^k (common practice)', () => {
    expect(niceStep(0.7)).toBe(1);
    expect(niceStep(1.3)).toBe(2);
    expect(niceStep(2.2)).toBe(2.5);
    expect(niceStep(3)).toBe(5);
    expect(niceStep(6)).toBe(10);
    expect(niceStep(0.021)).toBeCloseTo(0.025, 12);
    expect(niceStep(2)).toBe(2);
  });
});

describe('binValues(values)', () => {
  it('counts every value exactly once, in contiguous equal-width bins covering the range', () => {
    const rng = createRng(11);
    const v = Float64Array.from({ length: 5000 }, () => rng.normal() * 3 + 1);
    const bins = binValues(v);
    expect(bins.reduce((s, b) => s + b.count, 0)).toBe(5000);
    const w = bins[0].end - bins[0].start;
    for (let i = 1; i < bins.length; i++) {
      expect(bins[i].start).toBeCloseTo(bins[i - 1].end, 9);
      expect(bins[i].end - bins[i].start).toBeCloseTo(w, 9);
    }
    expect(bins[0].start).toBeLessThanOrEqual(Math.min(...v));
    expect(bins[bins.length - 1].end).toBeGreaterThanOrEqual(Math.max(...v));
    expect(bins.length).toBeGreaterThanOrEqual(5);
    expect(bins.length).toBeLessThanOrEqual(61);
  });

  it('uses the Freedman–Diaconis width 2·IQR·n^(−1/3), rounded to a nice step (Freedman & Diaconis 1981)', () => {
    // 0..999: IQR = 499.5 (linear interpolation), n = 1000 → 2·499.5/10 = 99.9 → nice step 100.
    const bins = binValues(Float64Array.from({ length: 1000 }, (_, i) => i));
    expect(bins[0].end - bins[0].start).toBe(100);
    expect(bins).toHaveLength(10);
    expect(bins.every((b) => b.count === 100)).toBe(true);
  });

  it('gives one bin for a constant sample and none for an empty one', () => {
    expect(binValues([4, 4, 4])).toEqual([{ start: 3.5, end: 4.5, count: 3 }]);
    expect(binValues([])).toEqual([]);
  });
});
