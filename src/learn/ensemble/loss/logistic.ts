/**
 * Two-class logistic loss (binomial deviance) on the log-odds F, with y in {0, 1}:
 * L = log(1 + e^F) − yF, p = 1/(1 + e^−F). Pseudo-residual y − p; leaf value one Newton step
 * Σ w(y − p) / Σ w p(1 − p); initial model the log-odds of the weighted share of class 1
 * (Friedman 2001, Algorithm 5 L2_TreeBoost, there written with y in {−1, 1}; ESL Table 10.2).
 * The figure kept per round is the weighted mean log loss.
 */
import { weightedMean, type RatioLoss } from './loss.js';

const EPS = 1e-15;

/** Logistic function 1 / (1 + e^−x). */
export function sigmoid(x: number): number {
  return x >= 0 ? 1 / (1 + Math.exp(-x)) : Math.exp(x) / (1 + Math.exp(x));
}

/**
 * Create the two-class logistic loss.
 * @example
 * logisticLoss().residuals(y, F, 0, out); // out[i] = y[i] − sigmoid(F[i])
 */
export function logisticLoss(): RatioLoss {
  return {
    name: 'logistic', nOutputs: 1, leafRule: 'ratio', ratioScale: 1,
    initial(y, w) {
      const p = Math.min(1 - EPS, Math.max(EPS, weightedMean(y.length, w, (i) => y[i])));
      return Float64Array.of(Math.log(p / (1 - p)));
    },
    value(y, F, w) {
      // log(1 + e^F) − yF, computed stably
      let s = 0, sw = 0;
      for (let i = 0; i < y.length; i++) {
        const wi = w[i];
        if (!(wi > 0)) continue;
        const f = F[i];
        s += wi * ((f > 0 ? f + Math.log1p(Math.exp(-f)) : Math.log1p(Math.exp(f))) - y[i] * f);
        sw += wi;
      }
      return sw > 0 ? s / sw : 0;
    },
    startRound() {},
    residuals(y, F, _k, out) { for (let i = 0; i < y.length; i++) out[i] = y[i] - sigmoid(F[i]); },
    leafTerms(y, F, _k, r, num, den) {
      for (let i = 0; i < y.length; i++) { const p = y[i] - r[i]; num[i] = r[i]; den[i] = p * (1 - p); }
    },
    fusedTerms(y, F, w, r, den) {
      // One exponential per row: e = e^−|F| gives both log(1 + e^F) = max(F, 0) + log(1 + e) and the
      // logistic function. For rows of weight 1 (the usual case, and every row kept by subsampling) the
      // log(1 + e) terms are summed as the log of a product of up to 64 factors in (1, 2] — one log per 64
      // rows instead of one log1p per row; the loss changes by ~1e-14 relative, residuals not at all.
      let s = 0, sw = 0, prod = 1, m = 0;
      for (let i = 0; i < y.length; i++) {
        const f = F[i], yi = y[i], e = Math.exp(f > 0 ? -f : f);
        const ri = yi - (f >= 0 ? 1 / (1 + e) : e / (1 + e));
        r[i] = ri;
        const p = yi - ri;
        den[i] = p * (1 - p);
        const wi = w[i];
        if (!(wi > 0)) continue;
        if (wi === 1) {
          prod *= 1 + e;
          if (++m === 64) { s += Math.log(prod); prod = 1; m = 0; }
        } else {
          s += wi * Math.log1p(e);
        }
        s += wi * ((f > 0 ? f : 0) - yi * f);
        sw += wi;
      }
      s += Math.log(prod);
      return sw > 0 ? s / sw : 0;
    },
  };
}
