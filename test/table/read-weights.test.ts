import { describe, expect, it } from 'vitest';
import { readWeights } from '../../src/table/read-weights.js';

describe('readWeights(name, values, rows)', () => {
  it('reads finite non-negative numbers of the rows asked for', () => {
    expect(readWeights('w', [1, -5, 2n], [0, 2])).toEqual(Float64Array.of(1, 2));
  });
  it('names the original row of a bad weight', () => {
    expect(() => readWeights('w', [1, null, -5], [0, 2])).toThrow('Column "w", row 2: value -5 is invalid: expected a finite weight ≥ 0.');
    expect(() => readWeights('w', [null], null)).toThrow(/row 0: value null/);
  });
  it('refuses all-zero weights', () => {
    expect(() => readWeights('w', [0, 0], null)).toThrow('Option weight = "w" is invalid: expected a column with some positive weight.');
  });
});
