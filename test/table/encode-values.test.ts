import { describe, expect, it } from 'vitest';
import { categoryText, encodeCategories, encodeInstants, encodeNumbers } from '../../src/table/encode-values.js';

describe('encodeNumbers(name, values, rows?)', () => {
  it('reads numbers, bigints, booleans and number texts; missing → NaN', () => {
    expect(encodeNumbers('x', [1, 2n, true, ' 2.5 ', null, '', NaN])).toEqual(Float64Array.of(1, 2, 1, 2.5, NaN, NaN, NaN));
  });
  it('reads only the rows asked for and names the original row in errors', () => {
    expect(encodeNumbers('x', [1, 'bad', 3], [2, 0])).toEqual(Float64Array.of(3, 1));
    expect(() => encodeNumbers('x', [1, 'bad', 3], [0, 1])).toThrow('Column "x", row 1: value "bad" is invalid: expected a number or a missing value.');
    expect(() => encodeNumbers('x', ['Infinity'])).toThrow(/row 0: value "Infinity" is invalid: expected a finite number/);
    expect(() => encodeNumbers('x', [new Date(0)])).toThrow(/row 0/);
  });
});

describe('encodeCategories(name, values, rows?)', () => {
  it('sorts the dictionary by string value and codes missing as -1', () => {
    expect(encodeCategories('c', ['b', 'a', null, 'b', 10, 9])).toEqual({ codes: Int32Array.of(3, 2, -1, 3, 0, 1), categories: ['10', '9', 'a', 'b'] });
  });
  it('builds the dictionary from the rows asked for only', () => {
    expect(encodeCategories('c', ['gone', 'kept'], [1])).toEqual({ codes: Int32Array.of(0), categories: ['kept'] });
  });
});

describe('categoryText(name, row, v)', () => {
  it('writes dates at midnight UTC as YYYY-MM-DD and refuses objects', () => {
    expect(categoryText('c', 0, new Date(0))).toBe('1970-01-01');
    expect(categoryText('c', 0, new Date(1000))).toBe('1970-01-01T00:00:01.000Z');
    expect(categoryText('c', 0, false)).toBe('false');
    expect(() => categoryText('c', 4, [1])).toThrow('Column "c", row 4: value [1] is invalid: expected a number, text, boolean or date.');
  });
});

describe('encodeInstants(name, values, rows?)', () => {
  it('reads Dates and ISO texts; refuses other values', () => {
    expect(encodeInstants('d', [new Date(5), '1970-01-02', null])).toEqual(Float64Array.of(5, 86_400_000, NaN));
    expect(() => encodeInstants('d', [3])).toThrow(/row 0: value 3 is invalid: expected a date/);
  });
});
