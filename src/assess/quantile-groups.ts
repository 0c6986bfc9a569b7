import { errors } from '../errors.js';

/** Numeric values grouped at their empirical quantiles. */
export interface QuantileGroups {
  /** Group of each row, 0..groups-1; -1 for a missing (NaN) value. */
  readonly group: Int32Array;
  /** Inclusive upper bound of each group (the last is the largest value). */
  readonly upper: Float64Array;
  /** Smallest value in each group. */
  readonly lower: Float64Array;
  /** A label per group: "[lo, hi]" for the first, "(prev, hi]" after. */
  readonly labels: readonly string[];
}

/**
 * Group numeric values into at most `groups` groups of about equal size at the empirical quantiles:
 * the cut after group j is the ⌈j·m/groups⌉-th smallest of the m non-missing values (the inverse of the
 * empirical distribution function, "type 1" in Hyndman & Fan 1996, "Sample quantiles in statistical
 * packages", The American Statistician 50(4):361–365). Tied values always share a group, so fewer groups
 * come out when cuts coincide. NaN values get group -1.
 *
 * @param values - numbers (NaN = missing; ±Infinity is not allowed).
 * @param groups - wanted number of groups (integer >= 1).
 * @example
 * quantileGroups(Float64Array.of(5, 1, 3, 2, 4, 6), 3).group; // [2, 0, 1, 0, 1, 2]
 */
export function quantileGroups(values: ArrayLike<number>, groups: number): QuantileGroups {
  if (!Number.isInteger(groups) || groups < 1) throw errors.badOption('groups', groups, 'an integer >= 1');
  const present: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === Infinity || v === -Infinity) throw errors.badValue('values', i, v, 'a finite number or NaN');
    if (v === v) present.push(v);
  }
  present.sort((a, b) => a - b);
  const m = present.length;
  const cuts: number[] = [];
  for (let j = 1; j <= groups; j++) {
    const c = m === 0 ? NaN : present[Math.ceil((j * m) / groups) - 1];
    if (m > 0 && (cuts.length === 0 || c > cuts[cuts.length - 1])) cuts.push(c);
  }
  const group = new Int32Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== v) { group[i] = -1; continue; }
    let lo = 0, hi = cuts.length - 1;
    while (lo < hi) { const mid = (lo + hi) >> 1; if (v <= cuts[mid]) hi = mid; else lo = mid + 1; }
    group[i] = lo;
  }
  const lower = new Float64Array(cuts.length);
  for (let j = 0; j < cuts.length; j++) {
    lower[j] = j === 0 ? present[0] : present[lowerIndex(present, cuts[j - 1])];
  }
  const labels = cuts.map((c, j) => (j === 0 ? `[${fmt(present[0])}, ${fmt(c)}]` : `(${fmt(cuts[j - 1])}, ${fmt(c)}]`));
  return { group, upper: Float64Array.from(cuts), lower, labels };
}

/** Index of the first sorted value strictly above `x`. */
function lowerIndex(sorted: readonly number[], x: number): number {
  let lo = 0, hi = sorted.length;
  while (lo < hi) { const mid = (lo + hi) >> 1; if (sorted[mid] <= x) lo = mid + 1; else hi = mid; }
  return lo;
}

function fmt(x: number): string {
  return Number.isInteger(x) ? String(x) : String(Number(x.toPrecision(4)));
}
