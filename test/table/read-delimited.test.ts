import { describe, expect, it } from 'vitest';
import { readDelimitedText } from '../../src/table/read-delimited.js';

describe('readDelimitedText(text, delimiter, path, options?)', () => {
  it('types columns on all their cells', () => {
    const t = readDelimitedText('n,b,d,s\n1,true,2012-01-01,x\n,FALSE,,2\n', ',', 'x.csv');
    expect(t.array('n')).toEqual([1, null]);
    expect(t.array('b')).toEqual([true, false]);
    expect(t.array('d')).toEqual([new Date(Date.UTC(2012, 0, 1)), null]);
    expect(t.array('s')).toEqual(['x', '2']);
  });
  it('keeps the header of a file with no records', () => {
    const t = readDelimitedText('a,b\n', ',', 'x.csv');
    expect(t.columnNames()).toEqual(['a', 'b']);
    expect(t.numRows()).toBe(0);
  });
});
