/**
 * Least squares with a small ridge: the stacking combiner for numeric targets (Breiman, L. (1996)
 * "Stacked regressions", Machine Learning 24:49–64, combines out-of-fold predictions linearly; the ridge
 * keeps the system well posed when base predictions are nearly collinear — Hoerl & Kennard 1970).
 * Minimises Σ w (y − b − zᵀβ)² / Σ w + ridge·‖β‖² over standardised inputs z; the intercept is not penalised.
 */
import { solveCholesky } from './cholesky.js';
import { applyScaling, fitScaling, type Scaling } from './standardize.js';

export interface RidgeCombiner {
  readonly kind: 'ridge';
  readonly p: number;
  readonly scaling: Scaling;
  readonly intercept: number;
  /** Coefficients on standardised inputs. */
  readonly coef: Float64Array;
}

/**
 * Fit the ridge combiner to inputs `X` (n×p row-major), target `y` and weights `w`.
 * @param ridge penalty on the standardised coefficients. __Default:__ 1e-3.
 * @example
 * const c = fitRidgeCombiner(X, n, p, y, w);
 * applyRidgeCombiner(c, Xnew, m); // m predictions
 */
export function fitRidgeCombiner(X: Float64Array, n: number, p: number, y: Float64Array, w: Float64Array, ridge = 1e-3): RidgeCombiner {
  const scaling = fitScaling(X, n, p, w);
  const Z = applyScaling(X, n, p, scaling);
  let sw = 0, sy = 0;
  for (let i = 0; i < n; i++) { sw += w[i]; sy += w[i] * y[i]; }
  const ybar = sy / sw;
  // Z columns have weighted mean 0, so the intercept separates: b = ȳ, β = (ZᵀWZ/Σw + ridge·I)⁻¹ ZᵀW(y − ȳ)/Σw
  const A = new Float64Array(p * p), rhs = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    const wi = w[i] / sw;
    if (!(wi > 0)) continue;
    const r = y[i] - ybar;
    for (let a = 0; a < p; a++) {
      const za = Z[i * p + a];
      rhs[a] += wi * za * r;
      for (let b = 0; b <= a; b++) A[a * p + b] += wi * za * Z[i * p + b];
    }
  }
  for (let a = 0; a < p; a++) {
    for (let b = 0; b < a; b++) A[b * p + a] = A[a * p + b];
    A[a * p + a] += Math.max(ridge, 1e-12);
  }
  const coef = p > 0 ? solveCholesky(A, rhs, p) : new Float64Array(0);
  return { kind: 'ridge', p, scaling, intercept: ybar, coef };
}

/**
 * Predictions of a fitted ridge combiner for `m` rows of inputs `X` (m×p row-major).
 * @example
 * applyRidgeCombiner(c, X, m);
 */
export function applyRidgeCombiner(c: RidgeCombiner, X: Float64Array, m: number): Float64Array {
  const Z = applyScaling(X, m, c.p, c.scaling);
  const out = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    let s = c.intercept;
    for (let j = 0; j < c.p; j++) s += c.coef[j] * Z[i * c.p + j];
    out[i] = s;
  }
  return out;
}
