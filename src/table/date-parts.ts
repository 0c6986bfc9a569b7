/**
 * Calendar parts of instants, read in UTC: the numeric columns a date column expands into.
 */
import type { ColumnOrigin } from './frame.js';
import { civilFromDays, daysFromCivil } from './civil-days.js';

export type DatePart = ColumnOrigin['part'];

/** The parts every date column gets, in column order; `hour` is added when any time of day is not midnight. */
export const DATE_PARTS: readonly DatePart[] = ['year', 'month', 'day', 'weekday', 'dayOfYear', 'epochDays'];

const DAY_MS = 86_400_000;

/**
 * One calendar part of an instant given in milliseconds since 1970-01-01T00:00Z (NaN gives NaN).
 * month is 1–12, day 1–31, weekday 1 (Monday) – 7 (Sunday) as in ISO 8601, dayOfYear 1–366,
 * hour 0–23, epochDays whole days since 1970-01-01 (negative before).
 *
 * @example datePart(Date.UTC(2012, 0, 1), 'weekday') // 7 (a Sunday)
 */
export function datePart(ms: number, part: DatePart): number {
  if (!Number.isFinite(ms)) return NaN;
  const days = Math.floor(ms / DAY_MS);
  switch (part) {
    case 'epochDays': return days;
    case 'weekday': return (((days + 3) % 7) + 7) % 7 + 1; // 1970-01-01 was a Thursday (4)
    case 'hour': return Math.floor((ms - days * DAY_MS) / 3_600_000);
    default: {
      const [year, month, day] = civilFromDays(days);
      if (part === 'year') return year;
      if (part === 'month') return month;
      if (part === 'day') return day;
      return days - daysFromCivil(year, 1, 1) + 1;
    }
  }
}

/**
 * True when some instant in `times` is not at midnight UTC (so an `hour` part is worth adding).
 *
 * @example hasTimeOfDay(Float64Array.of(0, 3_600_000)) // true
 */
export function hasTimeOfDay(times: Float64Array): boolean {
  for (let i = 0; i < times.length; i++) {
    const t = times[i];
    if (Number.isFinite(t) && ((t % DAY_MS) + DAY_MS) % DAY_MS !== 0) return true;
  }
  return false;
}
