import { describe, expect, it } from 'vitest';
import { quantileGroups } from '../../src/assess/quantile-groups.js';

describe('quantileGroups(values, groups)', () => {
  it('equal-size groups at the empirical quantiles (Hyndman & Fan 1996, type 1)', () => {
    const q = quantileGroups(Float64Array.of(5, 1, 3, 2, 4, 6), 3);
    expect([...q.group]).toEqual([2, 0, 1, 0, 1, 2]);
    expect([...q.upper]).toEqual([2, 4, 6]);
    expect([...q.lower]).toEqual([1, 3, 5]);
    expect(q.labels).toEqual(['[1, 2]', '(2, 4]', '(4, 6]']);
  });
  it('ties share a group, so fewer groups may come out', () => {
    const q = quantileGroups([1, 1, 1, 1, 1, 2], 4);
    expect(q.labels).toHaveLength(2);
    expect([...q.group]).toEqual([0, 0, 0, 0, 0, 1]);
  });
  it('NaN gets -1; all missing gives no groups; Infinity and bad counts are rejected', () => {
    expect([...quantileGroups([NaN, 3], 2).group]).toEqual([-1, 0]);
    expect(quantileGroups([NaN, NaN], 2).labels).toEqual([]);
    expect(() => quantileGroups([Infinity], 2)).toThrow(/finite number or NaN/);
    expect(() => quantileGroups([1], 0)).toThrow(/groups/);
  });
});
