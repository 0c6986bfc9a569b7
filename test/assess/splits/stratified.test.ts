import { describe, expect, it } from 'vitest';
import { splitStratified } from '../../../src/assess/splits/stratified.js';
import type { Dataset } from '../../../src/table/frame.js';
import { expectEachRowTestedOnce, expectFoldPartitions } from './invariants.js';

function classData(codes: number[]): Dataset {
  const n = codes.length;
  return {
    features: { nRows: n, columns: [{ name: 'x', kind: 'numeric', values: Float64Array.from(codes.keys()) }], schema: { columns: [{ name: 'x', kind: 'numeric' }], fingerprint: '' } },
    target: { kind: 'class', name: 'y', codes: Int32Array.from(codes), classes: ['a', 'b', 'c'] },
    weights: null,
  };
}

describe('splitStratified(data, { k, strata, seed })', () => {
  // 37 rows: 25 of class 0, 9 of class 1, 3 of class 2 (imbalanced on purpose)
  const codes = [...Array(25).fill(0), ...Array(9).fill(1), ...Array(3).fill(2)];
  const data = classData(codes);

  it('each fold holds within one row of (class count)/k of each class (the stratification guarantee)', () => {
    const k = 4;
    const folds = splitStratified(data, { k, seed: 2 });
    expectFoldPartitions(folds, codes.length);
    expectEachRowTestedOnce(folds, codes.length);
    for (const f of folds) {
      for (const [c, total] of [[0, 25], [1, 9], [2, 3]]) {
        const inFold = [...f.test].filter((r) => codes[r] === c).length;
        expect(Math.abs(inFold - total / k)).toBeLessThan(1);
      }
    }
    const sizes = folds.map((f) => f.test.length);
    expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
  });
  it('strata may be given as values for a row count', () => {
    const folds = splitStratified(6, { k: 2, strata: ['u', 'u', 'v', 'v', 'w', 'w'] });
    for (const f of folds) expect(f.test.length).toBe(3);
    for (const f of folds) expect(new Set([...f.test].map((r) => Math.floor(r / 2))).size).toBe(3);
  });
  it('is deterministic under a seed', () => {
    expect(splitStratified(data, { seed: 5 })).toEqual(splitStratified(data, { seed: 5 }));
  });
  it('one class only still splits (every fold gets its share)', () => {
    const folds = splitStratified(classData([1, 1, 1, 1]), { k: 2 });
    expect(folds.map((f) => f.test.length)).toEqual([2, 2]);
  });
  it('needs a class target or strata; missing strata values and wrong lengths are errors', () => {
    expect(() => splitStratified(10)).toThrow(/strata/);
    expect(() => splitStratified(3, { k: 2, strata: ['a', null, 'b'] })).toThrow(/row 1/);
    expect(() => splitStratified(3, { k: 2, strata: ['a', 'b'] })).toThrow(/strata has length 2; expected 3/);
    expect(() => splitStratified(data, { strata: 'nope' })).toThrow(/Column "nope" is missing/);
  });
});
