/**
 * Validation of a grow task for the histogram grower: the same rules and messages as the exact grower
 * (src/learn/tree/grow-exact.ts and grow-context.ts), so both engines reject the same bad input.
 */
import { errors } from '../../errors.js';
import { checkGrowSettings } from '../check-grow-settings.js';
import type { GrowTask } from '../grow-task.js';

/** Throw on bad settings, weights or responses; returns the rows with positive weight, ascending. */
export function checkHistTask(task: GrowTask): Int32Array {
  checkGrowSettings(task.settings);
  const { frame, weights, response } = task;
  const n = frame.nRows;
  if (weights.length !== n) throw errors.badOption('weights', `length ${weights.length}`, `length ${n} (one per row)`);
  if (response.kind === 'value' && response.values.length !== n) {
    throw errors.badOption('response.values', `length ${response.values.length}`, `length ${n}`);
  }
  const all = new Int32Array(n);
  const y = response.kind === 'value' ? response.values : null;
  let nPos = 0;
  for (let i = 0; i < n; i++) {
    const wi = weights[i];
    if (!(wi >= 0) || wi === Infinity) throw errors.badValue('weights', i, wi, 'a finite non-negative weight');
    if (wi > 0) {
      // numbers are checked in the same pass (row order), so the first bad row is the one named
      if (y !== null && y[i] - y[i] !== 0) throw errors.badValue('target', i, y[i], 'a finite number');
      all[nPos++] = i;
    }
  }
  if (nPos === 0) throw errors.emptyData('grow a tree (no row has a positive weight)');
  const base = all.subarray(0, nPos);
  if (response.kind === 'class') {
    const k = response.nClasses;
    if (response.codes.length !== n) throw errors.badOption('response.codes', `length ${response.codes.length}`, `length ${n}`);
    if (!(k >= 1)) throw errors.badOption('response.nClasses', k, 'at least 1');
    const codes = response.codes;
    for (let i = 0; i < nPos; i++) {
      const r = base[i], c = codes[r];
      if (!(c >= 0 && c < k)) throw errors.badValue('target', r, c, `a class code in 0..${k - 1}`);
    }
  }
  return base;
}
