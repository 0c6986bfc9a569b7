import { describe, expect, it } from 'vitest';
import { drawBootstrapCounts } from '../../../src/learn/ensemble/bootstrap.js';
import { derive } from '../../../src/util/rng.js';

// Chance that a given row is in a bootstrap sample: 1 − (1 − 1/n)^n.
// Values: James, Witten, Hastie & Tibshirani (2013), An Introduction to Statistical Learning, Ex. 5.4.2;
// Hastie, Tibshirani & Friedman (2009), The Elements of Statistical Learning, 2nd ed., eq. 7.55.
const published: [number, number][] = [[10, 0.651322], [100, 0.633968], [1000, 0.632305]];

describe('drawBootstrapCounts(n, rng)', () => {
  for (const [n, expected] of published) {
    it(`distinct fraction at n = ${n} matches 1 − (1 − 1/n)^n = ${expected} within 4 standard errors`, () => {
      expect(1 - (1 - 1 / n) ** n).toBeCloseTo(expected, 6);
      const reps = Math.round(200_000 / n);
      const fr: number[] = [];
      for (let r = 0; r < reps; r++) {
        const c = drawBootstrapCounts(n, derive(11, n, r));
        let distinct = 0, total = 0;
        for (const v of c) { if (v > 0) distinct++; total += v; }
        expect(total).toBe(n);
        fr.push(distinct / n);
      }
      const mean = fr.reduce((a, b) => a + b, 0) / reps;
      const sd = Math.sqrt(fr.reduce((a, b) => a + (b - mean) ** 2, 0) / (reps - 1));
      const se = sd / Math.sqrt(reps);
      console.info(`[bootstrap] n = ${n}: distinct fraction ${mean.toFixed(6)} (expected ${expected}, se ${se.toExponential(2)}, ${reps} samples)`);
      // tolerance: 4 standard errors of the mean over `reps` independent samples
      expect(Math.abs(mean - expected)).toBeLessThan(4 * se);
    });
  }

  it('is deterministic under a seed and differs between seeds', () => {
    expect(drawBootstrapCounts(50, derive(3, 1))).toEqual(drawBootstrapCounts(50, derive(3, 1)));
    expect(drawBootstrapCounts(50, derive(3, 1))).not.toEqual(drawBootstrapCounts(50, derive(3, 2)));
  });

  it('n = 1 draws the single row once; n = 0 is an error', () => {
    expect(Array.from(drawBootstrapCounts(1, derive(1)))).toEqual([1]);
    expect(() => drawBootstrapCounts(0, derive(1))).toThrow(/n = 0/);
  });
});
