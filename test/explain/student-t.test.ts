/**
 * Student t quantiles against the printed table: NIST/SEMATECH e-Handbook of Statistical Methods (2012),
 * §1.3.6.7.2 "Critical values of the Student's t distribution", column 0.975 (two-sided 95%), printed to
 * three decimals — compared at 5e-4. The table values are transcribed from memory of that table.
 */
import { describe, expect, it } from 'vitest';
import { studentQuantile, studentTwoSided } from '../../src/explain/student-t.js';

describe('studentQuantile(level, nu)', () => {
  const table: [number, number][] = [[1, 12.706], [2, 4.303], [3, 3.182], [4, 2.776], [5, 2.571], [9, 2.262], [10, 2.228], [30, 2.042], [100, 1.984]];
  for (const [nu, t] of table) {
    it(`t(0.975, ${nu}) = ${t} (NIST/SEMATECH table)`, () => {
      expect(Math.abs(studentQuantile(0.95, nu) - t)).toBeLessThan(5e-4);
    });
  }
  it('t(0.995, 4) = 4.604 and t(0.95, 9) = 1.833 (same table, other columns)', () => {
    expect(Math.abs(studentQuantile(0.99, 4) - 4.604)).toBeLessThan(5e-4);
    expect(Math.abs(studentQuantile(0.9, 9) - 1.833)).toBeLessThan(5e-4);
  });
  it('studentTwoSided(t, 1) is the Cauchy case (2/π)·atan(t) (Abramowitz & Stegun 1964, 26.7.3)', () => {
    expect(studentTwoSided(1, 1)).toBeCloseTo(0.5, 14);
  });
  it('rejects a level outside (0, 1) and non-integer degrees of freedom', () => {
    expect(() => studentQuantile(1, 3)).toThrow(/level/);
    expect(() => studentQuantile(0.95, 2.5)).toThrow(/degrees of freedom/);
  });
});
