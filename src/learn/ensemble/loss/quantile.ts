/**
 * Quantile (pinball) loss at level τ: L = τ(y − F) when y >= F, (τ − 1)(y − F) otherwise (Koenker &
 * Bassett 1978). Pseudo-residual τ when y > F, τ − 1 when y < F (0 at equality); each leaf takes the
 * weighted τ-quantile of y − F (the exact line search); initial model the weighted τ-quantile of y
 * (Friedman 2001 §4 treats τ = ½; the same steps hold for any τ).
 */
import { errors } from '../../../errors.js';
import { weightedMean, type GroupLoss } from './loss.js';
import { allRows, weightedQuantile } from '../weighted-quantile.js';

/**
 * Create the quantile loss for level `tau` in (0, 1).
 * @example
 * quantileLoss(0.9).residuals(y, F, 0, out); // 0.9 above the prediction, −0.1 below
 */
export function quantileLoss(tau: number): GroupLoss {
  if (!(tau > 0 && tau < 1)) throw errors.badOption('quantileLevel', tau, 'a number in (0, 1)');
  let diff = new Float64Array(0);
  return {
    name: 'quantile', nOutputs: 1, leafRule: 'group',
    initial(y, w) { return Float64Array.of(weightedQuantile(y, w, allRows(y.length), 0, y.length, tau)); },
    value(y, F, w) {
      return weightedMean(y.length, w, (i) => { const d = y[i] - F[i]; return d >= 0 ? tau * d : (tau - 1) * d; });
    },
    startRound() {},
    residuals(y, F, _k, out) {
      for (let i = 0; i < y.length; i++) { const d = y[i] - F[i]; out[i] = d > 0 ? tau : d < 0 ? tau - 1 : 0; }
    },
    leafValue(y, F, w, rows, start, end) {
      if (diff.length !== y.length) diff = new Float64Array(y.length);
      for (let j = start; j < end; j++) diff[rows[j]] = y[rows[j]] - F[rows[j]];
      return weightedQuantile(diff, w, rows, start, end, tau);
    },
  };
}
