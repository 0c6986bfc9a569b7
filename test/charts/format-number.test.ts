import { describe, expect, it } from 'vitest';
import { formatShare, formatterFor, isShareOfWhole } from '../../src/charts/format-number.js';

describe('formatterFor(values, percent)', () => {
  it('same decimals for every value, three significant digits of the largest magnitude', () => {
    const f = formatterFor([0.142, 0.004, -0.002]);
    expect([0.142, 0.004, -0.002].map(f)).toEqual(['0.142', '0.004', '−0.002']);
    expect(formatterFor([1234.5, 2])(2)).toBe('2');
    expect(formatterFor([1234.5, 2])(1234.5)).toBe('1,235');
    expect(formatterFor([0])(0)).toBe('0.00');
    expect(formatterFor([0.5])(-0.0001)).toBe('0.000'); // no "−0.000"
  });
  it('percentages: one decimal when the largest is 10–99%, two when it is 1–9.9%', () => {
    expect(formatterFor([0.459, 0.031], true)(0.031)).toBe('3.1%');
    expect(formatterFor([0.04, 0.012], true)(0.012)).toBe('1.20%');
    expect(formatterFor([NaN, 0.5])(NaN)).toBe('NaN');
  });
});

describe('isShareOfWhole(values) / formatShare(x)', () => {
  it('true only for non-negative values summing to 1 within 1e-6', () => {
    expect(isShareOfWhole([0.2, 0.3, 0.5])).toBe(true);
    expect(isShareOfWhole([0.2, 0.3, 0.49])).toBe(false);
    expect(isShareOfWhole([1.2, -0.2])).toBe(false);
    expect(isShareOfWhole([])).toBe(false);
    expect(isShareOfWhole([NaN, 1])).toBe(false);
  });
  it('never rounds a non-zero share to 0% or a share below 1 to 100%', () => {
    expect(formatShare(0.0004)).toBe('<0.1%');
    expect(formatShare(0.9996)).toBe('>99.9%');
    expect(formatShare(0)).toBe('0%');
    expect(formatShare(1)).toBe('100%');
  });
});
