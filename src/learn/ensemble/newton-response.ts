/**
 * Newton trees for boosting: instead of fitting each tree to the pseudo-residuals −g by least squares,
 * fit it to the Newton working response z = −g/h with weights w·h (h the second derivative of the loss).
 * The weighted variance reduction of z is then (Σ_L w·(−g))²/Σ_L w·h + (same for R) − (same for the
 * node), the second-order gain of the loss, and each leaf's weighted mean of z is the Newton step
 * Σ w·(−g)/Σ w·h. This is the working-response fit of LogitBoost (Friedman, Hastie & Tibshirani (2000)
 * "Additive logistic regression: a statistical view of boosting", Annals of Statistics 28(2):337–407,
 * Algorithm 3), used here for every loss with a positive second derivative.
 *
 * h is floored at `curvatureFloor` for the tree fit only (the leaf values still use the exact h): rows the
 * model already gets nearly certain would otherwise carry z of order 1/h and swamp the node sums
 * (common practice).
 */

/** Smallest second derivative used for the tree fit. */
export const curvatureFloor = 1e-6;

/**
 * z_i = num_i / max(h_i, floor) and v_i = w_i · max(h_i, floor) for rows with w_i > 0; z_i = v_i = 0
 * for the others. `num` is −g (the pseudo-residual), `den` is h.
 * @example
 * newtonResponse(r, h, w, z, v); // grow the tree on (z, weights v)
 */
export function newtonResponse(
  num: Float64Array, den: Float64Array, w: Float64Array, z: Float64Array, v: Float64Array,
): void {
  for (let i = 0; i < num.length; i++) {
    const wi = w[i];
    if (!(wi > 0)) { z[i] = 0; v[i] = 0; continue; }
    const h = den[i] > curvatureFloor ? den[i] : curvatureFloor;
    z[i] = num[i] / h;
    v[i] = wi * h;
  }
}
