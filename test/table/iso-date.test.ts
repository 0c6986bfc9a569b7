import { describe, expect, it } from 'vitest';
import { isIsoDateText, parseIsoDate } from '../../src/table/iso-date.js';

// Expected instants computed with Python's calendar.timegm (general-purpose reference library).
describe('parseIsoDate(text)', () => {
  it('reads a date as midnight UTC', () => {
    expect(parseIsoDate('2012-01-02')).toBe(1325462400000);
    expect(parseIsoDate('1970-01-01')).toBe(0);
  });

  it('reads a date-time without offset as UTC, and applies an offset when given', () => {
    expect(parseIsoDate('2012-01-02T08:30')).toBe(1325493000000);
    expect(parseIsoDate('2012-01-02 08:30:00')).toBe(1325493000000);
    expect(parseIsoDate('2012-01-02T08:30:00Z')).toBe(1325493000000);
    expect(parseIsoDate('2012-01-02T10:30+02:00')).toBe(1325493000000);
    expect(parseIsoDate('2012-01-02T03:30-0500')).toBe(1325493000000);
    expect(parseIsoDate('2012-01-02T08:30:00.250Z')).toBe(1325493000250);
  });

  it('gives NaN for impossible or non-ISO texts', () => {
    for (const t of ['2023-02-29', '2023-13-01', '2023-00-10', '2012-01-02T24:00', '2015', '01/02/2012', 'x', '']) {
      expect(parseIsoDate(t)).toBeNaN();
    }
    expect(parseIsoDate('2024-02-29')).toBe(Date.UTC(2024, 1, 29));
  });
});

describe('isIsoDateText(value)', () => {
  it('accepts ISO texts only', () => {
    expect(isIsoDateText('2015-12-31')).toBe(true);
    expect(isIsoDateText('2015')).toBe(false);
    expect(isIsoDateText(20151231)).toBe(false);
    expect(isIsoDateText(null)).toBe(false);
  });
});
