/**
 * Node impurity from per-node sums ("channels"):
 * - classes: one channel per class holding the weight of that class;
 * - values: two channels, total weight W and the weighted sum S of (centred) responses.
 *
 * `weightedImpurity` returns W · I(node), so a split's weighted impurity decrease (its gain) is
 * `weightedImpurity(parent) - Σ weightedImpurity(child)`:
 * - entropy in bits: W·H = W log2 W - Σ c log2 c (Shannon 1948; Quinlan 1986);
 * - Gini: W·(1 - Σ (c/W)²) = W - Σ c²/W (Breiman et al. 1984);
 * - variance: W·Var = Σ w y² - S²/W. The Σ w y² term is the same for a parent and its children together,
 *   so it is left out here (it cancels in every gain): the value returned is -S²/W.
 */

/** Impurity measure codes used by the growers' inner loops. */
export const ENTROPY = 0;
export const GINI = 1;
export const VARIANCE = 2;
export type ImpurityCode = typeof ENTROPY | typeof GINI | typeof VARIANCE;

function xlog2x(x: number): number {
  return x > 0 ? x * Math.log2(x) : 0;
}

/** W · I for the channels `ch[off .. off + nCh)` (see the file comment; -S²/W for variance). */
export function weightedImpurity(measure: ImpurityCode, ch: ArrayLike<number>, off: number, nCh: number): number {
  if (measure === VARIANCE) {
    const w = ch[off];
    return w > 0 ? -(ch[off + 1] * ch[off + 1]) / w : 0;
  }
  let w = 0;
  for (let k = 0; k < nCh; k++) w += ch[off + k];
  if (!(w > 0)) return 0;
  if (measure === GINI) {
    let s = 0;
    for (let k = 0; k < nCh; k++) s += ch[off + k] * ch[off + k];
    return w - s / w;
  }
  let s = 0;
  for (let k = 0; k < nCh; k++) s += xlog2x(ch[off + k]);
  return Math.max(0, xlog2x(w) - s);
}

/** Total weight held by the channels. */
export function channelWeight(measure: ImpurityCode, ch: ArrayLike<number>, off: number, nCh: number): number {
  if (measure === VARIANCE) return ch[off];
  let w = 0;
  for (let k = 0; k < nCh; k++) w += ch[off + k];
  return w;
}

/**
 * Shannon entropy in bits of a vector of non-negative weights (normalised internally).
 * @example
 * entropyBits([9, 5]); // 0.940286 (PlayTennis, Mitchell 1997, Table 3.2)
 */
export function entropyBits(weights: ArrayLike<number>): number {
  let w = 0;
  for (let k = 0; k < weights.length; k++) w += weights[k];
  return w > 0 ? weightedImpurity(ENTROPY, weights, 0, weights.length) / w : 0;
}

/**
 * Gini index 1 - Σ p² of a vector of non-negative weights (normalised internally).
 * @example
 * giniIndex([1, 1]); // 0.5
 */
export function giniIndex(weights: ArrayLike<number>): number {
  let w = 0;
  for (let k = 0; k < weights.length; k++) w += weights[k];
  return w > 0 ? weightedImpurity(GINI, weights, 0, weights.length) / w : 0;
}
