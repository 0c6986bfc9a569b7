/**
 * Huber loss with a per-round transition point (Friedman 2001, Algorithm 4 M_TreeBoost):
 * r_i = y_i − F(x_i); δ = the α-quantile of |r_i| over this round's rows; pseudo-residual r_i when
 * |r_i| <= δ, else δ·sign(r_i). Each leaf takes r̃ + (1/N) Σ sign(r_i − r̃)·min(δ, |r_i − r̃|), r̃ the leaf's
 * median residual (weighted forms: weighted median, weighted mean). Initial model: the weighted median.
 * The figure kept per round is the Huber loss at the latest δ (½r² inside, δ(|r| − δ/2) outside).
 */
import { errors } from '../../../errors.js';
import { weightedMean, type GroupLoss } from './loss.js';
import { allRows, weightedQuantile } from '../weighted-quantile.js';

/** The Huber loss plus its current transition point (for tests and reports). */
export interface HuberLoss extends GroupLoss {
  /** δ of the latest round (NaN before the first). */
  readonly delta: () => number;
}

/**
 * Create the Huber loss; δ is the `alpha` quantile of |residuals| each round.
 * @example
 * const loss = huberLoss(0.9); // Friedman 2001 used α = 0.9 (from memory)
 */
export function huberLoss(alpha: number): HuberLoss {
  if (!(alpha > 0 && alpha <= 1)) throw errors.badOption('huberQuantile', alpha, 'a number in (0, 1]');
  let delta = NaN;
  let diff = new Float64Array(0), every: Int32Array = new Int32Array(0);
  const huber = (d: number): number => { const a = Math.abs(d); return a <= delta ? 0.5 * d * d : delta * (a - 0.5 * delta); };
  const setDelta = (y: Float64Array, F: Float64Array, w: Float64Array): void => {
    if (diff.length !== y.length) diff = new Float64Array(y.length);
    for (let i = 0; i < y.length; i++) diff[i] = Math.abs(y[i] - F[i]);
    if (every.length !== y.length) every = allRows(y.length);
    delta = weightedQuantile(diff, w, every, 0, y.length, alpha);
  };
  return {
    name: 'huber', nOutputs: 1, leafRule: 'group',
    delta: () => delta,
    initial(y, w) { return Float64Array.of(weightedQuantile(y, w, allRows(y.length), 0, y.length, 0.5)); },
    value(y, F, w) {
      if (delta !== delta) setDelta(y, F, w);
      return weightedMean(y.length, w, (i) => huber(y[i] - F[i]));
    },
    startRound(y, F, w) { setDelta(y, F, w); },
    residuals(y, F, _k, out) {
      for (let i = 0; i < y.length; i++) {
        const d = y[i] - F[i];
        out[i] = Math.abs(d) <= delta ? d : delta * Math.sign(d);
      }
    },
    leafValue(y, F, w, rows, start, end) {
      if (diff.length !== y.length) diff = new Float64Array(y.length);
      for (let j = start; j < end; j++) diff[rows[j]] = y[rows[j]] - F[rows[j]];
      const med = weightedQuantile(diff, w, rows, start, end, 0.5);
      let s = 0, sw = 0;
      for (let j = start; j < end; j++) {
        const i = rows[j];
        if (!(w[i] > 0)) continue;
        const d = diff[i] - med;
        s += w[i] * Math.sign(d) * Math.min(delta, Math.abs(d));
        sw += w[i];
      }
      return sw > 0 ? med + s / sw : 0;
    },
  };
}
