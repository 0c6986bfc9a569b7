import { describe, expect, it } from 'vitest';
import { alignColumn } from '../../src/table/align-column.js';

describe('alignColumn(schema, values, fromSource, nRows)', () => {
  const region = { name: 'region', kind: 'categorical' as const, categories: ['a', 'b'] };
  it('codes categories with the model dictionary, unseen → -1 with examples', () => {
    const [col, issue] = alignColumn(region, ['b', 'z', null, 'z', 'y'], false, 5);
    expect(col).toEqual({ name: 'region', kind: 'categorical', codes: Int32Array.of(1, -1, -1, -1, -1), categories: ['a', 'b'] });
    expect(issue).toEqual({ type: 'unseen', rows: 3, distinct: 2, examples: ['z', 'y'] });
  });

  it('gives an all-missing column of the right size when the table lacks it', () => {
    const [col, issue] = alignColumn({ name: 'x', kind: 'numeric' }, null, false, 3);
    expect(col).toEqual({ name: 'x', kind: 'numeric', values: Float64Array.of(NaN, NaN, NaN) });
    expect(issue).toEqual({ type: 'missing', rows: 3 });
  });

  it('computes a date part from the date column, or reports a type change', () => {
    const schema = { name: 'd.month', kind: 'numeric' as const, origin: { source: 'd', part: 'month' as const } };
    expect(alignColumn(schema, ['2020-03-01', null], true, 2)[0]).toEqual({ name: 'd.month', kind: 'numeric', values: Float64Array.of(3, NaN), origin: schema.origin });
    expect(alignColumn(schema, [5, 6], true, 2)[1]).toEqual({ type: 'typeChanged', found: '2 numbers', rows: 2 });
  });
});
