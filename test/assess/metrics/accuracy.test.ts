import { describe, expect, it } from 'vitest';
import { accuracy } from '../../../src/assess/metrics/accuracy.js';
import { balancedAccuracy } from '../../../src/assess/metrics/balanced-accuracy.js';
import { CoppiceError } from '../../../src/errors.js';
import { expectClose } from '../close.js';

describe('accuracy(actual, predicted, weights?)', () => {
  it('is the share of matching codes (hand count: 4 of 6)', () => {
    expectClose(accuracy([0, 0, 0, 0, 1, 1], [0, 0, 0, 1, 1, 0]), 4 / 6);
  });
  it('weights rows: weight 3 on the one miss gives 1 / (1 + 3)', () => {
    expectClose(accuracy([0, 1], [0, 0], Float64Array.of(1, 3)), 0.25);
  });
  it('one row, one class: 1 or 0', () => {
    expect(accuracy([2], [2])).toBe(1);
    expect(accuracy([2], [0])).toBe(0);
  });
  it('rejects empty input, a length mismatch, negative codes and bad weights', () => {
    expect(() => accuracy([], [])).toThrow(/No rows/);
    expect(() => accuracy([0, 1], [0])).toThrow(/predicted has length 1; expected 2/);
    expect(() => accuracy([0, -1], [0, 0])).toThrow(CoppiceError);
    expect(() => accuracy([0, NaN], [0, 0])).toThrow(/class code/);
    expect(() => accuracy([0, 1], [0, 1], [1, -1])).toThrow(/weights/);
    expect(() => accuracy([0, 1], [0, 1], [0, 0])).toThrow(/positive total weight/);
    expect(() => accuracy([0, 1], [0, 1], [1])).toThrow(/weights has length 1/);
  });
});

describe('balancedAccuracy(actual, predicted, weights?)', () => {
  it('is the mean per-class recall: (3/4 + 1/2) / 2 = 0.625 (Brodersen et al. 2010 definition)', () => {
    expectClose(balancedAccuracy([0, 0, 0, 0, 1, 1], [0, 0, 0, 1, 1, 0]), 0.625);
  });
  it('a majority-class guess scores 1/K, whatever the imbalance', () => {
    expectClose(balancedAccuracy([0, 0, 0, 0, 0, 0, 0, 1, 2], [0, 0, 0, 0, 0, 0, 0, 0, 0]), 1 / 3);
  });
  it('leaves out classes absent from actual (code 1 missing: mean over classes 0 and 2)', () => {
    expectClose(balancedAccuracy([0, 2, 2], [0, 2, 1]), (1 + 0.5) / 2);
  });
  it('with equal class weights equals accuracy', () => {
    expectClose(balancedAccuracy([0, 0, 1, 1], [0, 1, 1, 1]), accuracy([0, 0, 1, 1], [0, 1, 1, 1]));
  });
  it('rejects empty input', () => {
    expect(() => balancedAccuracy([], [])).toThrow(/No rows/);
  });
});
