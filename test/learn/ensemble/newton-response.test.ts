import { describe, expect, it } from 'vitest';
import { fitBoosting } from '../../../src/learn/ensemble/boosting.js';
import { curvatureFloor, newtonResponse } from '../../../src/learn/ensemble/newton-response.js';
import { boostingScores } from '../../../src/learn/ensemble/predict-boosting.js';
import { sigmoid } from '../../../src/learn/ensemble/loss/logistic.js';
import { classTarget, datasetOf, friedman1, frameOf, numberTarget } from './fixtures.js';

const json = (v: unknown) => JSON.stringify(v);

/** Best threshold between consecutive x (sorted, distinct) by the score Σ_side a² / b, sides L and R. */
function bestThreshold(x: number[], a: number[], b: number[]): number {
  let best = -Infinity, at = NaN;
  for (let s = 1; s < x.length; s++) {
    const sum = (v: number[], from: number, to: number) => v.slice(from, to).reduce((p, q) => p + q, 0);
    const score = sum(a, 0, s) ** 2 / sum(b, 0, s) + sum(a, s, x.length) ** 2 / sum(b, s, x.length);
    if (score > best + 1e-12) { best = score; at = (x[s - 1] + x[s]) / 2; }
  }
  return at;
}

describe('newtonResponse(num, den, w, z, v)', () => {
  it('z = num/h and weights w·h, h floored at curvatureFloor; rows of weight 0 get 0', () => {
    const z = new Float64Array(4), v = new Float64Array(4);
    newtonResponse(Float64Array.of(0.5, -0.2, 1, 3), Float64Array.of(0.25, 0.16, 0, 2), Float64Array.of(2, 1, 1, 0), z, v);
    expect(Array.from(z)).toEqual([2, -1.25, 1 / curvatureFloor, 0]);
    expect(Array.from(v)).toEqual([0.5, 0.16, curvatureFloor, 0]);
  });
});

describe('fitBoosting(data, { newtonTrees })', () => {
  it('round 2 splits where (Σg)²/Σh is largest, the gradient tree where (Σr)²/n is (Friedman, Hastie & Tibshirani 2000, LogitBoost)', () => {
    // y = 0 0 0 0 0 1 1 0 0 1 on x = 1..10; η = 1, stumps. Both fits share round 1 (h is constant at F_0).
    const x = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10], labels = [0, 0, 0, 0, 0, 1, 1, 0, 0, 1];
    const f = frameOf({ x });
    const data = datasetOf(f, classTarget('c', labels.map((v) => (v ? 'b' : 'a'))));
    const o = { rounds: 2, depthLimit: 1, learningRate: 1 };
    const grad = fitBoosting(data, o), newton = fitBoosting(data, { ...o, newtonTrees: true });
    expect(newton.trees[0].threshold[0]).toBe(grad.trees[0].threshold[0]);
    const F1 = boostingScores(grad, f, 1);
    const p = Array.from(F1, sigmoid);
    const r = labels.map((y, i) => y - p[i]), h = p.map((q) => q * (1 - q));
    const newtonAt = bestThreshold(x, r, h), gradAt = bestThreshold(x, r, x.map(() => 1));
    expect(newtonAt).not.toBe(gradAt); // this data tells the two rules apart
    expect(newton.trees[1].threshold[0]).toBe(newtonAt);
    expect(grad.trees[1].threshold[0]).toBe(gradAt);
    // leaves are Newton steps Σr/Σh either way
    const left = x.map((v) => v <= newtonAt);
    const step = (side: boolean) => r.reduce((s, v, i) => s + (left[i] === side ? v : 0), 0) / h.reduce((s, v, i) => s + (left[i] === side ? v : 0), 0);
    const F2 = boostingScores(newton, f, 2);
    expect(F2[0] - F1[0]).toBeCloseTo(step(true), 12);
    expect(F2[9] - F1[9]).toBeCloseTo(step(false), 12);
  });

  it("loss 'squared': the hessian is 1, so the model is the gradient model (only the setting differs)", () => {
    const d = friedman1(200, 4);
    const a = fitBoosting(d, { rounds: 5, depthLimit: 2 }), b = fitBoosting(d, { rounds: 5, depthLimit: 2, newtonTrees: true });
    expect(json(b.trees)).toBe(json(a.trees));
    expect(b.trainLoss).toEqual(a.trainLoss);
    expect(b.settings.newtonTrees).toBe(true);
    expect(a.settings.newtonTrees).toBeUndefined();
  });

  it('rejects losses without a usable second derivative, and non-booleans', () => {
    const d = datasetOf(frameOf({ x: [1, 2, 3] }), numberTarget('y', [1, 2, 4]));
    expect(() => fitBoosting(d, { loss: 'absolute', newtonTrees: true })).toThrow(/newtonTrees.*'absolute'/);
    expect(() => fitBoosting(d, { loss: 'huber', newtonTrees: true })).toThrow(/newtonTrees/);
    expect(() => fitBoosting(d, { newtonTrees: 1 as never })).toThrow(/newtonTrees/);
    expect(fitBoosting(d, { loss: 'absolute', newtonTrees: false }).trees.length).toBe(100);
  });

  it('saturated probabilities (one class present) stay finite', () => {
    const f = frameOf({ x: [1, 2, 3, 4] });
    const m = fitBoosting(datasetOf(f, classTarget('c', ['b', 'b', 'b', 'b'], ['a', 'b'])), { rounds: 30, learningRate: 1, newtonTrees: true });
    expect(boostingScores(m, f).every(Number.isFinite)).toBe(true);
  });
});
