import { describe, expect, it } from 'vitest';
import { solveCholesky } from '../../../src/learn/ensemble/cholesky.js';
import { applyRidgeCombiner, fitRidgeCombiner } from '../../../src/learn/ensemble/ridge-combiner.js';
import { applyLogisticCombiner, fitLogisticCombiner } from '../../../src/learn/ensemble/logistic-combiner.js';

const ones = (n: number) => new Float64Array(n).fill(1);
const logit = (p: number) => Math.log(p / (1 - p));

describe('solveCholesky(A, b, d)', () => {
  it('solves a 3×3 SPD system (checked by multiplying back)', () => {
    const A = Float64Array.of(4, 12, -16, 12, 37, -43, -16, -43, 98); // Golub & Van Loan style example, L = [[2],[6,1],[-8,5,3]]
    const x = solveCholesky(A, Float64Array.of(1, 2, 3), 3);
    for (let i = 0; i < 3; i++) {
      let s = 0;
      for (let j = 0; j < 3; j++) s += A[i * 3 + j] * x[j];
      expect(s).toBeCloseTo([1, 2, 3][i], 10);
    }
  });
  it('throws on a matrix that is not positive definite', () => {
    expect(() => solveCholesky(Float64Array.of(1, 2, 2, 1), Float64Array.of(1, 1), 2)).toThrow(/positive definite/);
  });
});

describe('fitRidgeCombiner(X, n, p, y, w, ridge)', () => {
  it('recovers an exact linear relation when ridge → 0 (least squares normal equations)', () => {
    const n = 6, p = 2, X = new Float64Array(n * p), y = new Float64Array(n);
    for (let i = 0; i < n; i++) { X[i * 2] = i; X[i * 2 + 1] = (i * i) % 5; y[i] = 1 + 2 * X[i * 2] - 3 * X[i * 2 + 1]; }
    const c = fitRidgeCombiner(X, n, p, y, ones(n), 1e-12);
    const pred = applyRidgeCombiner(c, X, n);
    for (let i = 0; i < n; i++) expect(pred[i]).toBeCloseTo(y[i], 6);
    // slopes on the original scale: coef / scale
    expect(c.coef[0] / c.scaling.scale[0]).toBeCloseTo(2, 6);
    expect(c.coef[1] / c.scaling.scale[1]).toBeCloseTo(-3, 6);
  });
  it('shrinks towards the mean as ridge grows; a constant input gets coefficient 0', () => {
    const X = Float64Array.of(1, 5, 2, 5, 3, 5, 4, 5), y = Float64Array.of(1, 2, 3, 4);
    const big = fitRidgeCombiner(X, 4, 2, y, ones(4), 1e6);
    expect(Math.abs(big.coef[0])).toBeLessThan(1e-5);
    expect(big.intercept).toBeCloseTo(2.5, 12);
    expect(fitRidgeCombiner(X, 4, 2, y, ones(4)).coef[1]).toBe(0);
  });
});

describe('fitLogisticCombiner(X, n, p, y, K, w, ridge)', () => {
  it('one binary input: intercept = logit(p0), slope = logit(p1) − logit(p0) (closed-form MLE of a 2×2 table; common practice)', () => {
    // x = 0: 3 of 4 positive (p0 = 0.75); x = 1: 1 of 5 positive (p1 = 0.2)
    const x = [0, 0, 0, 0, 1, 1, 1, 1, 1], yy = [1, 1, 1, 0, 1, 0, 0, 0, 0];
    const c = fitLogisticCombiner(Float64Array.from(x), 9, 1, Int32Array.from(yy), 2, ones(9), 1e-10);
    const pr = applyLogisticCombiner(c, Float64Array.of(0, 1), 2);
    expect(pr[1]).toBeCloseTo(0.75, 5);
    expect(pr[3]).toBeCloseTo(0.2, 5);
    expect(logit(pr[3]) - logit(pr[1])).toBeCloseTo(logit(0.2) - logit(0.75), 4);
  });
  it('three classes: at the optimum the fitted class totals equal the observed ones (score equations; McCullagh & Nelder 1989 §4.4)', () => {
    const n = 30, X = new Float64Array(n), y = new Int32Array(n);
    for (let i = 0; i < n; i++) { X[i] = (i * 7) % 11; y[i] = X[i] < 4 ? 0 : X[i] < 8 ? (i % 3 === 0 ? 2 : 1) : 2; }
    const c = fitLogisticCombiner(X, n, 1, y, 3, ones(n), 1e-8);
    const pr = applyLogisticCombiner(c, X, n);
    for (let k = 0; k < 3; k++) {
      let fitted = 0, seen = 0;
      for (let i = 0; i < n; i++) { fitted += pr[i * 3 + k]; seen += y[i] === k ? 1 : 0; }
      expect(fitted).toBeCloseTo(seen, 3);
    }
    for (let i = 0; i < n; i++) expect(pr[i * 3] + pr[i * 3 + 1] + pr[i * 3 + 2]).toBeCloseTo(1, 12);
  });
  it('stays finite on separable data thanks to the ridge', () => {
    const c = fitLogisticCombiner(Float64Array.of(0, 1, 2, 3), 4, 1, Int32Array.of(0, 0, 1, 1), 2, ones(4));
    expect(c.theta.every(Number.isFinite)).toBe(true);
    const pr = applyLogisticCombiner(c, Float64Array.of(0, 3), 2);
    expect(pr[0]).toBeGreaterThan(0.9);
    expect(pr[3]).toBeGreaterThan(0.9);
  });
});
