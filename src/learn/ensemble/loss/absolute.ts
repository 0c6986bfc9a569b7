/**
 * Absolute error L = |y − F|: pseudo-residual sign(y − F); the tree is fitted to the signs by least
 * squares and each leaf then takes the weighted median of y − F over its rows (the exact line search);
 * initial model the weighted median (Friedman 2001, Algorithm 3 LAD_TreeBoost; ESL Table 10.2).
 */
import { weightedMean, type GroupLoss } from './loss.js';
import { allRows, weightedQuantile } from '../weighted-quantile.js';

/**
 * Create the absolute-error loss.
 * @example
 * absoluteLoss().residuals(y, F, 0, out); // out[i] = sign(y[i] − F[i])
 */
export function absoluteLoss(): GroupLoss {
  let diff = new Float64Array(0);
  return {
    name: 'absolute', nOutputs: 1, leafRule: 'group',
    initial(y, w) { return Float64Array.of(weightedQuantile(y, w, allRows(y.length), 0, y.length, 0.5)); },
    value(y, F, w) { return weightedMean(y.length, w, (i) => Math.abs(y[i] - F[i])); },
    startRound() {},
    residuals(y, F, _k, out) { for (let i = 0; i < y.length; i++) out[i] = Math.sign(y[i] - F[i]); },
    leafValue(y, F, w, rows, start, end) {
      if (diff.length !== y.length) diff = new Float64Array(y.length);
      for (let j = start; j < end; j++) diff[rows[j]] = y[rows[j]] - F[rows[j]];
      return weightedQuantile(diff, w, rows, start, end, 0.5);
    },
  };
}
