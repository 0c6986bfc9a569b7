import { describe, expect, it } from 'vitest';
import { readJsonText } from '../../src/table/read-json.js';

describe('readJsonText(text, path, options?)', () => {
  it('reads records, keeping JSON types, with absent keys missing', () => {
    const t = readJsonText('\ufeff[{"a":1,"b":"x"},{"b":"","c":true}]', 'x.json');
    expect(t.columnNames()).toEqual(['a', 'b', 'c']);
    expect(t.array('a')).toEqual([1, null]);
    expect(t.array('b')).toEqual(['x', null]);
    expect(t.array('c')).toEqual([null, true]);
  });
  it('refuses a record that is not an object', () => {
    expect(() => readJsonText('[1]', 'x.json')).toThrow('Cannot read "x.json": record 0 is 1, not an object.');
  });
  it('reads an empty array as an empty table', () => {
    expect(readJsonText('[]', 'x.json').numRows()).toBe(0);
  });
});
