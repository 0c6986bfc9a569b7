import { expect } from 'vitest';
import type { Fold } from '../../../src/assess/splits/fold.js';

/** Each fold: train and test disjoint, sorted, within 0..n-1, and together all rows (common practice). */
export function expectFoldPartitions(folds: readonly Fold[], n: number): void {
  for (const f of folds) {
    const all = [...f.train, ...f.test].sort((a, b) => a - b);
    expect(all).toEqual(Array.from({ length: n }, (_, i) => i));
    expect([...f.train]).toEqual([...f.train].sort((a, b) => a - b));
    expect([...f.test]).toEqual([...f.test].sort((a, b) => a - b));
  }
}

/** Test sets of all folds are disjoint and cover every row exactly once. */
export function expectEachRowTestedOnce(folds: readonly Fold[], n: number): void {
  const seen = new Array<number>(n).fill(0);
  for (const f of folds) for (const r of f.test) seen[r]++;
  expect(seen.every((c) => c === 1)).toBe(true);
}
