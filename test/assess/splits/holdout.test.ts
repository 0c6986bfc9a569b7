import { describe, expect, it } from 'vitest';
import { splitHoldout } from '../../../src/assess/splits/holdout.js';
import type { Dataset } from '../../../src/table/frame.js';
import { expectFoldPartitions } from './invariants.js';

describe('splitHoldout(data, { testFraction, strata, seed })', () => {
  it('one fold; round(n × fraction) test rows; a partition of the rows', () => {
    const folds = splitHoldout(10, { testFraction: 0.3, seed: 1 });
    expect(folds).toHaveLength(1);
    expect(folds[0].test.length).toBe(3);
    expectFoldPartitions(folds, 10);
  });
  it('at least one row on each side', () => {
    expect(splitHoldout(3, { testFraction: 0.01 })[0].test.length).toBe(1);
    expect(splitHoldout(3, { testFraction: 0.99 })[0].train.length).toBe(1);
  });
  it('stratified by the class target by default: shares kept exactly when they divide', () => {
    const codes = [...Array(80).fill(0), ...Array(20).fill(1)];
    const data: Dataset = {
      features: { nRows: 100, columns: [], schema: { columns: [], fingerprint: '' } },
      target: { kind: 'class', name: 'y', codes: Int32Array.from(codes), classes: ['no', 'yes'] },
      weights: null,
    };
    const [f] = splitHoldout(data, { testFraction: 0.25, seed: 3 });
    expect([...f.test].filter((r) => codes[r] === 1).length).toBe(5);
    expect(f.test.length).toBe(25);
    const [g] = splitHoldout(data, { testFraction: 0.25, seed: 3, strata: false });
    expect(g.test.length).toBe(25);
  });
  it('largest-remainder rounding keeps the total exact across strata', () => {
    const [f] = splitHoldout(7, { testFraction: 0.5, strata: [0, 0, 0, 1, 1, 1, 2] });
    expect(f.test.length).toBe(4);
  });
  it('is deterministic under a seed', () => {
    expect(splitHoldout(40, { seed: 8 })).toEqual(splitHoldout(40, { seed: 8 }));
    expect(splitHoldout(40, { seed: 8 })[0].test).not.toEqual(splitHoldout(40, { seed: 9 })[0].test);
  });
  it('rejects a fraction outside (0, 1) and fewer than 2 rows', () => {
    for (const bad of [0, 1, -0.2, 1.5, NaN]) expect(() => splitHoldout(10, { testFraction: bad })).toThrow(/testFraction/);
    expect(() => splitHoldout(1)).toThrow(/at least 2 rows/);
    expect(() => splitHoldout(0)).toThrow(/at least 2 rows/);
  });
});
