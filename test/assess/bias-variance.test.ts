import { describe, expect, it } from 'vitest';
import { biasVariance } from '../../src/assess/bias-variance.js';
import type { Predictions } from '../../src/learn/model.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import type { Frame } from '../../src/table/frame.js';
import { expectClose } from './close.js';
import { classData, fitMean, friedman1, predictMean, regressionData } from './fixtures.js';

const train = regressionData({ x: [0, 1, 2, 3, 4, 5, 6, 7] }, [3, 1, 4, 1, 5, 9, 2, 6]);
const test = regressionData({ x: [0, 1, 2] }, [2, 4, 6]);

describe('biasVariance(train, test, fit, settings, options) — regression', () => {
  it('mse = bias² + variance exactly (noise counted in bias² when not given)', () => {
    const rows = biasVariance(train, test, (d, s) => fitMean(d, s.scale as number), [{ scale: 1 }, { scale: 0.5 }],
      { resamples: 20, seed: 3, predict: predictMean });
    expect(rows.map((r) => r.scale)).toEqual([1, 0.5]);
    for (const r of rows) {
      expectClose((r.biasSquared as number) + (r.variance as number) + (r.noise as number), r.mse as number);
      expect(r.noiseInBias).toBe(true);
      expect(r.variance as number).toBeGreaterThan(0);
    }
    // scaling predictions by 0.5 scales their variance across resamples by 0.25 (same resamples for both)
    expectClose(rows[1].variance as number, 0.25 * (rows[0].variance as number));
  });

  it('a learner that ignores the data has zero variance and bias² = its squared error', () => {
    const [r] = biasVariance(train, test, () => ({ mean: 5 }), [{ k: 1 }], { resamples: 5, predict: predictMean });
    expect(r.variance).toBe(0);
    // (5−2)² + (5−4)² + (5−6)² = 11, over 3 rows
    expectClose(r.biasSquared as number, 11 / 3);
    expectClose(r.mse as number, 11 / 3);
  });

  it('noiseVariance is reported and subtracted from bias²', () => {
    const [a] = biasVariance(train, test, () => ({ mean: 5 }), [{ k: 1 }], { resamples: 2, predict: predictMean });
    const [b] = biasVariance(train, test, () => ({ mean: 5 }), [{ k: 1 }], { resamples: 2, predict: predictMean, noiseVariance: 1 });
    expectClose(b.biasSquared as number, (a.biasSquared as number) - 1);
    expect(b.noise).toBe(1);
    expect(b.noiseInBias).toBe(false);
  });

  it('the mean learner’s variance matches the bootstrap variance of a mean, σ̂²/n (common practice)', () => {
    // bootstrap mean of n values has variance σ̂²/n, σ̂² the population variance of the sample (Efron & Tibshirani 1993,
    // An Introduction to the Bootstrap, §5.2 — from memory); 4000 resamples keep the Monte Carlo error near 3%
    const y = [3, 1, 4, 1, 5, 9, 2, 6];
    const m = y.reduce((a, b) => a + b) / 8;
    const pop = y.reduce((a, b) => a + (b - m) ** 2, 0) / 8;
    const [r] = biasVariance(train, test, (d) => fitMean(d), [{ k: 1 }], { resamples: 4000, seed: 1, predict: predictMean });
    expect(Math.abs((r.variance as number) / (pop / 8) - 1)).toBeLessThan(0.1);
  });

  it('trees on Friedman #1: deeper trees lower bias² and raise variance; with σ² = 1 the noise is separated', () => {
    const d = friedman1(300, 11), t = friedman1(100, 12);
    const rows = biasVariance(d, t, (x, s) => fitTree(x, { depthLimit: s.depth as number }), [{ depth: 1 }, { depth: 10 }],
      { resamples: 8, seed: 5, noiseVariance: 1 });
    expect(rows[1].biasSquared as number).toBeLessThan(rows[0].biasSquared as number);
    expect(rows[1].variance as number).toBeGreaterThan(rows[0].variance as number);
    for (const r of rows) expect(r.mse as number).toBeGreaterThan(1); // noise variance 1 (Friedman 1991)
  });

  it('is deterministic under a seed and rejects bad options', () => {
    const go = () => biasVariance(train, test, (d) => fitMean(d), [{ k: 1 }], { resamples: 5, seed: 9, predict: predictMean });
    expect(go()).toEqual(go());
    const fit = (d: typeof train) => fitMean(d);
    expect(() => biasVariance(train, test, fit, [{ k: 1 }], { resamples: 1, predict: predictMean })).toThrow(/resamples/);
    expect(() => biasVariance(train, test, fit, [], { predict: predictMean })).toThrow(/settings/);
    expect(() => biasVariance(train, test, fit, [{ k: 1 }], { noiseVariance: -1, predict: predictMean })).toThrow(/noiseVariance/);
    const empty = regressionData({ x: [] }, []);
    expect(() => biasVariance(empty, test, fit, [{ k: 1 }], { predict: predictMean })).toThrow(/No rows/);
    const cls = classData({ x: [0, 1] }, [0, 1], ['a', 'b']);
    expect(() => biasVariance(train, cls, fit, [{ k: 1 }], { predict: predictMean })).toThrow(/differ in kind/);
  });
});

describe('biasVariance(train, test, fit, settings, options) — classification (Domingos 2000)', () => {
  // A fake classifier that predicts class 1 for every row on resamples 0, 3, 6, ... and class 0 otherwise.
  const fake = (_d: unknown, _s: unknown, ctx: { resample: number }) => ctx.resample % 3 === 0 ? 1 : 0;
  const predict = (c: number, frame: Frame): Predictions => ({
    task: 'classification', n: frame.nRows, value: new Float64Array(frame.nRows).fill(c), proba: new Float64Array(0), classes: ['a', 'b', 'c'],
  });

  it('two classes by hand: loss = bias + netVariance', () => {
    // predictions per row over 3 resamples: 1, 0, 0 → main prediction 0, variance 1/3 on each row.
    // row y = 0: unbiased, loss 1/3; row y = 1: biased, loss 2/3 = 1 − 1/3 (c = −1)
    // loss 1/2, bias 1/2, variance 1/3, unbiased part 1/6, biased part 1/6, net 0
    const trainC = classData({ x: [0, 1, 2, 3] }, [0, 1, 0, 1], ['a', 'b']);
    const testC = classData({ x: [0, 1] }, [0, 1], ['a', 'b']);
    const [r] = biasVariance(trainC, testC, fake, [{ k: 1 }], { resamples: 3, predict });
    expectClose(r.loss as number, 0.5);
    expectClose(r.bias as number, 0.5);
    expectClose(r.variance as number, 1 / 3);
    expectClose(r.unbiasedVariance as number, 1 / 6);
    expectClose(r.biasedVariance as number, 1 / 6);
    expectClose(r.netVariance as number, 0);
  });

  it('three classes: a biased row’s variance counts only in proportion to P(ŷ = y | ŷ ≠ main)', () => {
    // row y = 2: predictions 1, 0, 0 → main 0 ≠ y, variance 1/3, P(ŷ = 2) = 0 → loss 1, bias 1, biased part 0
    const trainC = classData({ x: [0, 1, 2] }, [0, 1, 2], ['a', 'b', 'c']);
    const testC = classData({ x: [0] }, [2], ['a', 'b', 'c']);
    const [r] = biasVariance(trainC, testC, fake, [{ k: 1 }], { resamples: 3, predict });
    expectClose(r.loss as number, 1);
    expectClose(r.bias as number, 1);
    expectClose(r.variance as number, 1 / 3);
    expectClose(r.biasedVariance as number, 0);
    expectClose((r.bias as number) + (r.netVariance as number), r.loss as number);
  });
});
