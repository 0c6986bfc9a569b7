import { describe, expect, it } from 'vitest';
import { datePart, hasTimeOfDay } from '../../src/table/date-parts.js';

// Expected values from Python's datetime (isoweekday, timetuple().tm_yday, days since 1970-01-01),
// a general-purpose reference library.
const cases: [string, number, number, number, number, number, number][] = [
  // text, year, month, day, weekday (ISO: 1 Monday .. 7 Sunday), dayOfYear, epochDays
  ['2012-01-01', 2012, 1, 1, 7, 1, 15340],
  ['2015-12-31', 2015, 12, 31, 4, 365, 16800],
  ['2012-12-31', 2012, 12, 31, 1, 366, 15705],
  ['1969-12-31', 1969, 12, 31, 3, 365, -1],
  ['2000-02-29', 2000, 2, 29, 2, 60, 11016],
];

describe('datePart(ms, part)', () => {
  it.each(cases)('%s', (text, year, month, day, weekday, dayOfYear, epochDays) => {
    const t = Date.parse(`${text}T00:00:00Z`);
    expect(datePart(t, 'year')).toBe(year);
    expect(datePart(t, 'month')).toBe(month);
    expect(datePart(t, 'day')).toBe(day);
    expect(datePart(t, 'weekday')).toBe(weekday);
    expect(datePart(t, 'dayOfYear')).toBe(dayOfYear);
    expect(datePart(t, 'epochDays')).toBe(epochDays);
    expect(datePart(t + 13.5 * 3600_000, 'hour')).toBe(13);
    expect(datePart(t + 13.5 * 3600_000, 'epochDays')).toBe(epochDays);
  });

  it('gives NaN for a missing instant', () => {
    expect(datePart(NaN, 'year')).toBeNaN();
  });
});

describe('hasTimeOfDay(times)', () => {
  it('is false for midnights (also before 1970) and missing values, true otherwise', () => {
    expect(hasTimeOfDay(new Float64Array([0, -86_400_000, NaN]))).toBe(false);
    expect(hasTimeOfDay(new Float64Array([0, -3600_000]))).toBe(true);
  });
});
