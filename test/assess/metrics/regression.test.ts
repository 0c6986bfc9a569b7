import { describe, expect, it } from 'vitest';
import { mae } from '../../../src/assess/metrics/mae.js';
import { pinballLoss } from '../../../src/assess/metrics/pinball-loss.js';
import { poissonDeviance } from '../../../src/assess/metrics/poisson-deviance.js';
import { rmse } from '../../../src/assess/metrics/rmse.js';
import { rSquared } from '../../../src/assess/metrics/r-squared.js';
import { expectClose } from '../close.js';

describe('rmse(actual, predicted, weights?) and mae(actual, predicted, weights?)', () => {
  it('by hand: errors (0, 0, 2) → rmse sqrt(4/3), mae 2/3', () => {
    expectClose(rmse([1, 2, 3], [1, 2, 5]), Math.sqrt(4 / 3));
    expectClose(mae([1, 2, 3], [1, 2, 5]), 2 / 3);
  });
  it('weights: weight 3 on the only error gives rmse sqrt(3·4/5), mae 3·2/5', () => {
    expectClose(rmse([1, 2, 3], [1, 2, 5], [1, 1, 3]), Math.sqrt(12 / 5));
    expectClose(mae([1, 2, 3], [1, 2, 5], [1, 1, 3]), 6 / 5);
  });
  it('rejects NaN and Infinity in either array, mismatched lengths, empty input', () => {
    expect(() => rmse([1, NaN], [1, 2])).toThrow(/Column "actual", row 1/);
    expect(() => mae([1, 2], [1, Infinity])).toThrow(/Column "predicted", row 1/);
    expect(() => rmse([1, 2], [1])).toThrow(/length 1; expected 2/);
    expect(() => mae([], [])).toThrow(/No rows/);
  });
});

describe('rSquared(actual, predicted, weights?)', () => {
  it('by hand: mean 2.5, SSres 1.5, SStot 5 → 0.7', () => {
    // residuals (−0.5, 0, 0.5, −1) → 0.25 + 0 + 0.25 + 1 = 1.5; deviations (−1.5, −0.5, 0.5, 1.5) → 5
    expectClose(rSquared([1, 2, 3, 4], [1.5, 2, 2.5, 5]), 0.7);
  });
  it('predicting the mean gives 0; worse gives a negative value', () => {
    expectClose(rSquared([1, 2, 3], [2, 2, 2]), 0);
    expect(rSquared([1, 2, 3], [3, 2, 1])).toBeLessThan(0);
  });
  it('weighted mean and sums: weight 2 on a row equals the row twice', () => {
    expectClose(rSquared([1, 2, 4], [1, 3, 3], [2, 1, 1]), rSquared([1, 1, 2, 4], [1, 1, 3, 3]));
  });
  it('constant actual values: NaN (undefined), also for one row', () => {
    expect(rSquared([5, 5, 5], [5, 5, 5])).toBeNaN();
    expect(rSquared([5], [4])).toBeNaN();
  });
});

describe('poissonDeviance(actual, predicted, weights?)', () => {
  it('by hand, with y ln y = 0 at y = 0', () => {
    // y=0, μ=0.5: 2(0 − (0 − 0.5)) = 1;  y=1, μ=1: 0;  y=4, μ=2: 2(4 ln 2 − 2) = 8 ln 2 − 4
    expectClose(poissonDeviance([0, 1, 4], [0.5, 1, 2]), (1 + 0 + 8 * Math.log(2) - 4) / 3);
  });
  it('equals twice the log-likelihood gap between the saturated and fitted Poisson models', () => {
    // log p(y; μ) = y ln μ − μ − ln y!; the ln y! terms cancel (McCullagh & Nelder 1989, ch. 2)
    const y = [3, 1, 0, 7], mu = [2.5, 1.5, 0.2, 6];
    let gap = 0;
    for (let i = 0; i < y.length; i++) {
      const sat = y[i] === 0 ? 0 : y[i] * Math.log(y[i]) - y[i];
      gap += 2 * (sat - (y[i] * Math.log(mu[i]) - mu[i]));
    }
    expectClose(poissonDeviance(y, mu), gap / y.length);
  });
  it('is 0 when predictions equal the counts, Infinity for μ = 0 with y > 0', () => {
    expect(poissonDeviance([0, 2, 5], [0, 2, 5])).toBe(0);
    expect(poissonDeviance([1], [0])).toBe(Infinity);
  });
  it('rejects negative counts and negative means', () => {
    expect(() => poissonDeviance([-1], [1])).toThrow(/a count >= 0/);
    expect(() => poissonDeviance([1], [-0.5])).toThrow(/a mean >= 0/);
  });
});

describe('pinballLoss(actual, predicted, tau, weights?)', () => {
  it('by hand at τ = 0.9: (0.9·2 + 0 + 0.1·3) / 3 = 0.7', () => {
    expectClose(pinballLoss([10, 10, 10], [8, 10, 13], 0.9), 0.7);
  });
  it('at τ = 0.5 is half the absolute error', () => {
    expectClose(pinballLoss([1, 4, 2], [3, 1, 2], 0.5), mae([1, 4, 2], [3, 1, 2]) / 2);
  });
  it('is smallest at the empirical τ-quantile (Koenker & Bassett 1978)', () => {
    const y = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    const loss = (q: number) => pinballLoss(y, y.map(() => q), 0.8);
    expect(loss(8)).toBeLessThan(loss(6));
    expect(loss(8)).toBeLessThan(loss(10));
  });
  it('rejects τ outside (0, 1)', () => {
    expect(() => pinballLoss([1], [1], 0)).toThrow(/tau/);
    expect(() => pinballLoss([1], [1], 1)).toThrow(/tau/);
    expect(() => pinballLoss([1], [1], NaN)).toThrow(/tau/);
  });
});
