import { describe, expect, it } from 'vitest';
import { civilFromDays, daysFromCivil, daysInMonth } from '../../src/table/civil-days.js';

// Expected day counts from Python's datetime: (date(y, m, d) - date(1970, 1, 1)).days.
const cases: [number, number, number, number][] = [
  [1970, 1, 1, 0], [1969, 12, 31, -1], [2012, 1, 1, 15340], [2015, 12, 31, 16800], [2000, 2, 29, 11016],
  [1900, 3, 1, -25508], [1600, 2, 29, -135081], [2400, 12, 31, 157419],
];

describe('daysFromCivil(year, month, day) and civilFromDays(days)', () => {
  it.each(cases)('%i-%i-%i is day %i', (y, m, d, days) => {
    expect(daysFromCivil(y, m, d)).toBe(days);
    expect(civilFromDays(days)).toEqual([y, m, d]);
  });

  it('round-trips every day from 1899 to 2101 and agrees with Date.UTC', () => {
    // 1899-01-01 is day -25932 and 2101-01-01 day 47847 (Python datetime)
    let wrong = 0;
    for (let z = -25932; z <= 47847; z++) {
      const [y, m, d] = civilFromDays(z);
      if (daysFromCivil(y, m, d) !== z || Date.UTC(y, m - 1, d) / 86_400_000 !== z) wrong++;
    }
    expect(wrong).toBe(0);
  });
});

describe('daysInMonth(year, month)', () => {
  it('follows the Gregorian leap-year rule', () => {
    expect([daysInMonth(1900, 2), daysInMonth(2000, 2), daysInMonth(2024, 2), daysInMonth(2023, 2), daysInMonth(2023, 4), daysInMonth(2023, 12)])
      .toEqual([28, 29, 29, 28, 30, 31]);
  });
});
