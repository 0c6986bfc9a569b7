import { describe, expect, it } from 'vitest';
import {
  isNoBetterThanGuessing, sammeStepWeight, updateRowWeights, weightedError,
} from '../../../src/learn/ensemble/adaboost-weights.js';

// Hastie, Tibshirani & Friedman (2009), The Elements of Statistical Learning, 2nd ed., Algorithm 10.1
// (AdaBoost.M1), worked by hand on five rows starting from w_i = 1/5:
//   round 1: G_1 misses row 0.      err = 0.2,  α = log(0.8/0.2) = log 4 = 1.386294
//            w ← [0.2·4, 0.2, 0.2, 0.2, 0.2] = [0.8, 0.2, 0.2, 0.2, 0.2]; sum 1.6 → [0.5, 0.125, 0.125, 0.125, 0.125]
//   round 2: G_2 misses rows 1, 2.  err = 0.125 + 0.125 = 0.25, α = log(0.75/0.25) = log 3 = 1.098612
//            w ← [0.5, 0.375, 0.375, 0.125, 0.125]; sum 1.5 → [1/3, 1/4, 1/4, 1/12, 1/12]
describe('AdaBoost weights (ESL Algorithm 10.1, hand example)', () => {
  it('weightedError, sammeStepWeight(err, 2) and updateRowWeights over two rounds', () => {
    const w = new Float64Array(5).fill(0.2);
    const miss1 = Uint8Array.of(1, 0, 0, 0, 0);
    const e1 = weightedError(w, miss1);
    expect(e1).toBeCloseTo(0.2, 12);
    const a1 = sammeStepWeight(e1, 2);
    expect(a1).toBeCloseTo(Math.log(4), 12);
    expect(a1).toBeCloseTo(1.386294, 6);
    expect(updateRowWeights(w, miss1, a1)).toBeCloseTo(1.6, 12);
    expect(Array.from(w)).toEqual([0.5, 0.125, 0.125, 0.125, 0.125].map((v) => expect.closeTo(v, 12)));

    const miss2 = Uint8Array.of(0, 1, 1, 0, 0);
    const e2 = weightedError(w, miss2);
    expect(e2).toBeCloseTo(0.25, 12);
    const a2 = sammeStepWeight(e2, 2);
    expect(a2).toBeCloseTo(1.098612, 6);
    updateRowWeights(w, miss2, a2);
    expect(Array.from(w)).toEqual([1 / 3, 1 / 4, 1 / 4, 1 / 12, 1 / 12].map((v) => expect.closeTo(v, 12)));
  });

  it('β_m = α_m / 2 of ESL eq. 10.12 (the exponential-loss form)', () => {
    // eq. 10.12: β = ½ log((1 − err)/err); at err = 0.2, β = ½ log 4 = 0.693147
    expect(sammeStepWeight(0.2, 2) / 2).toBeCloseTo(0.693147, 6);
  });
});

// Zhu, Zou, Rosset & Hastie (2009), "Multi-class AdaBoost", Statistics and Its Interface 2:349–360,
// Algorithm 2 (SAMME): α = log((1 − err)/err) + log(K − 1); positive iff err < (K − 1)/K.
describe('sammeStepWeight(err, K) (SAMME, Zhu et al. 2009)', () => {
  it('adds log(K − 1) to the two-class weight', () => {
    expect(sammeStepWeight(0.4, 3)).toBeCloseTo(Math.log(1.5) + Math.log(2), 12); // = log 3
    expect(sammeStepWeight(0.4, 3)).toBeCloseTo(1.098612, 6);
    expect(sammeStepWeight(0.6, 5)).toBeCloseTo(Math.log(0.4 / 0.6) + Math.log(4), 12);
  });
  it('is zero exactly at err = (K − 1)/K, the guessing rate', () => {
    for (const K of [2, 3, 4, 10]) {
      expect(sammeStepWeight((K - 1) / K, K)).toBeCloseTo(0, 12);
      expect(isNoBetterThanGuessing((K - 1) / K, K)).toBe(true);
      expect(isNoBetterThanGuessing((K - 1) / K - 0.01, K)).toBe(false);
    }
  });
  it('stays finite at err = 0 (error floored at 1e-10)', () => {
    expect(sammeStepWeight(0, 2)).toBeCloseTo(Math.log((1 - 1e-10) / 1e-10), 9);
    expect(Number.isFinite(sammeStepWeight(0, 3))).toBe(true);
  });
});
