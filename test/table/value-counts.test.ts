import { describe, expect, it } from 'vitest';
import { chooseKind, countValues, isMissingValue } from '../../src/table/value-counts.js';

describe('isMissingValue(v)', () => {
  it('is true for null, undefined, empty text, NaN and an invalid Date only', () => {
    for (const v of [null, undefined, '', NaN, new Date(NaN)]) expect(isMissingValue(v)).toBe(true);
    for (const v of [0, ' ', 'x', false, Infinity, new Date(0)]) expect(isMissingValue(v)).toBe(false);
  });
});

describe('countValues(values)', () => {
  it('tallies each value once by type', () => {
    const c = countValues([1, 2n, Infinity, true, 'a', '2012-01-01', new Date(0), {}, null, NaN]);
    expect(c).toEqual({ n: 10, missing: 2, numbers: 2, infinite: 1, booleans: 1, strings: 2, isoStrings: 1, dates: 1, other: 1 });
  });
});

describe('chooseKind(counts, forced?)', () => {
  const kind = (values: unknown[]) => chooseKind(countValues(values)).kind;
  it('picks the kind from the values present', () => {
    expect(kind([1, null, 2])).toBe('numeric');
    expect(kind([1, Infinity])).toBe('numeric');
    expect(kind([true, null])).toBe('boolean');
    expect(kind([new Date(0), '2012-01-01'])).toBe('date');
    expect(kind(['2012-01-01', null])).toBe('date');
    expect(kind(['a', 'b'])).toBe('categorical');
    expect(kind([1, true])).toBe('categorical');
  });

  it('notes a mix and an all-missing column', () => {
    expect(chooseKind(countValues([1, 'a']))).toEqual({ kind: 'categorical', note: 'mixed values (1 numbers, 1 texts) read as categorical' });
    expect(chooseKind(countValues([null, null]))).toEqual({ kind: 'numeric', note: 'all missing' });
    expect(chooseKind(countValues([]))).toEqual({ kind: 'numeric', note: 'no rows' });
  });

  it('lets a forced kind win', () => {
    expect(chooseKind(countValues([1, 2]), 'categorical')).toEqual({ kind: 'categorical' });
  });
});
