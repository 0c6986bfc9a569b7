/**
 * ISO 8601 calendar dates and date-times (ISO 8601-1:2019; the profile of RFC 3339), read without the
 * platform's time zone: a date or date-time without an offset is read as UTC, so the same text gives the
 * same instant on every machine. At least `YYYY-MM-DD` is required (a bare year is not a date here).
 */
import { daysFromCivil, daysInMonth } from './civil-days.js';

const ISO = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d{1,9})?)?\s*(Z|z|[+-]\d{2}(?::?\d{2})?)?)?$/;

function digits(s: string, from: number, count: number): number {
  let v = 0;
  for (let i = from; i < from + count; i++) {
    const c = s.charCodeAt(i) - 48;
    if (c < 0 || c > 9) return NaN;
    v = v * 10 + c;
  }
  return v;
}

/** Fast path for `YYYY-MM-DD` (the common case), without a regular expression. */
function plainDate(s: string): number {
  if (s.charCodeAt(7) !== 45) return NaN;
  const year = digits(s, 0, 4), month = digits(s, 5, 2), day = digits(s, 8, 2);
  if (!(month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month))) return NaN;
  return daysFromCivil(year, month, day) * 86_400_000;
}

/**
 * Milliseconds since 1970-01-01T00:00Z for an ISO date or date-time text, or NaN when the text is not one
 * (including impossible dates such as 2023-02-30).
 *
 * @example parseIsoDate('2012-01-02') // 1325462400000
 * @example parseIsoDate('2012-01-02T10:30+02:00') // 1325493000000
 */
export function parseIsoDate(text: string): number {
  const n = text.length;
  if (n < 10) return NaN;
  const padded = text.charCodeAt(0) <= 32 || text.charCodeAt(n - 1) <= 32;
  const s = padded ? text.trim() : text;
  if (s.charCodeAt(4) !== 45) return NaN; // quick refusal: no '-' after the year
  if (s.length === 10) return plainDate(s);
  const m = ISO.exec(s);
  if (!m) return NaN;
  const year = +m[1], month = +m[2], day = +m[3];
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return NaN;
  const hour = m[4] ? +m[4] : 0, minute = m[5] ? +m[5] : 0, second = m[6] ? +m[6] : 0;
  if (hour > 23 || minute > 59 || second > 59) return NaN;
  const ms = m[7] ? Math.round(Number(`0${m[7]}`) * 1000) : 0;
  let t = daysFromCivil(year, month, day) * 86_400_000 + ((hour * 60 + minute) * 60 + second) * 1000 + ms;
  const zone = m[8];
  if (zone && zone !== 'Z' && zone !== 'z') {
    const sign = zone[0] === '-' ? -1 : 1;
    const digits = zone.slice(1).replace(':', '');
    const offH = +digits.slice(0, 2), offM = digits.length > 2 ? +digits.slice(2) : 0;
    if (offH > 23 || offM > 59) return NaN;
    t -= sign * (offH * 60 + offM) * 60_000;
  }
  return t;
}

/**
 * True when `value` is a string holding an ISO date or date-time that `parseIsoDate` accepts.
 *
 * @example isIsoDateText('2015-12-31') // true
 * @example isIsoDateText('2015') // false
 */
export function isIsoDateText(value: unknown): value is string {
  return typeof value === 'string' && !Number.isNaN(parseIsoDate(value));
}
