/**
 * Multinomial logistic regression with a small ridge, fitted by Newton's method (iteratively reweighted
 * least squares; McCullagh & Nelder 1989, Generalized Linear Models, §4.4) with step halving: the stacking
 * combiner for class targets (Wolpert, D. (1992) "Stacked generalization", Neural Networks 5:241–259).
 * Class 0 is the reference (its scores are 0), so two classes give ordinary binary logistic regression.
 * Minimises mean weighted −log p_y + (ridge/2)·‖β‖² over standardised inputs; intercepts carry only a
 * tiny penalty (1e−8) so a class absent from the data still gives a well-posed system.
 */
import { solveCholesky } from './cholesky.js';
import { applyScaling, fitScaling, type Scaling } from './standardize.js';

export interface LogisticCombiner {
  readonly kind: 'logistic';
  readonly p: number;
  readonly nClasses: number;
  readonly scaling: Scaling;
  /** (K − 1) blocks of [intercept, β_1..β_p] for classes 1..K−1. */
  readonly theta: Float64Array;
}

function scores(theta: Float64Array, Z: Float64Array, i: number, p: number, K: number, out: Float64Array): void {
  out[0] = 0;
  let mx = 0;
  for (let c = 1; c < K; c++) {
    const o = (c - 1) * (p + 1);
    let s = theta[o];
    for (let j = 0; j < p; j++) s += theta[o + 1 + j] * Z[i * p + j];
    out[c] = s;
    if (s > mx) mx = s;
  }
  let t = 0;
  for (let c = 0; c < K; c++) { out[c] = Math.exp(out[c] - mx); t += out[c]; }
  for (let c = 0; c < K; c++) out[c] /= t;
}

function objective(theta: Float64Array, Z: Float64Array, n: number, p: number, K: number, y: Int32Array, w: Float64Array, sw: number, ridge: number): number {
  const pr = new Float64Array(K);
  let s = 0;
  for (let i = 0; i < n; i++) {
    if (!(w[i] > 0)) continue;
    scores(theta, Z, i, p, K, pr);
    s -= w[i] * Math.log(Math.max(pr[y[i]], 1e-300));
  }
  let pen = 0;
  for (let c = 0; c < K - 1; c++) {
    const o = c * (p + 1);
    pen += 1e-8 * theta[o] * theta[o];
    for (let j = 0; j < p; j++) pen += ridge * theta[o + 1 + j] ** 2;
  }
  return s / sw + pen / 2;
}

/**
 * Fit the logistic combiner: inputs `X` (n×p row-major), class codes `y` in 0..K−1, weights `w`.
 * @param ridge penalty on standardised coefficients. __Default:__ 1e-3.
 * @example
 * const c = fitLogisticCombiner(X, n, p, codes, 3, w);
 * applyLogisticCombiner(c, X, n); // n×3 probabilities
 */
export function fitLogisticCombiner(
  X: Float64Array, n: number, p: number, y: Int32Array, K: number, w: Float64Array, ridge = 1e-3,
): LogisticCombiner {
  const scaling = fitScaling(X, n, p, w);
  const Z = applyScaling(X, n, p, scaling);
  const q = p + 1, d = q * (K - 1);
  let sw = 0;
  for (let i = 0; i < n; i++) sw += w[i];
  let theta = new Float64Array(d);
  let J = objective(theta, Z, n, p, K, y, w, sw, ridge);
  const pr = new Float64Array(K), x = new Float64Array(q);
  for (let iter = 0; iter < 100; iter++) {
    const g = new Float64Array(d), H = new Float64Array(d * d);
    for (let i = 0; i < n; i++) {
      const wi = w[i] / sw;
      if (!(wi > 0)) continue;
      scores(theta, Z, i, p, K, pr);
      x[0] = 1;
      for (let j = 0; j < p; j++) x[1 + j] = Z[i * p + j];
      for (let c = 1; c < K; c++) {
        const oc = (c - 1) * q;
        const rc = pr[c] - (y[i] === c ? 1 : 0);
        for (let a = 0; a < q; a++) g[oc + a] += wi * rc * x[a];
        for (let e = 1; e <= c; e++) {
          const oe = (e - 1) * q;
          const h = wi * pr[c] * ((c === e ? 1 : 0) - pr[e]);
          for (let a = 0; a < q; a++) for (let b = 0; b < q; b++) H[(oc + a) * d + oe + b] += h * x[a] * x[b];
        }
      }
    }
    for (let r = 0; r < d; r++) for (let s = 0; s < r; s++) H[s * d + r] = H[r * d + s];
    for (let c = 0; c < K - 1; c++) {
      const o = c * q;
      g[o] += 1e-8 * theta[o];
      H[o * d + o] += 1e-8;
      for (let j = 1; j < q; j++) { g[o + j] += ridge * theta[o + j]; H[(o + j) * d + o + j] += ridge; }
    }
    const step = solveCholesky(H, g, d);
    let t = 1, next = theta, Jn = J;
    for (let half = 0; half < 30; half++, t /= 2) {
      next = theta.map((v, k) => v - t * step[k]);
      Jn = objective(next, Z, n, p, K, y, w, sw, ridge);
      if (Jn <= J) break;
    }
    if (!(Jn <= J)) break;
    const done = J - Jn < 1e-12 * Math.max(1, Math.abs(J));
    theta = next; J = Jn;
    if (done) break;
  }
  return { kind: 'logistic', p, nClasses: K, scaling, theta };
}

/**
 * Class probabilities (m×K row-major) of a fitted logistic combiner for `m` rows of inputs.
 * @example
 * applyLogisticCombiner(c, X, m);
 */
export function applyLogisticCombiner(c: LogisticCombiner, X: Float64Array, m: number): Float64Array {
  const Z = applyScaling(X, m, c.p, c.scaling);
  const K = c.nClasses, out = new Float64Array(m * K), pr = new Float64Array(K);
  for (let i = 0; i < m; i++) {
    scores(c.theta, Z, i, c.p, K, pr);
    out.set(pr, i * K);
  }
  return out;
}
