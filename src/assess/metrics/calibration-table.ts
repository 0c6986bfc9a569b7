import { errors } from '../../errors.js';
import { quantileGroups } from '../quantile-groups.js';
import {
  checkCodes, checkLength, checkNotEmpty, checkProbabilities, checkWeights, probaColumns, type Weights,
} from './check.js';

/** One bin of a calibration table. */
export interface CalibrationBin {
  readonly bin: number;
  /** Smallest and largest predicted probability in the bin. */
  readonly lower: number;
  readonly upper: number;
  readonly rows: number;
  /** Total weight of the bin's rows (equals `rows` without weights). */
  readonly weight: number;
  /** Weighted mean predicted probability of the positive class. */
  readonly meanPredicted: number;
  /** Weighted share of the bin's rows that are of the positive class. */
  readonly observed: number;
}

export interface CalibrationOptions {
  /** Number of bins. __Default:__ 10. */
  readonly bins?: number;
  /** 'width': equal-width bins on [0, 1]; 'quantile': bins of about equal row count. __Default:__ 'width'. */
  readonly binning?: 'width' | 'quantile';
  /** Class code treated as positive (n × K probabilities). __Default:__ 1. */
  readonly positive?: number;
  /** Per-row weights. __Default:__ all 1. */
  readonly weights?: Weights;
}

/**
 * Calibration (reliability) table: rows binned by predicted probability of the positive class, with the
 * mean prediction and the observed positive share per bin. A calibrated model has the two close in every
 * bin (DeGroot & Fienberg 1983, "The comparison and evaluation of forecasters", The Statistician 32:12–22).
 * Empty bins are left out.
 *
 * @param actual - actual class codes.
 * @param proba - one probability per row (of class 1), or n × K class probabilities.
 * @example
 * calibrationTable([0, 1, 1, 1], [0.1, 0.3, 0.8, 0.9], { bins: 2 });
 * // bin 0: meanPredicted 0.2, observed 0.5; bin 1: meanPredicted 0.85, observed 1
 */
export function calibrationTable(
  actual: ArrayLike<number>, proba: ArrayLike<number>, options: CalibrationOptions = {},
): CalibrationBin[] {
  const n = actual.length;
  checkNotEmpty(n, 'calibrationTable');
  const bins = options.bins ?? 10;
  if (!Number.isInteger(bins) || bins < 1) throw errors.badOption('bins', bins, 'an integer >= 1');
  const binning = options.binning ?? 'width';
  if (binning !== 'width' && binning !== 'quantile') throw errors.badOption('binning', binning, "'width' or 'quantile'");
  const k = probaColumns(n, proba);
  const classes = checkCodes('actual', actual);
  const positive = options.positive ?? 1;
  if (!Number.isInteger(positive) || positive < 0 || (k === 1 ? positive !== 1 : positive >= k)) {
    throw errors.badOption('positive', positive, k === 1 ? '1 (one probability per row is the probability of class 1)' : `a class code below ${k}`);
  }
  if (k === 1 && classes > 2) checkLength('probabilities', n * classes, proba);
  checkProbabilities(proba);
  const w = checkWeights(options.weights, n);
  const p = new Float64Array(n);
  for (let i = 0; i < n; i++) p[i] = k === 1 ? proba[i] : proba[i * k + positive];
  const group = binning === 'width'
    ? Int32Array.from(p, (x) => Math.min(Math.floor(x * bins), bins - 1))
    : quantileGroups(p, bins).group;
  const count = new Float64Array(bins), weight = new Float64Array(bins), sumP = new Float64Array(bins), sumY = new Float64Array(bins);
  const lower = new Float64Array(bins).fill(Infinity), upper = new Float64Array(bins).fill(-Infinity);
  for (let i = 0; i < n; i++) {
    const b = group[i];
    count[b]++; weight[b] += w[i]; sumP[b] += w[i] * p[i];
    if (actual[i] === positive) sumY[b] += w[i];
    lower[b] = Math.min(lower[b], p[i]); upper[b] = Math.max(upper[b], p[i]);
  }
  const out: CalibrationBin[] = [];
  for (let b = 0; b < bins; b++) {
    if (count[b] === 0) continue;
    const wt = weight[b];
    out.push({
      bin: b, lower: lower[b], upper: upper[b], rows: count[b], weight: wt,
      meanPredicted: wt > 0 ? sumP[b] / wt : NaN, observed: wt > 0 ? sumY[b] / wt : NaN,
    });
  }
  return out;
}
