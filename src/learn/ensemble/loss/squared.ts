/**
 * Squared error L = ½(y − F)²: pseudo-residual y − F; leaf value the weighted mean residual (the exact
 * line search); initial model the weighted mean (Friedman 2001, Algorithm 2 LS_Boost; ESL Table 10.2).
 * The figure kept per round is the weighted mean of (y − F)².
 */
import { weightedMean, type RatioLoss } from './loss.js';

/**
 * Create the squared-error loss.
 * @example
 * const loss = squaredLoss();
 * loss.residuals(y, F, 0, out); // out[i] = y[i] − F[i]
 */
export function squaredLoss(): RatioLoss {
  return {
    name: 'squared', nOutputs: 1, leafRule: 'ratio', ratioScale: 1,
    initial(y, w) { return Float64Array.of(weightedMean(y.length, w, (i) => y[i])); },
    value(y, F, w) {
      let s = 0, sw = 0;
      for (let i = 0; i < y.length; i++) {
        const wi = w[i];
        if (wi > 0) { s += wi * (y[i] - F[i]) ** 2; sw += wi; }
      }
      return sw > 0 ? s / sw : 0;
    },
    startRound() {},
    residuals(y, F, _k, out) { for (let i = 0; i < y.length; i++) out[i] = y[i] - F[i]; },
    leafTerms(_y, _F, _k, r, num, den) { num.set(r); den.fill(1); },
    fusedTerms(y, F, w, r, den) {
      let s = 0, sw = 0;
      for (let i = 0; i < y.length; i++) {
        const d = y[i] - F[i], wi = w[i];
        r[i] = d;
        den[i] = 1;
        if (wi > 0) { s += wi * d ** 2; sw += wi; }
      }
      return sw > 0 ? s / sw : 0;
    },
  };
}
