/**
 * Selection of the k-th smallest of m numbers in expected linear time, in place (Hoare, C. A. R. (1961)
 * "Algorithm 65: Find", Communications of the ACM 4(7):321–322), with a median-of-three pivot.
 * Used by weighted quantiles when every weight is 1, where the quantile is an order statistic.
 */

/**
 * The k-th smallest (k from 1) of `a[0..m)`; reorders `a[0..m)`. Values must not be NaN.
 * @example
 * selectKth(Float64Array.of(5, 1, 4, 2, 3), 5, 2); // 2
 */
export function selectKth(a: Float64Array, m: number, k: number): number {
  let lo = 0, hi = m - 1;
  const want = k - 1;
  while (hi > lo) {
    const mid = (lo + hi) >>> 1;
    // median of three as the pivot
    if (a[mid] < a[lo]) swap(a, mid, lo);
    if (a[hi] < a[lo]) swap(a, hi, lo);
    if (a[hi] < a[mid]) swap(a, hi, mid);
    const pivot = a[mid];
    let i = lo, j = hi;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) { swap(a, i, j); i++; j--; }
    }
    if (want <= j) hi = j;
    else if (want >= i) lo = i;
    else return a[want];
  }
  return a[want];
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i]; a[i] = a[j]; a[j] = t;
}
