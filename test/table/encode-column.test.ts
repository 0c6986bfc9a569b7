import { describe, expect, it } from 'vitest';
import { datePartColumns, encodeColumn } from '../../src/table/encode-column.js';

describe('encodeColumn(name, values, kind, rows?)', () => {
  it('encodes each kind', () => {
    expect(encodeColumn('b', [true, null], 'boolean')).toEqual([{ name: 'b', kind: 'boolean', values: Float64Array.of(1, NaN) }]);
    expect(encodeColumn('c', ['x'], 'categorical')).toEqual([{ name: 'c', kind: 'categorical', codes: Int32Array.of(0), categories: ['x'] }]);
    expect(encodeColumn('d', ['1970-01-02'], 'date').map((c) => c.name)).toEqual(['d.year', 'd.month', 'd.day', 'd.weekday', 'd.dayOfYear', 'd.epochDays']);
  });
});

describe('datePartColumns(name, instants, parts?)', () => {
  // 1970-01-02 was a Friday (ISO weekday 5), day 2 of the year, epoch day 1 (Python datetime).
  it('computes the parts, with origins, and the hour when asked', () => {
    const cols = datePartColumns('d', Float64Array.of(86_400_000 + 5 * 3600_000));
    expect(cols.map((c) => [c.name, c.values[0]])).toEqual([
      ['d.year', 1970], ['d.month', 1], ['d.day', 2], ['d.weekday', 5], ['d.dayOfYear', 2], ['d.epochDays', 1], ['d.hour', 5],
    ]);
    expect(cols[6].origin).toEqual({ source: 'd', part: 'hour' });
    expect(datePartColumns('d', Float64Array.of(0), ['month']).map((c) => c.name)).toEqual(['d.month']);
  });
});
