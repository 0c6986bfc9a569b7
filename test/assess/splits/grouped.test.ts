import { describe, expect, it } from 'vitest';
import { splitGrouped } from '../../../src/assess/splits/grouped.js';
import type { Frame } from '../../../src/table/frame.js';
import { expectEachRowTestedOnce, expectFoldPartitions } from './invariants.js';

describe('splitGrouped(data, { k, groups, seed })', () => {
  // 12 groups with sizes 1..12 (78 rows)
  const groups: string[] = [];
  for (let g = 1; g <= 12; g++) for (let j = 0; j < g; j++) groups.push(`policy${g}`);

  it('a group never straddles folds', () => {
    const folds = splitGrouped(groups.length, { k: 3, groups, seed: 1 });
    expectFoldPartitions(folds, groups.length);
    expectEachRowTestedOnce(folds, groups.length);
    for (const f of folds) {
      const testGroups = new Set([...f.test].map((r) => groups[r]));
      for (const r of f.train) expect(testGroups.has(groups[r])).toBe(false);
    }
  });
  it('balances folds by row count (78 rows over 3 folds: 26 each is reachable and found)', () => {
    const sizes = splitGrouped(groups.length, { k: 3, groups }).map((f) => f.test.length);
    expect(sizes).toEqual([26, 26, 26]);
  });
  it('reads a categorical column by name', () => {
    const frame: Frame = {
      nRows: 6,
      columns: [{ name: 'store', kind: 'categorical', codes: Int32Array.of(0, 1, 2, 0, 1, 2), categories: ['a', 'b', 'c'] }],
      schema: { columns: [{ name: 'store', kind: 'categorical', categories: ['a', 'b', 'c'] }], fingerprint: '' },
    };
    const folds = splitGrouped(frame, { k: 3, groups: 'store' });
    expect(folds.map((f) => [...f.test].map((r) => r % 3)).every((t) => t.length === 2 && t[0] === t[1])).toBe(true);
  });
  it('is deterministic under a seed', () => {
    expect(splitGrouped(groups.length, { groups, seed: 3 })).toEqual(splitGrouped(groups.length, { groups, seed: 3 }));
  });
  it('rejects k above the number of groups, missing group values and a missing column', () => {
    expect(() => splitGrouped(4, { k: 3, groups: ['a', 'a', 'b', 'b'] })).toThrow(/at most 2 \(the number of distinct groups\)/);
    expect(() => splitGrouped(3, { k: 2, groups: ['a', undefined, 'b'] })).toThrow(/row 1/);
    expect(() => splitGrouped(3, { k: 2, groups: [1, NaN, 2] })).toThrow(/row 1/);
    expect(() => splitGrouped(3, { k: 2, groups: 'customer' })).toThrow(/Column "customer" is missing/);
  });
});
