/**
 * Column standardisation for the stacking combiners: each column of an n×p row-major matrix is
 * centred on its weighted mean and divided by its weighted standard deviation (a constant column keeps
 * scale 1, so it becomes all zeros). Missing values (NaN) become 0 after centring, i.e. the mean.
 */

export interface Scaling {
  readonly center: Float64Array;
  readonly scale: Float64Array;
}

/**
 * Weighted mean and standard deviation of each column (NaN entries skipped).
 * @example
 * const s = fitScaling(Float64Array.of(1, 10, 3, 10), 2, 2, Float64Array.of(1, 1)); // center [2, 10], scale [1, 1]
 */
export function fitScaling(X: Float64Array, n: number, p: number, w: Float64Array): Scaling {
  const center = new Float64Array(p), scale = new Float64Array(p);
  for (let j = 0; j < p; j++) {
    let s = 0, sw = 0;
    for (let i = 0; i < n; i++) { const v = X[i * p + j]; if (v === v && w[i] > 0) { s += w[i] * v; sw += w[i]; } }
    const m = sw > 0 ? s / sw : 0;
    let q = 0;
    for (let i = 0; i < n; i++) { const v = X[i * p + j]; if (v === v && w[i] > 0) q += w[i] * (v - m) ** 2; }
    const sd = sw > 0 ? Math.sqrt(q / sw) : 0;
    center[j] = m;
    scale[j] = sd > 1e-12 ? sd : 1;
  }
  return { center, scale };
}

/**
 * A standardised copy of `X` (NaN → 0).
 * @example
 * applyScaling(X, n, p, fitScaling(X, n, p, w));
 */
export function applyScaling(X: Float64Array, n: number, p: number, s: Scaling): Float64Array {
  const Z = new Float64Array(n * p);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < p; j++) {
      const v = X[i * p + j];
      Z[i * p + j] = v === v ? (v - s.center[j]) / s.scale[j] : 0;
    }
  }
  return Z;
}
