import { describe, expect, it } from 'vitest';
import { splitFolds } from '../../../src/assess/splits/k-fold.js';
import { expectEachRowTestedOnce, expectFoldPartitions } from './invariants.js';

describe('splitFolds(data, { k, shuffle, seed })', () => {
  it('k folds partition the rows; every row tested once; sizes differ by at most one', () => {
    const folds = splitFolds(23, { k: 5, seed: 4 });
    expect(folds.map((f) => f.fold)).toEqual([0, 1, 2, 3, 4]);
    expectFoldPartitions(folds, 23);
    expectEachRowTestedOnce(folds, 23);
    const sizes = folds.map((f) => f.test.length);
    expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
    expect(sizes.reduce((a, b) => a + b)).toBe(23);
  });
  it('is deterministic under a seed and differs across seeds', () => {
    expect(splitFolds(50, { seed: 9 })).toEqual(splitFolds(50, { seed: 9 }));
    expect(splitFolds(50, { seed: 9 })[0].test).not.toEqual(splitFolds(50, { seed: 10 })[0].test);
  });
  it('shuffle false keeps contiguous blocks in row order', () => {
    expect(splitFolds(7, { k: 3, shuffle: false }).map((f) => [...f.test])).toEqual([[0, 1], [2, 3], [4, 5, 6]]);
  });
  it('k = rows gives leave-one-out', () => {
    const folds = splitFolds(4, { k: 4 });
    expect(folds.every((f) => f.test.length === 1 && f.train.length === 3)).toBe(true);
  });
  it('rejects k < 2, k > rows, non-integer k, and an empty table', () => {
    expect(() => splitFolds(10, { k: 1 })).toThrow(/Option k = 1 is invalid/);
    expect(() => splitFolds(3, { k: 4 })).toThrow(/at most 3 \(the number of rows\)/);
    expect(() => splitFolds(10, { k: 2.5 })).toThrow(/integer >= 2/);
    expect(() => splitFolds(0)).toThrow(/at most 0/);
    expect(() => splitFolds(-1)).toThrow(/rows/);
  });
});
