import { describe, expect, it } from 'vitest';
import { brierScore } from '../../../src/assess/metrics/brier-score.js';
import { expectClose } from '../close.js';

describe('brierScore(actual, proba, weights?)', () => {
  it('binary, one column: ((0.1)² + (0.2)² + (0.4)²) / 3 = 0.07', () => {
    expectClose(brierScore([1, 0, 1], [0.9, 0.2, 0.6]), 0.07);
  });
  it('n × K sums over classes (Brier 1950): rows 0.14 and 0.26, mean 0.2', () => {
    // (0.7−1)² + 0.2² + 0.1² = 0.14; 0.1² + 0.3² + (0.6−1)² = 0.26
    expectClose(brierScore([0, 2], [0.7, 0.2, 0.1, 0.1, 0.3, 0.6]), 0.2);
  });
  it('two classes as n × 2 give exactly twice the one-column form (the stated convention)', () => {
    expectClose(brierScore([1, 0, 1], [0.1, 0.9, 0.8, 0.2, 0.4, 0.6]), 2 * 0.07);
  });
  it('perfect forecasts score 0; certain wrong forecasts 1 (one column) and 2 (sum over classes)', () => {
    expect(brierScore([1, 0], [1, 0])).toBe(0);
    expect(brierScore([1, 0], [0, 1])).toBe(1);
    expect(brierScore([1, 0], [1, 0, 0, 1])).toBe(2);
  });
  it('rejects probabilities outside [0, 1] and empty input', () => {
    expect(() => brierScore([1], [-0.1])).toThrow(/Probability at row 0/);
    expect(() => brierScore([], [])).toThrow(/No rows/);
  });
});
