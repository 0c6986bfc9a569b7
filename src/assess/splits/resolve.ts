/** Turn split inputs (dataset, frame or row count; column names or arrays) into plain per-row arrays. */
import { errors } from '../../errors.js';
import type { Dataset, Frame } from '../../table/frame.js';
import type { KeySource, SplitData } from './fold.js';

function isDataset(d: SplitData): d is Dataset {
  return typeof d === 'object' && 'features' in d;
}

function frameOf(d: SplitData): Frame | null {
  if (typeof d === 'number') return null;
  return isDataset(d) ? d.features : d;
}

/** Number of rows, validated. */
export function rowCountOf(data: SplitData): number {
  if (typeof data === 'number') {
    if (!Number.isInteger(data) || data < 0) throw errors.badOption('rows', data, 'an integer >= 0');
    return data;
  }
  return isDataset(data) ? data.features.nRows : data.nRows;
}

/** Class codes of a dataset's class target, or null. */
export function classCodesOf(data: SplitData): Int32Array | null {
  return typeof data === 'object' && isDataset(data) && data.target.kind === 'class' ? data.target.codes : null;
}

/** Raw per-row values of a key source: numbers (NaN missing) or strings (null missing). */
function rawKeys(data: SplitData, source: KeySource, option: string): ArrayLike<unknown> {
  const n = rowCountOf(data);
  if (typeof source === 'string') {
    const frame = frameOf(data);
    const col = frame?.columns.find((c) => c.name === source);
    if (!col) throw errors.missingColumn(source, `the data given for option ${option}`);
    if (col.kind !== 'categorical') return col.values;
    return Array.from(col.codes, (c) => (c < 0 ? null : c));
  }
  if (source.length !== n) throw errors.lengthMismatch(option, n, source.length);
  return source;
}

function isMissing(v: unknown): boolean {
  return v == null || (typeof v === 'number' && Number.isNaN(v)) || (v instanceof Date && Number.isNaN(v.getTime()));
}

/** Per-row key ids 0..g-1 (first-appearance order) for strata or groups; missing values are an error. */
export function resolveKeyIds(data: SplitData, source: KeySource, option: string): { ids: Int32Array; count: number } {
  const raw = rawKeys(data, source, option);
  const ids = new Int32Array(raw.length);
  const seen = new Map<unknown, number>();
  for (let i = 0; i < raw.length; i++) {
    const v = raw[i];
    if (isMissing(v)) throw errors.badValue(typeof source === 'string' ? source : option, i, v, 'a value (missing is not allowed)');
    const key = v instanceof Date ? v.getTime() : v;
    let id = seen.get(key);
    if (id === undefined) { id = seen.size; seen.set(key, id); }
    ids[i] = id;
  }
  return { ids, count: seen.size };
}

/** Per-row numeric order (numbers or dates); missing values are an error. */
export function resolveOrder(data: SplitData, source: KeySource, option: string): Float64Array {
  const raw = rawKeys(data, source, option);
  const name = typeof source === 'string' ? source : option;
  const out = new Float64Array(raw.length);
  for (let i = 0; i < raw.length; i++) {
    const v = raw[i];
    const x = v instanceof Date ? v.getTime() : v;
    if (typeof x !== 'number' || Number.isNaN(x)) throw errors.badValue(name, i, v, 'a number or date (not missing)');
    out[i] = x;
  }
  if (typeof source === 'string' && frameOf(data)?.columns.find((c) => c.name === source)?.kind === 'categorical') {
    throw errors.badOption(option, source, 'a numeric or date column');
  }
  return out;
}

/** Validate a fold count against the number of units (rows or groups) it divides. */
export function checkFoldCount(k: number, units: number, what: string): void {
  if (!Number.isInteger(k) || k < 2) throw errors.badOption('k', k, 'an integer >= 2');
  if (k > units) throw errors.badOption('k', k, `at most ${units} (the number of ${what})`);
}
