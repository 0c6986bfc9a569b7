import { describe, expect, it } from 'vitest';
import { describeFolds, compactRanges } from '../../../src/assess/splits/describe-folds.js';
import { checkNoLeak, splitNested } from '../../../src/assess/splits/nested.js';
import { splitRows } from '../../../src/assess/splits/plan.js';

describe('splitNested(data, { outer, inner, seed })', () => {
  it('train and watch come from the outer training part only; test rows are never seen', () => {
    const folds = splitNested(50, { outer: { method: 'folds', k: 5 }, inner: { method: 'holdout', testFraction: 0.2 }, seed: 3 });
    expect(folds).toHaveLength(5);
    for (const f of folds) {
      const test = new Set(f.test);
      expect([...f.train, ...(f.watch ?? [])].some((r) => test.has(r))).toBe(false);
      expect(f.train.length + (f.watch?.length ?? 0) + f.test.length).toBe(50);
      expect(f.watch?.length).toBe(8);
    }
  });
  it('inner k-fold gives one fold per (outer, inner) pair', () => {
    const folds = splitNested(30, { outer: { method: 'folds', k: 3 }, inner: { method: 'folds', k: 4 } });
    expect(folds.map((f) => `${f.fold}.${f.inner}`)).toEqual(
      ['0.0', '0.1', '0.2', '0.3', '1.0', '1.1', '1.2', '1.3', '2.0', '2.1', '2.2', '2.3']);
  });
  it('grouped outer and inner: groups stay whole at both levels', () => {
    const groups = Array.from({ length: 40 }, (_, i) => `g${i % 10}`);
    const folds = splitNested(40, { outer: { method: 'grouped', k: 2, groups }, inner: { method: 'grouped', k: 2, groups } });
    for (const f of folds) {
      const testG = new Set([...f.test].map((r) => groups[r]));
      const watchG = new Set([...(f.watch ?? [])].map((r) => groups[r]));
      for (const r of f.train) { expect(testG.has(groups[r])).toBe(false); expect(watchG.has(groups[r])).toBe(false); }
    }
  });
  it('is deterministic under a seed', () => {
    expect(splitNested(20, { seed: 1 })).toEqual(splitNested(20, { seed: 1 }));
  });
  it('rejects an inner plan that cannot split the outer training part', () => {
    expect(() => splitNested(6, { outer: { method: 'folds', k: 3 }, inner: { method: 'folds', k: 5 } })).toThrow(/at most 4/);
  });
});

describe('checkNoLeak(folds, nRows)', () => {
  it('throws when test rows reach train or watch', () => {
    expect(() => checkNoLeak([{ fold: 2, train: Int32Array.of(0, 1), test: Int32Array.of(1) }], 2)).toThrow(/Fold 2: 1 test row\(s\) also appear in the train rows/);
    expect(() => checkNoLeak([{ fold: 0, train: Int32Array.of(0), watch: Int32Array.of(2), test: Int32Array.of(2) }], 3)).toThrow(/watch/);
    expect(() => checkNoLeak(splitRows(10, { method: 'folds', k: 2 }), 10)).not.toThrow();
  });
});

describe('describeFolds(folds, nRows)', () => {
  it('one row per fold and stage, with counts, shares and no overlap with test', () => {
    const folds = splitNested(20, { outer: { method: 'folds', k: 2, shuffle: false }, inner: { method: 'holdout', testFraction: 0.2 } });
    const t = describeFolds(folds, 20);
    expect(t.map((r) => r.stage)).toEqual(['train', 'watch', 'test', 'train', 'watch', 'test']);
    expect(t.map((r) => r.rows)).toEqual([8, 2, 10, 8, 2, 10]);
    expect(t[2].ranges).toBe('0-9');
    expect(t[5].ranges).toBe('10-19');
    expect(t.every((r) => r.sharedWithTest === 0)).toBe(true);
    expect(t[2].use).toBe('final score only');
  });
  it('reports a leak instead of hiding it', () => {
    const t = describeFolds([{ fold: 0, train: Int32Array.of(0, 1, 2), test: Int32Array.of(2, 3) }], 4);
    expect(t[0].sharedWithTest).toBe(1);
  });
  it('compactRanges cuts long lists', () => {
    expect(compactRanges(Int32Array.of(4, 0, 1, 2, 7))).toBe('0-2, 4, 7');
    expect(compactRanges(Int32Array.from({ length: 100 }, (_, i) => 2 * i)).endsWith('...')).toBe(true);
  });
});

describe('splitRows(data, plan, seed)', () => {
  it('dispatches on the method and validates it', () => {
    expect(splitRows(10, { method: 'time', k: 2, order: Array.from({ length: 10 }, (_, i) => i) })).toHaveLength(2);
    expect(() => splitRows(10, { method: 'bogus' } as never)).toThrow(/method/);
  });
});
