/**
 * Typing of text cells read from delimited files: a column becomes booleans, numbers, dates or stays
 * text, judged on every non-missing cell (not a sample), so a late odd value cannot be silently coerced.
 */
import { parseIsoDate } from './iso-date.js';

/** What a text column was read as. */
export type TextKind = 'boolean' | 'number' | 'date' | 'text' | 'missing';

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const SPECIAL = new Set(['NaN', 'Infinity', '+Infinity', '-Infinity']);

/**
 * True when `text` reads as a decimal number (also NaN and ±Infinity; surrounding spaces allowed).
 *
 * @example isNumberText(' -1.5e3 ') // true
 */
export function isNumberText(text: string): boolean {
  const t = text.trim();
  return NUMBER.test(t) || SPECIAL.has(t);
}

function isBooleanText(text: string): boolean {
  const t = text.trim().toLowerCase();
  return t === 'true' || t === 'false';
}

/**
 * The kind a column of texts reads as (null = missing): boolean when every cell is true/false (any case),
 * number when every cell is a decimal number, date when every cell is an ISO date, otherwise text.
 *
 * @example textKind(['1', null, '2.5']) // 'number'
 */
export function textKind(cells: readonly (string | null)[]): TextKind {
  let bool = true, num = true, date = true, any = false;
  for (const c of cells) {
    if (c === null) continue;
    any = true;
    if (bool && !isBooleanText(c)) bool = false;
    if (num && !isNumberText(c)) num = false;
    if (date && Number.isNaN(parseIsoDate(c))) date = false;
    if (!bool && !num && !date) return 'text';
  }
  if (!any) return 'missing';
  return bool ? 'boolean' : num ? 'number' : date ? 'date' : 'text';
}

/**
 * Convert a column of texts to values of `kind`: booleans, numbers (Number of the trimmed text), Dates
 * (read as by `parseIsoDate`), or the texts themselves. Missing cells stay null.
 *
 * @example typeTextCells(['true', null], 'boolean') // [true, null]
 */
export function typeTextCells(cells: readonly (string | null)[], kind: TextKind): unknown[] {
  switch (kind) {
    case 'boolean': return cells.map((c) => (c === null ? null : c.trim().toLowerCase() === 'true'));
    case 'number': return cells.map((c) => (c === null ? null : Number(c.trim())));
    case 'date': return cells.map((c) => (c === null ? null : new Date(parseIsoDate(c))));
    case 'missing': return cells.map(() => null);
    case 'text': return cells.slice();
  }
}
