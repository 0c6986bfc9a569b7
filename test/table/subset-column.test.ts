import { describe, expect, it } from 'vitest';
import { subsetColumn } from '../../src/table/subset-column.js';

describe('subsetColumn(column, rows)', () => {
  it('takes rows (repeats allowed) keeping dictionary and origin', () => {
    const origin = { source: 'd', part: 'day' as const };
    expect(subsetColumn({ name: 'x', kind: 'numeric', values: Float64Array.of(5, 6), origin }, [1, 1]))
      .toEqual({ name: 'x', kind: 'numeric', values: Float64Array.of(6, 6), origin });
    expect(subsetColumn({ name: 'c', kind: 'categorical', codes: Int32Array.of(0, 1), categories: ['a', 'b'] }, [1]))
      .toEqual({ name: 'c', kind: 'categorical', codes: Int32Array.of(1), categories: ['a', 'b'] });
  });
});
