/**
 * A target column into class codes (classification) or numbers (regression).
 */
import { errors, show } from '../errors.js';
import type { Target } from './frame.js';
import { categoryText } from './encode-values.js';
import { isNumberText } from './text-values.js';
import { countValues } from './value-counts.js';

/** What is learned: class labels or numbers. */
export type TaskKind = 'classification' | 'regression';

/**
 * The task a target column implies: regression for numbers, classification for texts, booleans or a mix.
 * Dates and other values cannot be a target.
 *
 * @example inferTask('churned', [true, false]) // 'classification'
 */
export function inferTask(name: string, values: ArrayLike<unknown>): TaskKind {
  const c = countValues(values);
  if (c.dates > 0 || (c.isoStrings > 0 && c.isoStrings === c.strings && c.numbers + c.booleans === 0)) {
    throw errors.badTarget(name, 'dates cannot be a target; use a number or a label');
  }
  if (c.other > 0) throw errors.badTarget(name, 'holds values that are neither numbers, texts nor booleans');
  return c.strings + c.booleans > 0 ? 'classification' : 'regression';
}

function compareLabels(numeric: boolean) {
  return (a: string, b: string) => (numeric ? Number(a) - Number(b) : a < b ? -1 : a > b ? 1 : 0);
}

/**
 * Encode the rows `rows` (all when null) of a target column; those rows must have no missing value.
 * Classification: labels are the values' text (booleans as 'false'/'true'), classes sorted (numerically
 * when all labels are numbers, else by string value). Regression: numbers (number texts and booleans
 * accepted; ±Infinity refused). Error messages name the row's index in `values`.
 *
 * @example encodeTarget('tier', ['gold', 'basic', 'gold'], 'classification', null) // classes ['basic', 'gold'], codes [1, 0, 1]
 */
export function encodeTarget(name: string, values: ArrayLike<unknown>, task: TaskKind, rows: ArrayLike<number> | null): Target {
  const n = rows ? rows.length : values.length;
  const at = rows ? (i: number) => rows[i] : (i: number) => i;
  if (task === 'regression') {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const r = at(i);
      const v = values[r];
      const ok = typeof v === 'number' || typeof v === 'bigint' || typeof v === 'boolean' || (typeof v === 'string' && isNumberText(v));
      if (!ok) throw errors.badTarget(name, `regression needs numbers, but row ${r} holds ${show(v)}`);
      const x = typeof v === 'string' ? Number(v.trim()) : Number(v);
      if (!Number.isFinite(x)) throw errors.badValue(name, r, v, 'a finite number');
      out[i] = x;
    }
    return { kind: 'number', name, values: out };
  }
  const labels = new Array<string>(n);
  const distinct = new Set<string>();
  let allNumbers = true;
  for (let i = 0; i < n; i++) {
    const r = at(i);
    const v = values[r];
    if (typeof v === 'number' && !Number.isFinite(v)) throw errors.badValue(name, r, v, 'a class label');
    if (typeof v !== 'number' && typeof v !== 'bigint') allNumbers = false;
    labels[i] = categoryText(name, r, v);
    distinct.add(labels[i]);
  }
  const classes = [...distinct].sort(compareLabels(allNumbers));
  const index = new Map(classes.map((c, k) => [c, k] as const));
  const codes = Int32Array.from(labels, (l) => index.get(l)!);
  return { kind: 'class', name, codes, classes };
}
