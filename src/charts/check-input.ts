/**
 * Input checks shared by the charts: every number drawn must be finite, parallel arrays must match.
 * A chart never silently drops or coerces a bad value; it names the chart, field and row.
 */
import { errors } from '../errors.js';

/** `value` as a finite number, or a clear error naming the chart, field and row. */
export function checkFinite(chart: string, field: string, row: number, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw errors.chartInput(chart, field, row, value, 'a finite number');
  return value;
}

/** Like `checkFinite`, but `undefined` and `null` pass through as `undefined`. */
export function checkOptionalFinite(chart: string, field: string, row: number, value: unknown): number | undefined {
  return value === undefined || value === null ? undefined : checkFinite(chart, field, row, value);
}

/** `value` as a non-empty label (strings as they are; finite numbers and booleans as text). */
export function checkLabel(chart: string, field: string, row: number, value: unknown): string {
  if (typeof value === 'string') return value;
  if ((typeof value === 'number' && Number.isFinite(value)) || typeof value === 'boolean') return String(value);
  throw errors.chartInput(chart, field, row, value, 'a label (string)');
}

/** Throw unless `got` equals `expected`. */
export function checkLength(chart: string, what: string, expected: number, got: number): void {
  if (expected !== got) throw errors.chartLengths(chart, what, expected, got);
}
