/**
 * Permutation importance (Breiman, L. (2001) "Random forests", Machine Learning 45:5–32, §10; Fisher,
 * Rudin & Dominici (2019) "All models are wrong, but many are useful", JMLR 20(177), "model reliance"):
 * how much a metric worsens when one feature's values (or a group's, jointly) are shuffled across the
 * rows, breaking its link with the target while keeping its distribution. Numeric values and category
 * codes are shuffled alike. Each feature is shuffled `repeats` times (seeded per feature and repeat).
 */
import { errors } from '../errors.js';
import { defaultMetrics, findMetric } from '../assess/metrics/registry.js';
import type { ModelHeader } from '../learn/model.js';
import { takeDataset } from '../table/dataset.js';
import type { Dataset } from '../table/frame.js';
import { derive, shuffleInPlace } from '../util/rng.js';
import { permutedColumn, withColumn } from './frame-edit.js';
import { predictModel } from './predict-model.js';
import { studentQuantile } from './student-t.js';
import { quantileSorted } from './quantile.js';

/** Importance of one feature or group: mean worsening of the metric, with an interval. */
export interface PermutationRow {
  readonly feature: string;
  /** Mean over repeats of the metric's worsening (positive: the model relies on the feature). */
  readonly value: number;
  readonly low: number;
  readonly high: number;
  /** Standard deviation of the worsening over repeats (0 with one repeat). */
  readonly sd: number;
}

export interface PermutationTable {
  readonly metric: string;
  /** The metric on the unshuffled rows. */
  readonly baseline: number;
  readonly repeats: number;
  /** How `low` and `high` were made, in words. */
  readonly interval: string;
  /** One row per feature or group, largest value first (ties by name). */
  readonly rows: readonly PermutationRow[];
}

/** Options for `importanceByPermutation`. */
export interface PermutationOptions {
  /** Metric from the assess registry. __Default:__ 'accuracy' (classes) or 'rmse' (numbers). */
  readonly metric?: string;
  /** Shuffles per feature. __Default:__ 5. */
  readonly repeats?: number;
  /** Seed of the shuffles. __Default:__ 0. */
  readonly seed?: number;
  /** Rows of `data` to use (e.g. a fold's test rows). __Default:__ every row. */
  readonly rows?: ArrayLike<number>;
  /** Features to measure. __Default:__ every model feature. */
  readonly features?: readonly string[];
  /** Named groups of features shuffled together (replaces `features`). __Default:__ none. */
  readonly groups?: Readonly<Record<string, readonly string[]>>;
  /**
   * 'student': mean ± t(r−1, (1+level)/2) · sd / √r; 'percentile': the (1−level)/2 and (1+level)/2
   * quantiles of the repeats. __Default:__ 'student'.
   */
  readonly interval?: 'student' | 'percentile';
  /** Interval level. __Default:__ 0.95. */
  readonly level?: number;
}

/**
 * Permutation importance of each feature (or group) for `model` on `data`, scored with a registry metric.
 * `data.features` must be aligned to the model's features. Rows with a missing target are left out.
 * @param options `metric`, `repeats` (5), `seed` (0), `rows`, `features`, `groups`, `interval` ('student'), `level` (0.95).
 * @example
 * const imp = importanceByPermutation(forest, test, { metric: 'logLoss', repeats: 10 });
 * chartImportance(imp.rows, { valueName: 'increase in log loss when shuffled' });
 */
export function importanceByPermutation(model: ModelHeader, data: Dataset, options: PermutationOptions = {}): PermutationTable {
  const metric = findMetric(options.metric ?? defaultMetrics(model.task)[0]);
  if (metric.task !== model.task) throw errors.metricTask(metric.name, model.task);
  const repeats = options.repeats ?? 5;
  if (!(Number.isInteger(repeats) && repeats >= 1)) throw errors.badOption('repeats', repeats, 'an integer >= 1');
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw errors.badOption('level', level, 'a number strictly between 0 and 1');
  const intervalKind = options.interval ?? 'student';
  if (intervalKind !== 'student' && intervalKind !== 'percentile') throw errors.badOption('interval', intervalKind, "'student' or 'percentile'");
  const seed = options.seed ?? 0;
  const groups = groupsOf(model, options);
  const used = usableRows(data, options.rows);
  if (used.length === 0) throw errors.emptyData('measure permutation importance');
  const d = takeDataset(data, used);
  const frame = d.features;
  const baseline = metric.score(d.target, predictModel(model, frame), d.weights);
  const sign = metric.higherIsBetter ? 1 : -1;
  const rows: PermutationRow[] = groups.map(([name, cols], g) => {
    const drops: number[] = [];
    for (let r = 0; r < repeats; r++) {
      const order = shuffleInPlace(derive(seed, g, r), Int32Array.from({ length: frame.nRows }, (_, i) => i));
      let f = frame;
      for (const j of cols) f = withColumn(f, j, permutedColumn(frame.columns[j], order));
      drops.push(sign * (baseline - metric.score(d.target, predictModel(model, f), d.weights)));
    }
    return summarize(name, drops, intervalKind, level);
  });
  rows.sort((a, b) => b.value - a.value || a.feature.localeCompare(b.feature));
  const interval = intervalKind === 'student'
    ? `mean ± t(${repeats - 1}, ${(1 + level) / 2}) · sd / √${repeats}`
    : `${(100 * (1 - level)) / 2}th to ${(100 * (1 + level)) / 2}th percentile of ${repeats} repeats`;
  return { metric: metric.name, baseline, repeats, interval, rows };
}

function summarize(feature: string, drops: number[], kind: 'student' | 'percentile', level: number): PermutationRow {
  const r = drops.length;
  const mean = drops.reduce((a, b) => a + b, 0) / r;
  const sd = r > 1 ? Math.sqrt(drops.reduce((a, b) => a + (b - mean) ** 2, 0) / (r - 1)) : 0;
  if (kind === 'percentile') {
    const sorted = drops.slice().sort((a, b) => a - b);
    return { feature, value: mean, low: quantileSorted(sorted, (1 - level) / 2), high: quantileSorted(sorted, (1 + level) / 2), sd };
  }
  const half = r > 1 ? (studentQuantile(level, r - 1) * sd) / Math.sqrt(r) : 0;
  return { feature, value: mean, low: mean - half, high: mean + half, sd };
}

function groupsOf(model: ModelHeader, options: PermutationOptions): [string, number[]][] {
  const names = model.features.map((f) => f.name);
  const index = (c: string): number => {
    const j = names.indexOf(c);
    if (j < 0) throw errors.unknownColumn(c, 'the model features');
    return j;
  };
  if (options.groups) {
    const out = Object.entries(options.groups).map(([g, cols]): [string, number[]] => {
      if (!Array.isArray(cols) || cols.length === 0) throw errors.badOption(`groups.${g}`, cols, 'a non-empty list of feature names');
      return [g, cols.map(index)];
    });
    if (out.length === 0) throw errors.badOption('groups', options.groups, 'at least one group');
    return out;
  }
  const feats = options.features ?? names;
  return feats.map((c) => [c, [index(c)]]);
}

function usableRows(data: Dataset, rows: ArrayLike<number> | undefined): number[] {
  const n = data.features.nRows;
  const t = data.target;
  const out: number[] = [];
  const pick = rows ?? Array.from({ length: n }, (_, i) => i);
  for (let i = 0; i < pick.length; i++) {
    const r = pick[i];
    if (!(Number.isInteger(r) && r >= 0 && r < n)) throw errors.badOption('rows', r, `row numbers from 0 to ${n - 1}`);
    const missing = t.kind === 'class' ? t.codes[r] < 0 : Number.isNaN(t.values[r]);
    if (!missing) out.push(r);
  }
  return out;
}
