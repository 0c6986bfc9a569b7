/**
 * A weight column into sample weights, refusing anything a learner could not use.
 */
import { errors } from '../errors.js';

/**
 * Sample weights from rows `rows` (all when null) of column `name`: each must be a finite number ≥ 0, and
 * their sum must be positive. Errors name the column and the row's index in `values`.
 *
 * @example readWeights('w', [1, 0.5, 2], null) // Float64Array [1, 0.5, 2]
 */
export function readWeights(name: string, values: ArrayLike<unknown>, rows: ArrayLike<number> | null): Float64Array {
  const n = rows ? rows.length : values.length;
  const out = new Float64Array(n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const r = rows ? rows[i] : i;
    const v = values[r];
    const x = typeof v === 'number' ? v : typeof v === 'bigint' ? Number(v) : NaN;
    if (!(x >= 0) || x === Infinity) throw errors.badValue(name, r, v, 'a finite weight ≥ 0');
    out[i] = x;
    total += x;
  }
  if (!(total > 0)) throw errors.badOption('weight', name, 'a column with some positive weight');
  return out;
}
