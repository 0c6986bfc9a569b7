import { describe, expect, it } from 'vitest';
import { chosenColumns, forcedKinds } from '../../src/table/frame-options.js';

describe('forcedKinds(names, options)', () => {
  it('maps each listed column to its kind', () => {
    const m = forcedKinds(['a', 'b', 'c'], { categorical: ['a'], numeric: ['b'], dates: ['c'] });
    expect([...m]).toEqual([['a', 'categorical'], ['b', 'numeric'], ['c', 'date']]);
  });
  it('refuses unknown names, conflicts and non-arrays', () => {
    expect(() => forcedKinds(['a'], { dates: ['z'] })).toThrow('Unknown column "z" in option dates.');
    expect(() => forcedKinds(['a'], { numeric: ['a'], dates: ['a'] })).toThrow('Column "a" is listed in both numeric and dates.');
    expect(() => forcedKinds(['a'], { numeric: 'a' as never })).toThrow(/Option numeric = "a" is invalid/);
  });
});

describe('chosenColumns(names, options)', () => {
  it('keeps all by default, or the listed ones in order', () => {
    expect(chosenColumns(['a', 'b'], {})).toEqual(['a', 'b']);
    expect(chosenColumns(['a', 'b'], { columns: ['b'] })).toEqual(['b']);
    expect(() => chosenColumns(['a'], { columns: ['a', 'a'] })).toThrow(/each column named once/);
  });
});
