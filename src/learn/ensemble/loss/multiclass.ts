/**
 * K-class logistic loss (multinomial deviance) with softmax p_k = e^{F_k} / Σ_l e^{F_l}:
 * L = −log p_y. Each round grows K trees, tree k fitted to the pseudo-residuals y_k − p_k (y_k = 1 when
 * the row's class is k). Leaf value: ((K − 1)/K) · Σ w r / Σ w |r|(1 − |r|) — one Newton step with the
 * factor of Friedman 2001, Algorithm 6 (LK_TreeBoost); ESL Algorithm 10.4.
 * Initial model: F_k = log π_k − mean_l log π_l, π the weighted class shares (clamped at 1e−15), which
 * minimises the loss among constants (Friedman 2001 starts from 0 instead).
 */
import { weightedMean, type RatioLoss } from './loss.js';

const EPS = 1e-15;

/** Softmax of row `i` of the n×K scores F into `p` (row-major, same layout). */
export function softmaxRows(F: Float64Array, K: number, p: Float64Array): void {
  const n = F.length / K;
  for (let i = 0; i < n; i++) {
    const o = i * K;
    let mx = -Infinity;
    for (let k = 0; k < K; k++) if (F[o + k] > mx) mx = F[o + k];
    let s = 0;
    for (let k = 0; k < K; k++) { const e = Math.exp(F[o + k] - mx); p[o + k] = e; s += e; }
    for (let k = 0; k < K; k++) p[o + k] /= s;
  }
}

/**
 * Create the K-class logistic loss (K >= 2); targets are class codes 0..K−1.
 * @example
 * const loss = multiclassLoss(3); // 3 trees per round
 */
export function multiclassLoss(K: number): RatioLoss {
  let p = new Float64Array(0);
  return {
    name: 'multiclass', nOutputs: K, leafRule: 'ratio', ratioScale: (K - 1) / K,
    initial(y, w) {
      const share = new Float64Array(K);
      for (let k = 0; k < K; k++) share[k] = Math.max(EPS, weightedMean(y.length, w, (i) => (y[i] === k ? 1 : 0)));
      const logs = Array.from(share, Math.log);
      const mean = logs.reduce((a, b) => a + b, 0) / K;
      return Float64Array.from(logs, (v) => v - mean);
    },
    value(y, F, w) {
      let total = 0, sw = 0;
      for (let i = 0; i < y.length; i++) {
        const wi = w[i];
        if (!(wi > 0)) continue;
        const o = i * K;
        let mx = -Infinity;
        for (let k = 0; k < K; k++) if (F[o + k] > mx) mx = F[o + k];
        let s = 0;
        for (let k = 0; k < K; k++) s += Math.exp(F[o + k] - mx);
        total += wi * (mx + Math.log(s) - F[o + y[i]]);
        sw += wi;
      }
      return sw > 0 ? total / sw : 0;
    },
    startRound(y, F) {
      if (p.length !== F.length) p = new Float64Array(F.length);
      softmaxRows(F, K, p);
    },
    residuals(y, _F, k, out) {
      for (let i = 0; i < y.length; i++) out[i] = (y[i] === k ? 1 : 0) - p[i * K + k];
    },
    leafTerms(_y, _F, _k, r, num, den) {
      for (let i = 0; i < r.length; i++) { const a = Math.abs(r[i]); num[i] = r[i]; den[i] = a * (1 - a); }
    },
  };
}
