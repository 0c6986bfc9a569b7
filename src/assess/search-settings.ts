import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import { predictFrame } from '../learn/predict.js';
import type { Dataset } from '../table/frame.js';
import { derive } from '../util/rng.js';
import { fitAndScoreFold, resolveFolds, type FitContext, type PredictFunction, type SplitSetting } from './fit-fold.js';
import { findMetric } from './metrics/registry.js';
import { drawValue, gridValues, type SearchSpace, type Setting, type SettingValue } from './setting-ranges.js';
import { summarizeScores } from './summarize.js';

/** One fit: the setting's number and values, the fold, the score and the fit time. */
export type SearchRow = { readonly setting: number; readonly fold: number; readonly score: number; readonly fitMs: number }
  & Readonly<Record<string, SettingValue>>;

/** One setting over all folds. */
export type SettingSummaryRow = {
  readonly setting: number; readonly mean: number; readonly sd: number; readonly se: number; readonly rank: number;
} & Readonly<Record<string, SettingValue>>;

/** A chosen setting. */
export interface SettingChoice {
  readonly setting: number;
  readonly values: Setting;
  readonly mean: number;
  readonly se: number;
}

export interface SearchResult {
  readonly metric: string;
  readonly higherIsBetter: boolean;
  /** One row per setting × fold. */
  readonly table: SearchRow[];
  /** One row per setting with mean, sd, se over folds and rank (1 = best). */
  readonly summary: SettingSummaryRow[];
  /** The setting with the best mean score (ties: the earlier setting). */
  readonly best: SettingChoice;
  /** The least complex setting whose mean is within one standard error of the best; null without `complexity`. */
  readonly withinOneSe: SettingChoice | null;
}

export interface SearchOptions<M> {
  /** Metric to choose by. __Default:__ 'logLoss' (class target) or 'rmse' (numbers). */
  readonly metric?: string;
  /** Split plan or ready-made folds, the same for every setting. __Default:__ as `crossValidate`. */
  readonly split?: SplitSetting;
  /** Seed of the split, of random draws and of each fold's learner seed. __Default:__ 0. */
  readonly seed?: number;
  /** Predict a frame with a fitted model. __Default:__ `predictFrame`. */
  readonly predict?: PredictFunction<M>;
  /**
   * Complexity of a setting (larger = more complex, e.g. depth). When given, `withinOneSe` is the least
   * complex setting within one standard error of the best (the one-standard-error rule: Breiman, Friedman,
   * Olshen & Stone 1984, Classification and Regression Trees, ch. 3; Hastie, Tibshirani & Friedman 2009,
   * The Elements of Statistical Learning, 2nd ed., §7.10). __Default:__ none.
   */
  readonly complexity?: (setting: Setting) => number;
  /** Called after each fit: (fits done, total fits, that fit's row). __Default:__ none. */
  readonly onProgress?: (done: number, total: number, info: SearchRow) => void;
}

export interface RandomSearchOptions<M> extends SearchOptions<M> {
  /** Number of random settings drawn. __Default:__ 20. */
  readonly draws?: number;
}

type FitWith<M> = (train: Dataset, setting: Setting, context: FitContext) => M;

/**
 * Grid search: every combination of the listed values (and every integer of an `intRange`), each
 * cross-validated on the same folds.
 *
 * @param data - features, target and weights.
 * @param fit - fits a model with one setting: `(train, setting, context) => model`.
 * @param space - a range per setting name.
 * @example
 * const s = searchGrid(claims, (train, set, ctx) => fitTree(train, { depthLimit: set.depth as number, seed: ctx.seed }),
 *   { depth: intRange(1, 8) }, { metric: 'rmse', complexity: (set) => set.depth as number });
 * s.best.values; // { depth: 5 }
 */
export function searchGrid<M = ModelHeader>(data: Dataset, fit: FitWith<M>, space: SearchSpace, options: SearchOptions<M> = {}): SearchResult {
  let settings: Setting[] = [{}];
  for (const name of spaceNames(space)) {
    const values = gridValues(name, space[name]);
    settings = settings.flatMap((s) => values.map((v) => ({ ...s, [name]: v })));
  }
  return searchSettings(data, fit, settings, options);
}

/**
 * Random search: `draws` settings, each value drawn independently (lists uniformly, `intRange` uniformly,
 * `logRange` log-uniformly), from a generator derived from `seed` and the draw number.
 *
 * @example
 * const s = searchRandom(churn, (train, set, ctx) => fitTree(train, { leafRows: set.leaf as number, seed: ctx.seed }),
 *   { leaf: intRange(1, 50) }, { draws: 12, seed: 3 });
 */
export function searchRandom<M = ModelHeader>(
  data: Dataset, fit: FitWith<M>, space: SearchSpace, options: RandomSearchOptions<M> = {},
): SearchResult {
  const draws = options.draws ?? 20;
  if (!Number.isInteger(draws) || draws < 1) throw errors.badOption('draws', draws, 'an integer >= 1');
  const names = spaceNames(space);
  const settings: Setting[] = [];
  for (let d = 0; d < draws; d++) {
    const rng = derive(options.seed ?? 0, 0x5e4c, d);
    settings.push(Object.fromEntries(names.map((name) => [name, drawValue(name, space[name], rng)])));
  }
  return searchSettings(data, fit, settings, options);
}

const RESERVED = ['setting', 'fold', 'score', 'fitMs', 'mean', 'sd', 'se', 'rank'];

function spaceNames(space: SearchSpace): string[] {
  const names = Object.keys(space);
  if (names.length === 0) throw errors.badOption('space', {}, 'at least one setting');
  for (const n of names) if (RESERVED.includes(n)) throw errors.badOption('space', n, `a setting name other than ${RESERVED.join(', ')}`);
  return names;
}

/** Core: cross-validate each setting on one set of folds and choose. */
function searchSettings<M>(data: Dataset, fit: FitWith<M>, settings: readonly Setting[], options: SearchOptions<M>): SearchResult {
  if (typeof fit !== 'function') throw errors.badOption('fit', typeof fit, 'a function (train, setting, context) => model');
  const seed = options.seed ?? 0;
  const folds = resolveFolds(data, options.split, seed);
  const metric = options.metric ?? (data.target.kind === 'class' ? 'logLoss' : 'rmse');
  const entry = findMetric(metric);
  const predict = options.predict ?? (predictFrame as unknown as PredictFunction<M>);
  const table: SearchRow[] = [];
  const total = settings.length * folds.length;
  settings.forEach((values, s) => {
    for (const fold of folds) {
      const out = fitAndScoreFold(data, fold, seed, [metric], (train, ctx) => fit(train, values, ctx), predict);
      const row = { ...values, setting: s, fold: fold.fold, score: out.scores[metric], fitMs: out.fitMs } as SearchRow;
      table.push(row);
      options.onProgress?.(table.length, total, row);
    }
  });
  const sign = entry.higherIsBetter ? -1 : 1;
  const stats = settings.map((values, s) => ({ values, s, ...summarizeScores(table.filter((r) => r.setting === s).map((r) => r.score)) }));
  const byScore = (a: { mean: number; s: number }, b: { mean: number; s: number }): number =>
    Number.isNaN(a.mean) !== Number.isNaN(b.mean) ? (Number.isNaN(a.mean) ? 1 : -1) : sign * (a.mean - b.mean) || a.s - b.s;
  const order = [...stats].sort(byScore);
  const rankOf = new Map(order.map((x, i) => [x.s, i + 1]));
  const summary = stats.map((x) => ({ ...x.values, setting: x.s, mean: x.mean, sd: x.sd, se: x.se, rank: rankOf.get(x.s) as number }) as SettingSummaryRow);
  const top = order[0];
  if (Number.isNaN(top.mean)) throw errors.badOption('metric', metric, 'a metric with a number for some setting (all means are NaN)');
  const choice = (x: typeof top): SettingChoice => ({ setting: x.s, values: x.values, mean: x.mean, se: x.se });
  let withinOneSe: SettingChoice | null = null;
  if (options.complexity) {
    const limit = top.mean + sign * top.se;
    const near = stats.filter((x) => (entry.higherIsBetter ? x.mean >= limit : x.mean <= limit));
    const complexity = options.complexity;
    near.sort((a, b) => complexity(a.values) - complexity(b.values) || byScore(a, b));
    withinOneSe = choice(near[0]);
  }
  return { metric, higherIsBetter: entry.higherIsBetter, table, summary, best: choice(top), withinOneSe };
}
