import { describe, expect, it } from 'vitest';
import { splitByTime } from '../../../src/assess/splits/time-ordered.js';

describe('splitByTime(data, { k, order })', () => {
  it('expanding window: train on the past, test on the next block', () => {
    // rows are given out of time order on purpose
    const order = [5, 0, 3, 1, 4, 2, 7, 6, 8];
    const folds = splitByTime(9, { k: 2, order });
    for (const f of folds) {
      const lastTrain = Math.max(...[...f.train].map((r) => order[r]));
      const firstTest = Math.min(...[...f.test].map((r) => order[r]));
      expect(lastTrain).toBeLessThan(firstTest);
    }
    expect(folds[0].train.length).toBe(3);
    expect(folds[1].train.length).toBe(6);
    expect([...folds[0].test].map((r) => order[r]).sort()).toEqual([3, 4, 5]);
    expect(folds[1].train.length).toBe(folds[0].train.length + folds[0].test.length);
  });
  it('keeps ties together: rows with the same time are never split across train and test', () => {
    const order = [1, 1, 1, 2, 2, 3, 3, 3, 3, 4, 5, 5];
    const folds = splitByTime(order.length, { k: 3, order });
    for (const f of folds) {
      const trainTimes = new Set([...f.train].map((r) => order[r]));
      for (const r of f.test) expect(trainTimes.has(order[r])).toBe(false);
      expect(f.test.length).toBeGreaterThan(0);
    }
  });
  it('falls back to an earlier period boundary when a long last period swallows the target', () => {
    const order = [1, 2, 3, 3, 3, 3, 3, 3, 3, 3];
    const folds = splitByTime(order.length, { k: 2, order });
    expect(folds.map((f) => [...f.test].map((r) => order[r])[0])).toEqual([2, 3]);
  });
  it('accepts dates', () => {
    const order = ['2024-01-01', '2024-03-01', '2024-02-01', '2024-04-01'].map((d) => new Date(d));
    const folds = splitByTime(4, { k: 3, order });
    expect(folds.map((f) => [...f.test])).toEqual([[2], [1], [3]]);
  });
  it('rejects too few distinct times, missing times and a categorical order column', () => {
    expect(() => splitByTime(4, { k: 3, order: [1, 1, 2, 2] })).toThrow(/Option k = 3/);
    expect(() => splitByTime(3, { k: 2, order: [1, NaN, 2] })).toThrow(/row 1/);
    const frame = {
      nRows: 3,
      columns: [{ name: 'm', kind: 'categorical' as const, codes: Int32Array.of(0, 1, 2), categories: ['a', 'b', 'c'] }],
      schema: { columns: [], fingerprint: '' },
    };
    expect(() => splitByTime(frame, { k: 2, order: 'm' })).toThrow(/numeric or date column/);
  });
});
