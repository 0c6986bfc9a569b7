import { describe, expect, it } from 'vitest';
import { selectKth } from '../../../src/learn/ensemble/select-kth.js';
import { allRows, weightedQuantile } from '../../../src/learn/ensemble/weighted-quantile.js';
import { createRng } from '../../../src/util/rng.js';

describe('selectKth(a, m, k)', () => {
  it('returns the k-th smallest for every k, with ties, on seeded random arrays (checked against a sort)', () => {
    const rng = createRng(12);
    for (let trial = 0; trial < 60; trial++) {
      const m = 1 + rng.int(40);
      const base = Float64Array.from({ length: m }, () => rng.int(8) - 3 + (rng.next() < 0.2 ? 0.5 : 0));
      const sorted = Array.from(base).sort((x, y) => x - y);
      for (let k = 1; k <= m; k++) expect(selectKth(Float64Array.from(base), m, k)).toBe(sorted[k - 1]);
    }
  });
  it('works on a prefix of a longer buffer and on one element', () => {
    expect(selectKth(Float64Array.of(5, 1, 4, 2, 3, -100), 5, 2)).toBe(2);
    expect(selectKth(Float64Array.of(7), 1, 1)).toBe(7);
  });
});

describe('weightedQuantile(values, weights, rows, start, end, tau) with weights 0 and 1', () => {
  // Unit weights: the lower quantile is the ⌈τ·c⌉-th order statistic of the c rows kept, the inverse of the
  // empirical distribution function (Hyndman & Fan 1996, "Sample quantiles in statistical packages", The
  // American Statistician 50(4):361–365, definition 1).
  it('equals the ⌈τ·c⌉-th order statistic of the kept rows (seeded random data, many τ)', () => {
    const rng = createRng(3);
    for (let trial = 0; trial < 40; trial++) {
      const n = 1 + rng.int(30);
      const v = Float64Array.from({ length: n }, () => Math.round(rng.normal() * 4) / 2);
      const w = Float64Array.from({ length: n }, () => (rng.next() < 0.3 ? 0 : 1));
      const kept = Array.from(v).filter((_, i) => w[i] === 1).sort((a, b) => a - b);
      for (const tau of [0.01, 0.1, 0.25, 0.5, 0.8, 0.9, 1]) {
        const got = weightedQuantile(v, w, allRows(n), 0, n, tau);
        if (kept.length === 0) expect(got).toBeNaN();
        // + 0 maps −0 to 0: the two are the same number, and either may come first among ties
        else expect(got + 0).toBe(kept[Math.min(kept.length, Math.max(1, Math.ceil(tau * kept.length))) - 1] + 0);
      }
    }
  });
  it('agrees with the general rule when weights are not all 0 or 1 but scale to it', () => {
    // weights 2 and 0 give the same quantile as weights 1 and 0 (the rule depends on weight shares)
    const v = Float64Array.of(4, -1, 7, 2, 2, 9), rows = allRows(6);
    const ones = Float64Array.of(1, 0, 1, 1, 1, 1), twos = Float64Array.of(2, 0, 2, 2, 2, 2);
    for (const tau of [0.2, 0.5, 0.75, 1]) expect(weightedQuantile(v, twos, rows, 0, 6, tau)).toBe(weightedQuantile(v, ones, rows, 0, 6, tau));
  });
});
