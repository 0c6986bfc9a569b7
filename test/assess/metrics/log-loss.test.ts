import { describe, expect, it } from 'vitest';
import { logLoss, LOG_LOSS_CLIP } from '../../../src/assess/metrics/log-loss.js';
import { expectClose } from '../close.js';

describe('logLoss(actual, proba, weights?)', () => {
  it('binary, one probability per row, by hand', () => {
    // −(ln 0.9 + ln(1 − 0.2) + ln 0.6) / 3 = (0.1053605 + 0.2231436 + 0.5108256) / 3
    expectClose(logLoss([1, 0, 1], [0.9, 0.2, 0.6]), -(Math.log(0.9) + Math.log(0.8) + Math.log(0.6)) / 3);
    expectClose(logLoss([1, 0, 1], [0.9, 0.2, 0.6]), 0.27977657, 1e-8);
  });
  it('n × K probabilities take the actual class column', () => {
    // rows (0.7, 0.2, 0.1) actual 0 and (0.1, 0.3, 0.6) actual 2: (−ln 0.7 − ln 0.6) / 2 = 0.43375028
    expectClose(logLoss([0, 2], [0.7, 0.2, 0.1, 0.1, 0.3, 0.6]), 0.43375028, 1e-8);
  });
  it('n × 2 equals the one-column form', () => {
    expectClose(logLoss([1, 0, 1], [0.1, 0.9, 0.8, 0.2, 0.4, 0.6]), logLoss([1, 0, 1], [0.9, 0.2, 0.6]));
  });
  it('clips at 1e-15: a probability of 0 for the actual class costs −ln(1e-15) = 34.5388, not Infinity', () => {
    expect(LOG_LOSS_CLIP).toBe(1e-15);
    expectClose(logLoss([1], [0]), -Math.log(1e-15));
    expectClose(logLoss([1], [0]), 34.538776394910684, 1e-9);
    expect(logLoss([1], [1])).toBeLessThan(1e-14);
  });
  it('weights: weight 2 on a row equals the row twice', () => {
    expectClose(logLoss([1, 0], [0.7, 0.4], [2, 1]), logLoss([1, 1, 0], [0.7, 0.7, 0.4]));
  });
  it('rejects probabilities outside [0, 1], NaN, wrong lengths and empty input', () => {
    expect(() => logLoss([1, 0], [1.2, 0.1])).toThrow(/row 0 is 1.2/);
    expect(() => logLoss([1, 0], [NaN, 0.1])).toThrow(/Probability/);
    expect(() => logLoss([1, 0], [0.2, 0.1, 0.3])).toThrow(/length 3; expected 2/);
    expect(() => logLoss([0, 2], [0.5, 0.5])).toThrow(/length/);
    expect(() => logLoss([], [])).toThrow(/No rows/);
  });
});
