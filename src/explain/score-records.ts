/**
 * Scored rows as a table to write: kept input columns, the prediction, class probabilities and notes,
 * as CSV (RFC 4180 quoting) or JSON records.
 */
import type { ModelHeader, Predictions } from '../learn/model.js';

export interface ScoreColumns {
  readonly names: readonly string[];
  /** Column-major values: one array per name. */
  readonly values: readonly (readonly unknown[])[];
}

/**
 * Output columns: `keep` columns first (values as read), then `predicted_<target>` (class label or
 * number), `p_<class>` per class (classification), and `notes`.
 * @example
 * scoreColumns(model, predictions, notes, [['order_id', ids]]).names; // ['order_id', 'predicted_condition', 'p_fresh', ...]
 */
export function scoreColumns(
  model: ModelHeader, p: Predictions, notes: readonly string[], keep: readonly (readonly [string, ArrayLike<unknown>])[] = [],
): ScoreColumns {
  const names: string[] = [], values: unknown[][] = [];
  const add = (name: string, v: unknown[]): void => {
    let unique = name;
    for (let k = 2; names.includes(unique); k++) unique = `${name}_${k}`;
    names.push(unique); values.push(v);
  };
  for (const [name, v] of keep) add(name, Array.from(v));
  const target = model.target.name;
  if (p.task === 'classification') {
    add(`predicted_${target}`, Array.from(p.value, (k) => p.classes[k] ?? null));
    const K = p.classes.length;
    p.classes.forEach((c, k) => add(`p_${c}`, Array.from({ length: p.n }, (_, i) => p.proba[i * K + k])));
  } else {
    add(`predicted_${target}`, Array.from(p.value));
  }
  add('notes', [...notes]);
  return { names, values };
}

function csvField(v: unknown): string {
  if (v === null || v === undefined || (typeof v === 'number' && Number.isNaN(v))) return '';
  const s = v instanceof Date ? v.toISOString() : String(v);
  return /[",\r\n]/.test(s) || s !== s.trim() ? `"${s.replace(/"/g, '""')}"` : s;
}

/**
 * The columns as CSV text with a header line (fields quoted when they hold a comma, quote, line break or
 * outer spaces; RFC 4180). NaN and missing values are empty fields.
 * @example
 * toCsvText({ names: ['a'], values: [[1, 2]] }); // 'a\n1\n2\n'
 */
export function toCsvText(t: ScoreColumns): string {
  const n = t.values[0]?.length ?? 0;
  const lines = [t.names.map(csvField).join(',')];
  for (let i = 0; i < n; i++) lines.push(t.values.map((v) => csvField(v[i])).join(','));
  return `${lines.join('\n')}\n`;
}

/**
 * The columns as a JSON array of records (NaN written as null).
 * @example
 * toJsonText({ names: ['a'], values: [[1, NaN]] }); // '[{"a":1},{"a":null}]\n'
 */
export function toJsonText(t: ScoreColumns): string {
  const n = t.values[0]?.length ?? 0;
  const rows: Record<string, unknown>[] = [];
  for (let i = 0; i < n; i++) {
    const r: Record<string, unknown> = {};
    t.names.forEach((name, j) => {
      const v = t.values[j][i];
      r[name] = typeof v === 'number' && !Number.isFinite(v) ? null : v ?? null;
    });
    rows.push(r);
  }
  return `${JSON.stringify(rows)}\n`;
}
