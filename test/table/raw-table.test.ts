import { table } from 'arquero';
import { describe, expect, it } from 'vitest';
import { isFrame, rawTable } from '../../src/table/raw-table.js';
import { toFrame } from '../../src/table/to-frame.js';

describe('rawTable(input)', () => {
  it('takes the union of row keys in first-seen order', () => {
    const r = rawTable([{ a: 1 }, { b: 2, a: 3 }]);
    expect(r.names).toEqual(['a', 'b']);
    expect(r.values('b')).toEqual([undefined, 2]);
  });

  it('reads an arquero table', () => {
    const r = rawTable(table({ a: [1, 2] }));
    expect([r.nRows, r.names, r.values('a')]).toEqual([2, ['a'], [1, 2]]);
  });

  it('decodes a Frame back to plain values', () => {
    const r = rawTable(toFrame([{ c: 'x', b: true, n: 1 }, { c: null, b: null, n: null }]));
    expect(r.values('c')).toEqual(['x', null]);
    expect(r.values('b')).toEqual([true, null]);
    expect(r.values('n')).toEqual([1, NaN]);
  });

  it('refuses other inputs', () => {
    expect(() => rawTable(42 as never)).toThrow(/Option input = 42 is invalid/);
    expect(() => rawTable([null] as never)).toThrow('Row 0 is null: expected an object of column values.');
  });
});

describe('isFrame(x)', () => {
  it('tells a Frame from a table and rows', () => {
    expect(isFrame(toFrame([{ a: 1 }]))).toBe(true);
    expect(isFrame(table({ a: [1] }))).toBe(false);
    expect(isFrame([{ a: 1 }])).toBe(false);
  });
});
