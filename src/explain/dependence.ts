/**
 * Partial dependence (Friedman, J. (2001) "Greedy function approximation: a gradient boosting machine",
 * Annals of Statistics 29(5), §8.2) and individual conditional expectation curves (Goldstein, Kapelner,
 * Bleich & Pitkin (2015) "Peeking inside the black box: visualizing statistical learning with plots of
 * individual conditional expectation", JCGS 24(1):44–65): set one feature to each grid value in every
 * row, predict, and average over the rows (partial dependence) or keep each row's curve (ICE).
 */
import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import type { Frame } from '../table/frame.js';
import { derive, shuffleInPlace } from '../util/rng.js';
import { followedOutput } from './dependence-output.js';
import { constantColumn, withColumn } from './frame-edit.js';
import { gridOf } from './grid-values.js';

/** Partial dependence on one feature, in the shape `chartDependence` draws. */
export interface DependenceCurves {
  readonly feature: string;
  readonly kind: 'numeric' | 'categorical';
  /** What is followed: the prediction, or a class probability. */
  readonly output: string;
  /** Average over rows at each grid value. */
  readonly points: readonly { readonly value: number | string; readonly average: number }[];
  /** ICE: the prediction of each sampled row at each grid value. */
  readonly curves: readonly { readonly row: number; readonly value: number | string; readonly prediction: number }[];
}

/** Options for `dependenceOn`. */
export interface DependenceOnOptions {
  /** Grid points for a numeric feature (quantiles). __Default:__ 20. */
  readonly gridSize?: number;
  /** Explicit grid: numbers, or category labels. __Default:__ quantiles or every category. */
  readonly grid?: readonly (number | string)[];
  /** Class whose probability is followed. __Default:__ the second of two classes, else the first. */
  readonly output?: string;
  /** Rows kept as ICE curves (a seeded sample; 0 for none). The average uses every row. __Default:__ 100. */
  readonly curveRows?: number;
  /** Seed of that sample. __Default:__ 0. */
  readonly seed?: number;
}

/**
 * Index of feature `name` in `frame`, which must be aligned to the model.
 * @example
 * featureIndex(model, frame, 'storage_hours'); // 0
 */
export function featureIndex(model: ModelHeader, frame: Frame, name: string): number {
  const j = model.features.findIndex((f) => f.name === name);
  if (j < 0) throw errors.unknownColumn(name, 'the model features');
  if (frame.columns[j]?.name !== name) throw errors.schemaMismatch(`column ${j + 1} should be ${JSON.stringify(name)}`);
  return j;
}

/**
 * A seeded sample of `m` of `n` rows, ascending (all rows when m ≥ n).
 * @example
 * sampleRows(1000, 5, 0); // five row numbers, the same for the same seed
 */
export function sampleRows(n: number, m: number, seed: number): Int32Array {
  if (m >= n) return Int32Array.from({ length: n }, (_, i) => i);
  const all = shuffleInPlace(derive(seed, 0x1ce), Int32Array.from({ length: n }, (_, i) => i));
  return all.slice(0, m).sort();
}

/**
 * Partial dependence and ICE curves of `model` on `feature` over the rows of `frame` (aligned to the model).
 * @param options `gridSize` (20), `grid`, `output`, `curveRows` (100), `seed` (0).
 * @example
 * const pd = dependenceOn(model, test.features, 'storage_hours', { output: 'spoiled' });
 * chartDependence(pd, { predictionName: pd.output });
 */
export function dependenceOn(model: ModelHeader, frame: Frame, feature: string, options: DependenceOnOptions = {}): DependenceCurves {
  const j = featureIndex(model, frame, feature);
  if (frame.nRows === 0) throw errors.emptyData('compute partial dependence');
  const curveRows = options.curveRows ?? 100;
  if (!(Number.isInteger(curveRows) && curveRows >= 0)) throw errors.badOption('curveRows', curveRows, 'an integer >= 0');
  const grid = gridOf(frame.columns[j], options.gridSize ?? 20, options.grid);
  const out = followedOutput(model, options.output);
  const kept = sampleRows(frame.nRows, curveRows, options.seed ?? 0);
  const points: { value: number | string; average: number }[] = [];
  const curves: { row: number; value: number | string; prediction: number }[] = [];
  grid.set.forEach((v, g) => {
    const pred = out.of(withColumn(frame, j, constantColumn(frame.columns[j], frame.nRows, v)));
    let sum = 0;
    for (let i = 0; i < pred.length; i++) sum += pred[i];
    points.push({ value: grid.shown[g], average: sum / pred.length });
    for (const r of kept) curves.push({ row: r, value: grid.shown[g], prediction: pred[r] });
  });
  return { feature, kind: grid.kind, output: out.name, points, curves };
}
