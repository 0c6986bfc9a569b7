import { errors } from '../errors.js';
import type { ModelHeader, Predictions } from '../learn/model.js';
import { predictFrame } from '../learn/predict.js';
import { takeDataset } from '../table/dataset.js';
import type { Dataset } from '../table/frame.js';
import { derive } from '../util/rng.js';
import type { PredictFunction } from './fit-fold.js';
import type { Setting, SettingValue } from './setting-ranges.js';

/** What the fit function learns about the resample it is fitting. */
export interface ResampleContext {
  /** Resample number 0..resamples-1. */
  readonly resample: number;
  /** A seed for this resample's learner. */
  readonly seed: number;
}

/**
 * Regression row: mse = biasSquared + variance + noise, exactly, averaged over test rows.
 * Classification row (0-1 loss, Domingos 2000): loss = bias + netVariance, exactly.
 */
export type BiasVarianceRow = { readonly setting: number; readonly resamples: number } & Readonly<Record<string, SettingValue>>;

export interface BiasVarianceOptions<M> {
  /** Number of bootstrap resamples of the training set. __Default:__ 30. */
  readonly resamples?: number;
  /** Seed of the resampling (the same resamples serve every setting). __Default:__ 0. */
  readonly seed?: number;
  /**
   * Regression: the known noise variance σ² of the target (e.g. 1 for Friedman #1). When given, it is
   * reported as `noise` and subtracted from bias². __Default:__ none — bias² then includes the noise.
   */
  readonly noiseVariance?: number;
  /** Predict a frame with a fitted model. __Default:__ `predictFrame`. */
  readonly predict?: PredictFunction<M>;
  /** Called after each fit: (fits done, total fits). __Default:__ none. */
  readonly onProgress?: (done: number, total: number) => void;
}

/**
 * Bias–variance decomposition by bootstrap: for each setting, fit on `resamples` bootstrap resamples of
 * `train` (the same resamples for every setting), predict the fixed `test` rows, and decompose the test
 * error per row, then average over test rows (unweighted).
 *
 * Regression (squared error), with ȳ_i the mean prediction over resamples for test row i:
 * `mse` = mean (ŷ − y)²; `biasSquared` = mean (ȳ_i − y_i)² − σ²; `variance` = mean over rows of the
 * variance (denominator B) of the predictions across resamples; `noise` = σ² when `noiseVariance` is given,
 * else 0, in which case `biasSquared` includes the noise (`noiseInBias` true).
 *
 * Classification (0-1 loss): the decomposition of Domingos (2000), "A unified bias-variance decomposition
 * for zero-one and squared loss", Proc. AAAI 2000, taking the noise as zero. The main
 * prediction is the most frequent class across resamples (ties: the lowest class code); `bias` is the
 * share of rows whose main prediction is wrong; `variance` the mean share of predictions differing from
 * the main one; `netVariance` = `unbiasedVariance` − `biasedVariance`, where the biased part weighs each
 * biased row's variance by P(prediction = y | prediction ≠ main) (1 for two classes); `loss` = `bias` +
 * `netVariance`.
 *
 * @param train - rows to resample and fit on.
 * @param test - fixed rows to predict.
 * @param fit - `(train, setting, context) => model`.
 * @param settings - the complexity settings to compare, e.g. `[{ depth: 1 }, { depth: 4 }]`.
 * @example
 * const rows = biasVariance(train, test, (d, s, ctx) => fitTree(d, { depthLimit: s.depth as number }),
 *   [1, 2, 4, 8].map((depth) => ({ depth })), { resamples: 25, noiseVariance: 1 });
 * // [{ setting: 0, depth: 1, mse: 9.8, biasSquared: 7.9, variance: 0.9, noise: 1, ... }, ...]
 */
export function biasVariance<M = ModelHeader>(
  train: Dataset, test: Dataset, fit: (train: Dataset, setting: Setting, context: ResampleContext) => M,
  settings: readonly Setting[], options: BiasVarianceOptions<M> = {},
): BiasVarianceRow[] {
  const resamples = options.resamples ?? 30;
  if (!Number.isInteger(resamples) || resamples < 2) throw errors.badOption('resamples', resamples, 'an integer >= 2');
  if (train.features.nRows === 0) throw errors.emptyData('resample (training set)');
  if (test.features.nRows === 0) throw errors.emptyData('predict (test set)');
  if (settings.length === 0) throw errors.badOption('settings', [], 'at least one setting');
  if (train.target.kind !== test.target.kind) throw errors.badTarget(test.target.name, 'train and test targets differ in kind');
  const sigma2 = options.noiseVariance;
  if (sigma2 !== undefined && (train.target.kind !== 'number' || !(sigma2 >= 0) || !Number.isFinite(sigma2))) {
    throw errors.badOption('noiseVariance', sigma2, 'a finite number >= 0, for a numeric target');
  }
  const predict = options.predict ?? (predictFrame as unknown as PredictFunction<M>);
  const seed = options.seed ?? 0;
  const n = train.features.nRows, m = test.features.nRows;
  const samples = Array.from({ length: resamples }, (_, b) => {
    const rng = derive(seed, 0xb5, b);
    return Int32Array.from({ length: n }, () => rng.int(n));
  });
  const total = settings.length * resamples;
  let done = 0;
  return settings.map((setting, s) => {
    const predictions = new Float64Array(resamples * m);
    samples.forEach((rows, b) => {
      const model = fit(takeDataset(train, rows), setting, { resample: b, seed: derive(seed, 0xb6, b).nextU32() });
      const p: Predictions = predict(model, test.features);
      if (p.n !== m) throw errors.lengthMismatch('predictions', m, p.n);
      predictions.set(p.value, b * m);
      options.onProgress?.(++done, total);
    });
    const parts = test.target.kind === 'number'
      ? squaredParts(test.target.values, predictions, resamples, sigma2)
      : zeroOneParts(test.target.codes, predictions, resamples);
    return { ...setting, setting: s, resamples, ...parts } as BiasVarianceRow;
  });
}

/** Squared-error parts; `pred` holds resample b's prediction for row i at b*m + i. */
export function squaredParts(y: Float64Array, pred: Float64Array, b: number, sigma2: number | undefined): Record<string, number | boolean> {
  const m = y.length;
  let mse = 0, bias2 = 0, variance = 0;
  for (let i = 0; i < m; i++) {
    let mean = 0;
    for (let r = 0; r < b; r++) mean += pred[r * m + i];
    mean /= b;
    let v = 0, e = 0;
    for (let r = 0; r < b; r++) { const p = pred[r * m + i]; v += (p - mean) ** 2; e += (p - y[i]) ** 2; }
    mse += e / b; variance += v / b; bias2 += (mean - y[i]) ** 2;
  }
  const noise = sigma2 ?? 0;
  return { mse: mse / m, biasSquared: bias2 / m - noise, variance: variance / m, noise, noiseInBias: sigma2 === undefined };
}

/** Domingos (2000) zero-one parts; `pred` holds class codes. */
export function zeroOneParts(y: Int32Array, pred: Float64Array, b: number): Record<string, number> {
  const m = y.length;
  let loss = 0, bias = 0, variance = 0, unbiased = 0, biased = 0;
  const counts = new Map<number, number>();
  for (let i = 0; i < m; i++) {
    counts.clear();
    for (let r = 0; r < b; r++) { const c = pred[r * m + i]; counts.set(c, (counts.get(c) ?? 0) + 1); }
    let main = -1, top = -1;
    for (const [c, k] of counts) if (k > top || (k === top && c < main)) { main = c; top = k; }
    const v = 1 - top / b;
    const hitY = counts.get(y[i]) ?? 0;
    loss += 1 - hitY / b;
    variance += v;
    if (main === y[i]) unbiased += v;
    else { bias += 1; biased += v > 0 ? hitY / b : 0; }  // v · P(ŷ = y | ŷ ≠ main) = P(ŷ = y)
  }
  return {
    loss: loss / m, bias: bias / m, variance: variance / m,
    unbiasedVariance: unbiased / m, biasedVariance: biased / m, netVariance: (unbiased - biased) / m,
  };
}
