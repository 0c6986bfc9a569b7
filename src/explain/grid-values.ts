/**
 * Grid values of one feature for partial dependence: quantiles of a numeric column, or its categories.
 */
import { errors } from '../errors.js';
import type { Column } from '../table/frame.js';
import { quantileSorted } from './quantile.js';

/** A grid: the values set in the frame (numbers or category codes) and how to show them. */
export interface FeatureGrid {
  readonly kind: 'numeric' | 'categorical';
  /** Value written into the column: a number, or a category code. */
  readonly set: readonly number[];
  /** Value shown: the number, or the category label. */
  readonly shown: readonly (number | string)[];
}

/**
 * Grid for `column`: for numbers, `size` quantiles from the minimum to the maximum of the non-missing
 * values (Hyndman & Fan 1996, definition 7), duplicates removed — every distinct value when there are at
 * most `size`; for categories, every category of the dictionary. An explicit `values` list overrides.
 * @example
 * gridOf(col, 20).shown; // [0.01, 0.06, ..., 0.99]
 */
export function gridOf(column: Column, size: number, values?: readonly (number | string)[]): FeatureGrid {
  if (!(Number.isInteger(size) && size >= 2)) throw errors.badOption('gridSize', size, 'an integer >= 2');
  if (column.kind === 'categorical') {
    const labels = values ?? column.categories;
    const set = labels.map((v) => {
      const k = column.categories.indexOf(String(v));
      if (k < 0) throw errors.badOption('grid', v, `a category of ${column.name}: ${column.categories.join(', ')}`);
      return k;
    });
    if (set.length === 0) throw errors.noGrid(column.name);
    return { kind: 'categorical', set, shown: set.map((k) => column.categories[k]) };
  }
  if (values) {
    const nums = values.map((v) => {
      if (typeof v !== 'number' || !Number.isFinite(v)) throw errors.badOption('grid', v, `finite numbers for ${column.name}`);
      return v;
    });
    if (nums.length === 0) throw errors.noGrid(column.name);
    return { kind: 'numeric', set: nums, shown: nums };
  }
  const sorted = Float64Array.from(column.values.filter((v) => !Number.isNaN(v))).sort();
  if (sorted.length === 0) throw errors.noGrid(column.name);
  const distinct = [...new Set(sorted)];
  const set = distinct.length <= size ? distinct : [...new Set(Array.from({ length: size }, (_, i) => quantileSorted(sorted, i / (size - 1))))];
  return { kind: 'numeric', set, shown: set };
}
