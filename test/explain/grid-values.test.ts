/**
 * gridOf and quantileSorted. Quantile definition 7 of Hyndman & Fan (1996) "Sample quantiles in
 * statistical packages", The American Statistician 50(4):361–365: Q(p) = x_(⌊h⌋) + (h − ⌊h⌋)(x_(⌊h⌋+1) −
 * x_(⌊h⌋)), h = (n − 1)p + 1 (1-based). Hand-computed values below.
 */
import { describe, expect, it } from 'vitest';
import { gridOf } from '../../src/explain/grid-values.js';
import { quantileSorted } from '../../src/explain/quantile.js';

describe('quantileSorted(sorted, q) (Hyndman & Fan 1996, definition 7)', () => {
  it('interpolates between order statistics', () => {
    expect(quantileSorted([1, 2, 3, 4], 0.5)).toBe(2.5);
    expect(quantileSorted([1, 2, 3, 4], 0.25)).toBe(1.75);
    expect(quantileSorted([10], 0.3)).toBe(10);
    expect(quantileSorted([], 0.5)).toBeNaN();
  });
});

describe('gridOf(column, size, values?)', () => {
  const num = { name: 'x', kind: 'numeric' as const, values: Float64Array.from([5, NaN, 1, 3, 2, 4, 3]) };
  it('every distinct value when there are at most size, ignoring NaN', () => {
    expect(gridOf(num, 10).set).toEqual([1, 2, 3, 4, 5]);
  });
  it('size quantiles from min to max otherwise', () => {
    expect(gridOf(num, 3).set).toEqual([1, 3, 5]);
  });
  it('categories: every label of the dictionary, set as codes', () => {
    const g = gridOf({ name: 'c', kind: 'categorical', codes: Int32Array.from([0, -1]), categories: ['a', 'b'] }, 5);
    expect(g).toEqual({ kind: 'categorical', set: [0, 1], shown: ['a', 'b'] });
  });
  it('bad input: size < 2, unknown category, non-finite explicit value, all missing', () => {
    expect(() => gridOf(num, 1)).toThrow(/gridSize/);
    expect(() => gridOf({ name: 'c', kind: 'categorical', codes: Int32Array.from([0]), categories: ['a'] }, 5, ['z'])).toThrow(/category of c/);
    expect(() => gridOf(num, 5, [Infinity])).toThrow(/finite/);
    expect(() => gridOf({ name: 'x', kind: 'numeric', values: Float64Array.from([NaN, NaN]) }, 5)).toThrow(/no values/);
  });
});
