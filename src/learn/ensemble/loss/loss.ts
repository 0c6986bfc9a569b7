/**
 * The contract every gradient-boosting loss fulfils (Friedman, J. (2001) "Greedy function approximation:
 * a gradient boosting machine", Annals of Statistics 29(5):1189–1232, Algorithm 1): a constant initial
 * model, pseudo-residuals (the negative gradient), and a rule for the value of each leaf.
 *
 * Scores F are one Float64Array of n × nOutputs, row-major (nOutputs is K for multiclass, else 1).
 * Targets y are numbers (regression), 0/1 (two classes) or class codes (multiclass).
 * A weight of 0 leaves a row out of the current round (row subsampling).
 *
 * Leaf rules:
 * - 'ratio': γ = Σ w·num / Σ w·den over the leaf's rows, times `ratioScale` — the exact line search for
 *   squared error (num = residual, den = 1) or a single Newton step (num = −gradient, den = Hessian).
 * - 'group': the leaf value is computed from the leaf's rows as a group (medians, quantiles, Huber).
 */
export type LossName = 'squared' | 'absolute' | 'huber' | 'quantile' | 'logistic' | 'multiclass' | 'poisson';

interface LossBase {
  readonly name: LossName;
  readonly nOutputs: number;
  /** The constant that minimises the weighted loss (one value per output). */
  initial(y: Float64Array, w: Float64Array): Float64Array;
  /** Weighted mean loss at scores F (the figure kept per round for learning curves). */
  value(y: Float64Array, F: Float64Array, w: Float64Array): number;
  /** Per-round preparation before residuals are taken (Huber's δ, softmax probabilities). */
  startRound(y: Float64Array, F: Float64Array, w: Float64Array): void;
  /** Pseudo-residuals −∂L/∂F for output k, written to `out` (length n). */
  residuals(y: Float64Array, F: Float64Array, k: number, out: Float64Array): void;
}

export interface RatioLoss extends LossBase {
  readonly leafRule: 'ratio';
  /** Multiplier on every leaf value ((K−1)/K for multiclass, Friedman 2001 Alg. 6; else 1). */
  readonly ratioScale: number;
  /** Per-row numerator and denominator for output k, given this round's residuals r. */
  leafTerms(y: Float64Array, F: Float64Array, k: number, r: Float64Array, num: Float64Array, den: Float64Array): void;
  /**
   * Optional fused pass for single-output losses (the round loop's hot path): writes the pseudo-residuals
   * to `r` and the leaf denominators to `den` — exactly what `residuals` then `leafTerms` give (the
   * numerator is r itself) — and returns `value(y, F, w)`, bit for bit, sharing the exponentials.
   */
  fusedTerms?(y: Float64Array, F: Float64Array, w: Float64Array, r: Float64Array, den: Float64Array): number;
}

export interface GroupLoss extends LossBase {
  readonly leafRule: 'group';
  /** Leaf value from the rows `rows[start..end)` of one leaf (rows with weight 0 are ignored). */
  leafValue(y: Float64Array, F: Float64Array, w: Float64Array, rows: Int32Array, start: number, end: number): number;
}

export type Loss = RatioLoss | GroupLoss;

/** Weighted mean of per-row terms `term(i)`; 0 when the weights sum to 0. */
export function weightedMean(n: number, w: Float64Array, term: (i: number) => number): number {
  let s = 0, sw = 0;
  for (let i = 0; i < n; i++) {
    const wi = w[i];
    if (wi > 0) { s += wi * term(i); sw += wi; }
  }
  return sw > 0 ? s / sw : 0;
}
