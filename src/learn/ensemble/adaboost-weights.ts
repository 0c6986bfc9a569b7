/**
 * The weight arithmetic of AdaBoost.
 *
 * Two classes: Algorithm 10.1 (AdaBoost.M1) of Hastie, Tibshirani & Friedman (2009), The Elements of
 * Statistical Learning, 2nd ed.: err_m = Σ w_i I(y_i ≠ G_m(x_i)) / Σ w_i, α_m = log((1 − err_m)/err_m),
 * w_i ← w_i · exp(α_m · I(y_i ≠ G_m(x_i))).
 * K classes: SAMME (Zhu, Zou, Rosset & Hastie 2009, "Multi-class AdaBoost", Statistics and Its Interface
 * 2:349–360): α_m = log((1 − err_m)/err_m) + log(K − 1), same update; for K = 2 it is Algorithm 10.1.
 */

/** Smallest error used in α, so a perfect round gets a large finite weight (log((1−1e−10)/1e−10) ≈ 23.03). */
export const errorFloor = 1e-10;

/**
 * Weighted error Σ w_i·miss_i / Σ w_i.
 * @example
 * weightedError(new Float64Array([1, 1, 2]), Uint8Array.of(0, 1, 0)); // 0.25
 */
export function weightedError(w: Float64Array, miss: Uint8Array): number {
  let bad = 0, all = 0;
  for (let i = 0; i < w.length; i++) { all += w[i]; if (miss[i]) bad += w[i]; }
  return all > 0 ? bad / all : 0;
}

/**
 * Weight of a round's classifier: α = log((1 − err)/err) + log(K − 1), err floored at `errorFloor`.
 * @example
 * sammeStepWeight(0.3, 2); // log(7/3) ≈ 0.8473 (ESL Algorithm 10.1)
 * sammeStepWeight(0.3, 3); // log(7/3) + log 2 ≈ 1.5404 (SAMME)
 */
export function sammeStepWeight(err: number, K: number): number {
  const e = Math.max(errorFloor, err);
  return Math.log((1 - e) / e) + Math.log(K - 1);
}

/**
 * True when a round is no better than guessing: err >= 1 − 1/K (SAMME needs err < (K − 1)/K; for two
 * classes err < ½). Such a round is discarded and the fit stops.
 * @example
 * isNoBetterThanGuessing(0.5, 2); // true
 */
export function isNoBetterThanGuessing(err: number, K: number): boolean {
  return err >= (K - 1) / K - 1e-12; // tolerance: rounding in err must not hide an exact tie
}

/**
 * w_i ← w_i · exp(α · miss_i) in place, then rescale so the weights sum to 1 (rescaling changes no
 * later α or decision). Returns the sum before rescaling.
 * @example
 * const w = new Float64Array([0.25, 0.25, 0.25, 0.25]);
 * updateRowWeights(w, Uint8Array.of(1, 0, 0, 0), Math.log(3)); // w = [0.5, 1/6, 1/6, 1/6]
 */
export function updateRowWeights(w: Float64Array, miss: Uint8Array, alpha: number): number {
  const up = Math.exp(alpha);
  let s = 0;
  for (let i = 0; i < w.length; i++) { if (miss[i]) w[i] *= up; s += w[i]; }
  if (s > 0) for (let i = 0; i < w.length; i++) w[i] /= s;
  return s;
}
