/**
 * What a column of plain values holds, and the kind of Frame column it becomes.
 */
import { isIsoDateText } from './iso-date.js';

/** Tallies of a column's values by type (each value counted once). */
export interface ValueCounts {
  readonly n: number;
  /** null, undefined, '', NaN or an invalid Date. */
  readonly missing: number;
  /** Finite numbers and bigints. */
  readonly numbers: number;
  /** ±Infinity. */
  readonly infinite: number;
  readonly booleans: number;
  /** Non-empty strings, of which `isoStrings` read as ISO dates. */
  readonly strings: number;
  readonly isoStrings: number;
  /** Valid Date objects. */
  readonly dates: number;
  /** Anything else (objects, arrays, functions, symbols). */
  readonly other: number;
}

/** The kind a column is encoded as: `date` expands into numeric date-part columns. */
export type EncodedKind = 'numeric' | 'boolean' | 'categorical' | 'date';

/** A forced kind from the options (`dates` forces `date`). */
export type ForcedKind = 'numeric' | 'categorical' | 'date';

/**
 * True when `v` counts as missing: null, undefined, '', NaN or an invalid Date.
 *
 * @example isMissingValue('') // true
 */
export function isMissingValue(v: unknown): boolean {
  if (v === null || v === undefined || v === '') return true;
  if (typeof v === 'number') return Number.isNaN(v);
  if (v instanceof Date) return Number.isNaN(v.getTime());
  return false;
}

/**
 * Count a column's values by type.
 *
 * @example countValues([1, 'a', null]).strings // 1
 */
export function countValues(values: ArrayLike<unknown>): ValueCounts {
  let missing = 0, numbers = 0, infinite = 0, booleans = 0, strings = 0, isoStrings = 0, dates = 0, other = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isMissingValue(v)) missing++;
    else if (typeof v === 'number') { if (Number.isFinite(v)) numbers++; else infinite++; }
    else if (typeof v === 'bigint') numbers++;
    else if (typeof v === 'boolean') booleans++;
    else if (typeof v === 'string') { strings++; if (isIsoDateText(v)) isoStrings++; }
    else if (v instanceof Date) dates++;
    else other++;
  }
  return { n: values.length, missing, numbers, infinite, booleans, strings, isoStrings, dates, other };
}

/** The chosen kind and, for a judgement call worth showing, a short note. */
export interface KindChoice {
  readonly kind: EncodedKind;
  readonly note?: string;
}

/**
 * A short account of what a column holds.
 *
 * @example describeValues(countValues([1, 2, 'a'])) // '2 numbers, 1 texts'
 */
export function describeValues(c: ValueCounts): string {
  const parts: string[] = [];
  if (c.numbers + c.infinite) parts.push(`${c.numbers + c.infinite} numbers`);
  if (c.strings) parts.push(`${c.strings} texts`);
  if (c.booleans) parts.push(`${c.booleans} booleans`);
  if (c.dates) parts.push(`${c.dates} dates`);
  if (c.other) parts.push(`${c.other} other values`);
  return parts.join(', ');
}

/**
 * Choose the Frame kind for a column: a forced kind wins; otherwise all numbers → numeric, all booleans →
 * boolean, all Dates or ISO date texts → date, all texts → categorical, a mix → categorical with a note,
 * nothing present → numeric (all missing) with a note.
 *
 * @example chooseKind(countValues([1, 'a'])) // { kind: 'categorical', note: 'mixed values (1 numbers, 1 texts) read as categorical' }
 */
export function chooseKind(c: ValueCounts, forced?: ForcedKind): KindChoice {
  if (forced) return { kind: forced };
  const present = c.n - c.missing;
  if (present === 0) return { kind: 'numeric', note: c.n === 0 ? 'no rows' : 'all missing' };
  if (c.numbers + c.infinite === present) return { kind: 'numeric' };
  if (c.booleans === present) return { kind: 'boolean' };
  if (c.dates + c.isoStrings === present) return { kind: 'date' };
  if (c.strings === present) return { kind: 'categorical' };
  return { kind: 'categorical', note: `mixed values (${describeValues(c)}) read as categorical` };
}
