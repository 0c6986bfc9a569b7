import { expect } from 'vitest';

/**
 * The one tolerance helper of the assess tests. Hand-computed values are exact rationals or a few
 * logarithms, so double-precision results agree to about 1e-15 relative; 1e-12 absolute leaves room for
 * summation order and still fails on any real mistake.
 */
export const TOLERANCE = 1e-12;

export function expectClose(actual: number, expected: number, tolerance = TOLERANCE): void {
  if (Number.isNaN(expected)) { expect(actual).toBeNaN(); return; }
  if (!(Math.abs(actual - expected) <= tolerance)) {
    expect.fail(`expected ${actual} to be within ${tolerance} of ${expected}`);
  }
}
