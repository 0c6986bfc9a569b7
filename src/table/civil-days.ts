/**
 * Proleptic Gregorian calendar arithmetic on whole days since 1970-01-01, without Date objects.
 * Algorithms `days_from_civil` and `civil_from_days` of Hinnant, H. (2013) "chrono-Compatible Low-Level
 * Date Algorithms" (howardhinnant.github.io/date_algorithms.html), written from memory and checked in
 * tests against Python's datetime.
 */

/**
 * Days since 1970-01-01 of the calendar date year-month-day (month 1–12).
 *
 * @example daysFromCivil(2012, 1, 1) // 15340
 */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const doy = Math.floor((153 * (month > 2 ? month - 3 : month + 9) + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

/**
 * The calendar date [year, month (1–12), day] of a count of days since 1970-01-01.
 *
 * @example civilFromDays(-1) // [1969, 12, 31]
 */
export function civilFromDays(days: number): [number, number, number] {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return [yoe + era * 400 + (month <= 2 ? 1 : 0), month, day];
}

/**
 * Days in a month of the proleptic Gregorian calendar.
 *
 * @example daysInMonth(2000, 2) // 29
 */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}
