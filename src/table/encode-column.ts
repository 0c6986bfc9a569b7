/**
 * One input column into Frame columns of a chosen kind (a date column into several part columns).
 */
import type { Column, NumericColumn } from './frame.js';
import { civilFromDays, daysFromCivil } from './civil-days.js';
import { DATE_PARTS, datePart, hasTimeOfDay, type DatePart } from './date-parts.js';
import { encodeCategories, encodeInstants, encodeNumbers } from './encode-values.js';
import type { EncodedKind } from './value-counts.js';

const DAY_MS = 86_400_000;

/**
 * The numeric part columns of a date column, named `<name>.<part>`, each with its `origin`.
 * `parts` defaults to the standard parts, plus `hour` when any instant is not at midnight UTC.
 *
 * @example datePartColumns('d', new Float64Array([0])).map((c) => c.name) // ['d.year', 'd.month', ...]
 */
export function datePartColumns(name: string, instants: Float64Array, parts?: readonly DatePart[]): NumericColumn[] {
  const chosen = parts ?? (hasTimeOfDay(instants) ? [...DATE_PARTS, 'hour' as const] : DATE_PARTS);
  const n = instants.length;
  const out = chosen.map(() => new Float64Array(n));
  const fill = (i: number, part: DatePart, x: number) => { const k = chosen.indexOf(part); if (k >= 0) out[k][i] = x; };
  const needCivil = chosen.some((p) => p === 'year' || p === 'month' || p === 'day' || p === 'dayOfYear');
  for (let i = 0; i < n; i++) {
    const t = instants[i];
    if (!Number.isFinite(t)) { for (const a of out) a[i] = NaN; continue; }
    const days = Math.floor(t / DAY_MS);
    fill(i, 'epochDays', days);
    fill(i, 'weekday', datePart(t, 'weekday'));
    fill(i, 'hour', datePart(t, 'hour'));
    if (!needCivil) continue;
    const [year, month, day] = civilFromDays(days);
    fill(i, 'year', year);
    fill(i, 'month', month);
    fill(i, 'day', day);
    fill(i, 'dayOfYear', days - daysFromCivil(year, 1, 1) + 1);
  }
  return chosen.map((part, k) => ({ name: `${name}.${part}`, kind: 'numeric', values: out[k], origin: { source: name, part } }));
}

/**
 * Encode rows `rows` (all when null) of column `name` as `kind`: numeric (NaN missing; ±Infinity refused), boolean (0/1), categorical
 * (sorted dictionary; -1 missing) or date (expanded into part columns).
 *
 * @example encodeColumn('flag', [true, null], 'boolean') // [{ name: 'flag', kind: 'boolean', values: [1, NaN] }]
 */
export function encodeColumn(name: string, values: ArrayLike<unknown>, kind: EncodedKind, rows: ArrayLike<number> | null = null): Column[] {
  switch (kind) {
    case 'numeric':
    case 'boolean':
      return [{ name, kind, values: encodeNumbers(name, values, rows) }];
    case 'categorical':
      return [{ name, kind, ...encodeCategories(name, values, rows) }];
    case 'date':
      return datePartColumns(name, encodeInstants(name, values, rows));
  }
}
