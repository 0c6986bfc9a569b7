/**
 * Typed value columns into an arquero table, applying the reading options shared by every text-like
 * format: which cell texts mean missing, and which columns keep their text untyped.
 */
import { table, type ColumnTable } from 'arquero';
import { errors } from '../errors.js';
import { isIsoDateText, parseIsoDate } from './iso-date.js';
import { textKind, typeTextCells } from './text-values.js';

/** Reading options shared by delimited text and JSON. */
export interface CellOptions {
  /** Cell texts read as missing (compared after trimming spaces). __Default:__ `['']` */
  readonly missingText?: readonly string[];
  /** Columns whose cells stay text: no number, boolean or date typing. __Default:__ `[]` */
  readonly keepText?: readonly string[];
}

function checkNames(names: readonly string[], keepText: readonly string[]): void {
  const known = new Set(names);
  for (const k of keepText) if (!known.has(k)) throw errors.unknownColumn(k, 'option keepText');
}

function missingSet(options: CellOptions): Set<string> {
  const list = options.missingText ?? [''];
  if (!Array.isArray(list) || list.some((t) => typeof t !== 'string')) {
    throw errors.badOption('missingText', list, 'an array of strings');
  }
  return new Set(list.map((t) => t.trim()));
}

/** True when a cell's text, spaces trimmed, is one of the missing texts. */
function isMissingText(text: string, missing: Set<string>): boolean {
  if (missing.has(text)) return true;
  const n = text.length;
  return n > 0 && (text.charCodeAt(0) <= 32 || text.charCodeAt(n - 1) <= 32) && missing.has(text.trim());
}

/**
 * A table from columns of raw cell texts (null = missing), typing each column by `textKind`.
 *
 * @example tableFromTexts(['a'], [['1', '']]).array('a') // [1, null]
 */
export function tableFromTexts(names: readonly string[], cells: readonly (readonly (string | null)[])[], options: CellOptions = {}): ColumnTable {
  const keep = new Set(options.keepText ?? []);
  checkNames(names, [...keep]);
  const missing = missingSet(options);
  const columns: Record<string, unknown[]> = {};
  names.forEach((name, k) => {
    const col = cells[k].map((c) => (c === null || isMissingText(c, missing) ? null : c));
    columns[name] = keep.has(name) ? col : typeTextCells(col, textKind(col));
  });
  return table(columns, [...names]);
}

/**
 * A table from columns of JSON values: strings listed in `missingText` become null, and a column whose
 * every non-missing value is an ISO date text becomes Dates (unless kept as text). Other values are kept
 * as they are (numbers stay numbers, strings stay strings).
 *
 * @example tableFromValues(['d'], [['2012-01-01', null]]).array('d') // [Date 2012-01-01, null]
 */
export function tableFromValues(names: readonly string[], values: unknown[][], options: CellOptions = {}): ColumnTable {
  const keep = new Set(options.keepText ?? []);
  checkNames(names, [...keep]);
  const missing = missingSet(options);
  const columns: Record<string, unknown[]> = {};
  names.forEach((name, k) => {
    const col = values[k].map((v) => (v === undefined || (typeof v === 'string' && isMissingText(v, missing)) ? null : v));
    const dates = !keep.has(name) && col.some((v) => v !== null) && col.every((v) => v === null || isIsoDateText(v));
    columns[name] = dates ? col.map((v) => (v === null ? null : new Date(parseIsoDate(v as string)))) : col;
  });
  return table(columns, [...names]);
}
