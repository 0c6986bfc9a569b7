/**
 * Ranges of numeric features: what a model was fitted on, so scoring can flag values outside it.
 */
import type { Frame } from './frame.js';

/** `{ [feature]: [min, max] }` over non-missing values of numeric and boolean columns. */
export type TrainingRanges = Readonly<Record<string, readonly [number, number]>>;

/**
 * [min, max] of every numeric or boolean column of `frame` over its non-missing values (columns with
 * none are left out).
 * @example
 * featureRangesOf(train.features); // { storage_hours: [0, 96], bruised: [0, 1] }
 */
export function featureRangesOf(frame: Frame): TrainingRanges {
  const out: Record<string, [number, number]> = {};
  for (const c of frame.columns) {
    if (c.kind === 'categorical') continue;
    const values = c.values;
    let lo = Infinity, hi = -Infinity;
    for (let i = 0; i < values.length; i++) {
      const v = values[i]; // NaN fails both comparisons: missing values are skipped
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    if (lo <= hi) out[c.name] = [lo, hi];
  }
  return out;
}
