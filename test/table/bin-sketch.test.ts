import { describe, expect, it } from 'vitest';
import { QuantileSketch } from '../../src/table/bin-sketch.js';
import { createRng } from '../../src/util/rng.js';

// Karnin, Lang & Liberty (2016), "Optimal quantile approximation in streams", FOCS: the KLL sketch's rank
// error is O(n/k) with high probability. With k = 800 we allow 1% of n (a margin several times the
// paper's constant-free bound 1/k = 0.125%; the generator is seeded, so the checks are deterministic).
const TOL = 0.01;

describe('QuantileSketch', () => {
  it('quantile(q) of a shuffled 0..n-1 is within 1% of q·n', () => {
    const n = 200_000, rng = createRng(7);
    const xs = Float64Array.from({ length: n }, (_, i) => i);
    for (let i = n - 1; i > 0; i--) { const j = rng.int(i + 1); const t = xs[i]; xs[i] = xs[j]; xs[j] = t; }
    const s = new QuantileSketch(800);
    s.updateAll(xs);
    expect(s.count).toBe(n);
    for (const q of [0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.99]) {
      expect(Math.abs(s.quantile(q) - q * n)).toBeLessThan(TOL * n);
    }
    // the sketch stays small: about 3k items (the paper's geometric capacities sum to k / (1 - 2/3))
    expect(s.items().values.length).toBeLessThan(3 * 800 + 50);
  });

  it('items() weights sum to the count, values sorted', () => {
    const s = new QuantileSketch(16);
    for (let i = 0; i < 1000; i++) s.update((i * 7919) % 1000);
    const { values, weights } = s.items();
    expect(weights.reduce((a, b) => a + b, 0)).toBe(1000);
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeGreaterThanOrEqual(values[i - 1]);
  });

  it('merge(other) answers like one sketch over both streams', () => {
    const a = new QuantileSketch(400, 1), b = new QuantileSketch(400, 2);
    for (let i = 0; i < 50_000; i++) a.update(i);
    for (let i = 50_000; i < 150_000; i++) b.update(i);
    a.merge(b);
    expect(a.count).toBe(150_000);
    expect(b.count).toBe(100_000);
    for (const q of [0.1, 1 / 3, 0.5, 0.9]) expect(Math.abs(a.quantile(q) - q * 150_000)).toBeLessThan(TOL * 150_000);
    expect(Math.abs(a.rank(75_000) - 75_001)).toBeLessThan(TOL * 150_000);
  });

  it('update(x) ignores NaN; an empty sketch has NaN quantiles', () => {
    const s = new QuantileSketch();
    s.update(NaN);
    expect(s.count).toBe(0);
    expect(s.quantile(0.5)).toBeNaN();
    s.update(3);
    expect(s.quantile(0)).toBe(3);
    expect(s.quantile(1)).toBe(3);
  });

  it('is deterministic: same values, same seed, same items', () => {
    const run = () => { const s = new QuantileSketch(32, 9); for (let i = 0; i < 5000; i++) s.update(Math.sin(i)); return s.items(); };
    expect(run()).toEqual(run());
  });

  it('new QuantileSketch(k) rejects k < 8', () => {
    expect(() => new QuantileSketch(4)).toThrow(/sketchK/);
  });
});
