import { checkClassProbabilities, type Weights } from './check.js';

/**
 * Brier score: mean squared difference between predicted probabilities and the 0/1 outcome.
 *
 * Convention (stated because two are in use):
 * - n × K probabilities: the sum over classes, Σ_k (p_ik − [y_i = k])², averaged over rows — Brier's
 *   original definition (Brier 1950, "Verification of forecasts expressed in terms of probability",
 *   Monthly Weather Review 78(1):1–3). Ranges 0..2.
 * - one probability per row (binary, probability of class 1): (p_i − y_i)², averaged over rows. Ranges
 *   0..1; for two classes it is exactly half of the sum-over-classes form.
 *
 * @param actual - actual class codes (integers >= 0; 0/1 when one probability per row).
 * @param proba - one probability per row, or n × K class probabilities, row-major.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * brierScore([1, 0], [0.8, 0.4]); // ((0.2)² + (0.4)²) / 2 = 0.1
 */
export function brierScore(actual: ArrayLike<number>, proba: ArrayLike<number>, weights?: Weights): number {
  const n = actual.length;
  const { k, w } = checkClassProbabilities('brierScore', actual, proba, weights);
  let sum = 0, total = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    if (k === 1) {
      const d = proba[i] - (actual[i] === 1 ? 1 : 0);
      s = d * d;
    } else {
      for (let c = 0; c < k; c++) {
        const d = proba[i * k + c] - (actual[i] === c ? 1 : 0);
        s += d * d;
      }
    }
    sum += w[i] * s;
    total += w[i];
  }
  return sum / total;
}
