/**
 * Poisson loss with log link, for counts y >= 0: μ = e^F, L = μ − yF (the negative log-likelihood up to
 * a term in y). Pseudo-residual y − e^F; leaf value one Newton step Σ w(y − μ) / Σ w μ; initial model
 * log of the weighted mean of y (clamped at 1e−15 when every count is 0) (McCullagh & Nelder 1989,
 * Generalized Linear Models, ch. 6; the gradient-boosting steps as in Friedman 2001 §4).
 * The figure kept per round is the weighted mean Poisson deviance 2(y log(y/μ) − (y − μ)).
 */
import { weightedMean, type RatioLoss } from './loss.js';

/**
 * Create the Poisson loss.
 * @example
 * poissonLoss().residuals(y, F, 0, out); // out[i] = y[i] − exp(F[i])
 */
export function poissonLoss(): RatioLoss {
  return {
    name: 'poisson', nOutputs: 1, leafRule: 'ratio', ratioScale: 1,
    initial(y, w) { return Float64Array.of(Math.log(Math.max(1e-15, weightedMean(y.length, w, (i) => y[i])))); },
    value(y, F, w) {
      let s = 0, sw = 0;
      for (let i = 0; i < y.length; i++) {
        const wi = w[i];
        if (!(wi > 0)) continue;
        const mu = Math.exp(F[i]);
        s += wi * (2 * ((y[i] > 0 ? y[i] * Math.log(y[i] / mu) : 0) - (y[i] - mu)));
        sw += wi;
      }
      return sw > 0 ? s / sw : 0;
    },
    startRound() {},
    residuals(y, F, _k, out) { for (let i = 0; i < y.length; i++) out[i] = y[i] - Math.exp(F[i]); },
    leafTerms(y, _F, _k, r, num, den) {
      for (let i = 0; i < y.length; i++) { num[i] = r[i]; den[i] = y[i] - r[i]; }
    },
    fusedTerms(y, F, w, r, den) {
      let s = 0, sw = 0;
      for (let i = 0; i < y.length; i++) {
        const mu = Math.exp(F[i]), yi = y[i], ri = yi - mu;
        r[i] = ri;
        den[i] = yi - ri;
        const wi = w[i];
        if (!(wi > 0)) continue;
        s += wi * (2 * ((yi > 0 ? yi * Math.log(yi / mu) : 0) - (yi - mu)));
        sw += wi;
      }
      return sw > 0 ? s / sw : 0;
    },
  };
}
