/**
 * Column profiles: the compact summary of a column that a run record keeps so that a later run can be compared
 * with it without the data itself (drift by population stability index needs the baseline's distribution).
 *
 * - numeric (and date, as epoch days; booleans as 0/1): the empirical distribution function. When the column has
 *   at most `exactLimit` distinct values it is kept exactly (`exact: true`, each distinct value and the share of
 *   values at or below it); otherwise as `sketchPoints + 1` quantiles (share k/sketchPoints at point k), between
 *   which the distribution is interpolated linearly — so shares are accurate to about 1/sketchPoints.
 * - categorical: the count of each category (the `categoryLimit` most frequent; the rest summed as `otherCount`).
 * Missing values (null, undefined, NaN, '') are counted apart in every kind.
 */

export type ProfileKind = 'numeric' | 'boolean' | 'date' | 'categorical';

export interface NumericProfile {
  readonly kind: 'numeric' | 'boolean' | 'date';
  readonly rows: number;
  readonly missing: number;
  /** Sorted breakpoints of the distribution function over the non-missing values. */
  readonly points: number[];
  /** Share of non-missing values at or below each point (non-decreasing, last is 1). */
  readonly cum: number[];
  /** True when `points` are every distinct value (a step function); false for an interpolated sketch. */
  readonly exact: boolean;
  readonly mean: number;
}

export interface CategoricalProfile {
  readonly kind: 'categorical';
  readonly rows: number;
  readonly missing: number;
  /** Count per category, most frequent first (ties by label). */
  readonly counts: Record<string, number>;
  /** Rows in categories beyond the limit. */
  readonly otherCount: number;
}

export type ColumnProfile = NumericProfile | CategoricalProfile;

export interface ProfileOptions {
  /** Keep the distribution exactly when there are at most this many distinct values. __Default:__ `1000`. */
  readonly exactLimit?: number;
  /** Number of quantile steps in a sketch. __Default:__ `1000`. */
  readonly sketchPoints?: number;
  /** Most categories kept by name. __Default:__ `500`. */
  readonly categoryLimit?: number;
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}([T ][0-9:.]+(Z|[+-]\d{2}:?\d{2})?)?$/;
const DAY_MS = 86_400_000;

function isMissing(v: unknown): boolean {
  return v === null || v === undefined || v === '' || (typeof v === 'number' && Number.isNaN(v));
}

/** The kind a column of values profiles as: numbers, booleans, dates (Date or ISO strings), else categorical. */
export function inferProfileKind(values: ArrayLike<unknown>): ProfileKind {
  let nums = 0, bools = 0, dates = 0, isoStrings = 0, others = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isMissing(v)) continue;
    if (typeof v === 'number' || typeof v === 'bigint') nums++;
    else if (typeof v === 'boolean') bools++;
    else if (v instanceof Date) dates++;
    else if (typeof v === 'string' && ISO_DATE.test(v) && !Number.isNaN(Date.parse(v))) isoStrings++;
    else others++;
  }
  const known = nums + bools + dates + isoStrings + others;
  if (known === 0) return 'numeric';
  if (nums === known) return 'numeric';
  if (bools === known) return 'boolean';
  if (dates + isoStrings === known) return 'date';
  return 'categorical';
}

function toNumber(v: unknown, kind: ProfileKind): number {
  if (isMissing(v)) return NaN;
  if (kind === 'boolean') return v ? 1 : 0;
  if (kind === 'date') {
    const t = v instanceof Date ? v.getTime() : Date.parse(String(v));
    return t / DAY_MS;
  }
  return Number(v);
}

/**
 * Profile one column of values.
 * @example
 * profileColumn([1, 2, 2, null]); // { kind: 'numeric', rows: 4, missing: 1, points: [1, 2], cum: [1/3, 1], exact: true, ... }
 */
export function profileColumn(values: ArrayLike<unknown>, options: ProfileOptions = {}): ColumnProfile {
  const kind = inferProfileKind(values);
  if (kind === 'categorical') return profileCategories(values, options.categoryLimit ?? 500);
  const nums: number[] = [];
  let missing = 0;
  for (let i = 0; i < values.length; i++) {
    const x = toNumber(values[i], kind);
    if (Number.isNaN(x)) missing++;
    else nums.push(x);
  }
  return { kind, ...profileNumbers(Float64Array.from(nums), options), rows: values.length, missing };
}

/** Distribution function of finite numbers (exact or sketched); see the file comment. */
export function profileNumbers(
  values: Float64Array, options: ProfileOptions = {},
): Omit<NumericProfile, 'kind' | 'rows' | 'missing'> {
  const sorted = values.slice().sort();
  const n = sorted.length;
  if (n === 0) return { points: [], cum: [], exact: true, mean: NaN };
  let sum = 0;
  for (let i = 0; i < n; i++) sum += sorted[i];
  const distinct: number[] = [], cum: number[] = [];
  for (let i = 0; i < n; i++) {
    if (i + 1 < n && sorted[i + 1] === sorted[i]) continue;
    distinct.push(sorted[i]);
    cum.push((i + 1) / n);
  }
  const exactLimit = options.exactLimit ?? 1000;
  if (distinct.length <= exactLimit) return { points: distinct, cum, exact: true, mean: sum / n };
  const steps = options.sketchPoints ?? 1000;
  const points: number[] = [], shares: number[] = [];
  for (let k = 0; k <= steps; k++) {
    const q = k / steps;
    // Linear interpolation between order statistics (the "type 7" quantile, common practice).
    const h = (n - 1) * q, lo = Math.floor(h), hi = Math.min(n - 1, lo + 1);
    points.push(sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]));
    shares.push(q);
  }
  return { points, cum: shares, exact: false, mean: sum / n };
}

function profileCategories(values: ArrayLike<unknown>, limit: number): CategoricalProfile {
  const counts = new Map<string, number>();
  let missing = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isMissing(v)) { missing++; continue; }
    const key = String(v);
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  const ordered = [...counts.entries()].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  const kept: Record<string, number> = {};
  let otherCount = 0;
  ordered.forEach(([k, c], i) => { if (i < limit) kept[k] = c; else otherCount += c; });
  return { kind: 'categorical', rows: values.length, missing, counts: kept, otherCount };
}

/**
 * Share of a numeric profile's non-missing values at or below `x` (its distribution function).
 * @example
 * shareAtOrBelow(profileColumn([1, 2, 3, 4]) as NumericProfile, 2); // 0.5
 */
export function shareAtOrBelow(p: Pick<NumericProfile, 'points' | 'cum' | 'exact'>, x: number): number {
  const { points, cum } = p;
  const n = points.length;
  if (n === 0 || x < points[0]) return 0;
  if (x >= points[n - 1]) return 1;
  // last index with points[i] <= x
  let lo = 0, hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (points[mid] <= x) lo = mid; else hi = mid - 1;
  }
  if (p.exact) return cum[lo];
  // sketch: ties in points (a value repeated over many quantiles) take the highest share at that value
  const x0 = points[lo], x1 = points[lo + 1];
  if (x1 === x0) return cum[lo + 1];
  return cum[lo] + ((x - x0) / (x1 - x0)) * (cum[lo + 1] - cum[lo]);
}

/**
 * The value below which a share `q` of a numeric profile lies (inverse of `shareAtOrBelow`).
 * @example
 * quantileOf(profileColumn([1, 2, 3, 4]) as NumericProfile, 0.5); // 2
 */
export function quantileOf(p: Pick<NumericProfile, 'points' | 'cum' | 'exact'>, q: number): number {
  const { points, cum } = p;
  const n = points.length;
  if (n === 0) return NaN;
  if (p.exact) {
    for (let i = 0; i < n; i++) if (cum[i] >= q - 1e-12) return points[i];
    return points[n - 1];
  }
  const h = q * (n - 1), lo = Math.floor(h), hi = Math.min(n - 1, lo + 1);
  return points[lo] + (h - lo) * (points[hi] - points[lo]);
}
