/**
 * Population stability index (PSI) between a baseline and a current distribution:
 *
 *   PSI = Σ_i (c_i − b_i) · ln(c_i / b_i)
 *
 * over bins i, where b_i and c_i are the shares of baseline and current rows in bin i. Shares below a small floor
 * are raised to it so an empty bin gives a large but finite term. Numeric bins are cut at the baseline's
 * quantiles (deciles by default) with missing values as a bin of their own; categorical bins are the categories
 * seen on either side (plus missing). Bands: below 0.1 stable, 0.1 to 0.25 moderate, above 0.25 major shift
 * (thresholds: common practice in credit scoring).
 */
import type { CategoricalProfile, ColumnProfile, NumericProfile } from './record-profile.js';
import { quantileOf, shareAtOrBelow } from './record-profile.js';

/** Smallest share used in the log ratio (common practice: a small floor avoids ln(0)). */
export const PSI_FLOOR = 1e-4;

export type DriftBand = 'stable' | 'moderate' | 'major';

/** One bin of a drift table: its label and the two shares. */
export interface DriftBin {
  readonly label: string;
  readonly baseline: number;
  readonly current: number;
}

export interface DriftResult {
  readonly psi: number;
  readonly band: DriftBand;
  readonly bins: readonly DriftBin[];
}

/**
 * PSI from two lists of shares over the same bins (each list should sum to 1).
 * @param floor shares below it are raised to it. __Default:__ `PSI_FLOOR` (1e-4).
 * @example
 * psiFromShares([0.5, 0.5], [0.4, 0.6]); // (0.4−0.5)ln(0.4/0.5) + (0.6−0.5)ln(0.6/0.5) ≈ 0.04055
 */
export function psiFromShares(baseline: ArrayLike<number>, current: ArrayLike<number>, floor = PSI_FLOOR): number {
  if (baseline.length !== current.length) throw new RangeError(`psiFromShares: ${baseline.length} vs ${current.length} bins`);
  let sum = 0;
  for (let i = 0; i < baseline.length; i++) {
    const b = Math.max(baseline[i], floor), c = Math.max(current[i], floor);
    sum += (c - b) * Math.log(c / b);
  }
  return sum;
}

/**
 * The band a PSI value falls in (common practice: < 0.1 stable, 0.1–0.25 moderate, > 0.25 major).
 * @example
 * driftBand(0.12); // 'moderate'
 */
export function driftBand(psi: number): DriftBand {
  return psi < 0.1 ? 'stable' : psi <= 0.25 ? 'moderate' : 'major';
}

function fmtEdge(x: number): string {
  return String(Number(x.toPrecision(4)));
}

/**
 * Cut points at the baseline's quantiles 1/k, 2/k, …, (k−1)/k, repeated values removed.
 * @example
 * quantileEdges(profileColumn([1, 2, 3, 4]) as NumericProfile, 2); // [2]
 */
export function quantileEdges(baseline: NumericProfile, k = 10): number[] {
  const edges: number[] = [];
  for (let j = 1; j < k; j++) {
    const e = quantileOf(baseline, j / k);
    if (Number.isFinite(e) && (edges.length === 0 || e > edges[edges.length - 1])) edges.push(e);
  }
  return edges;
}

/** Shares of a numeric profile's rows in bins (−∞, e1], (e1, e2], …, (ek, ∞) and missing (last). */
function numericShares(p: NumericProfile, edges: readonly number[]): number[] {
  const known = p.rows - p.missing;
  const scale = p.rows > 0 ? known / p.rows : 0;
  const out: number[] = [];
  let prev = 0;
  for (const e of edges) {
    const f = known > 0 ? shareAtOrBelow(p, e) : 0;
    out.push((f - prev) * scale);
    prev = f;
  }
  out.push(((known > 0 ? 1 : 0) - prev) * scale);
  out.push(p.rows > 0 ? p.missing / p.rows : 0);
  return out;
}

/**
 * Drift of a numeric column between two profiles, over bins at the baseline's quantiles.
 * @param k number of quantile bins. __Default:__ `10`.
 * @example
 * numericDrift(profileA, profileB).psi;
 */
export function numericDrift(baseline: NumericProfile, current: NumericProfile, k = 10): DriftResult {
  const edges = quantileEdges(baseline, k);
  const b = numericShares(baseline, edges), c = numericShares(current, edges);
  const labels = edges.length === 0 ? ['all values'] : [
    `≤ ${fmtEdge(edges[0])}`,
    ...edges.slice(1).map((e, i) => `${fmtEdge(edges[i])} – ${fmtEdge(e)}`),
    `> ${fmtEdge(edges[edges.length - 1])}`,
  ];
  labels.push('missing');
  return finish(labels, b, c);
}

function categoricalShares(p: CategoricalProfile, labels: readonly string[]): number[] {
  const n = p.rows;
  return labels.map((l) => (n === 0 ? 0 : (l === '\u0000missing' ? p.missing : l === '\u0000other' ? p.otherCount : p.counts[l] ?? 0) / n));
}

/**
 * Drift of a categorical column between two profiles, over the categories seen on either side.
 * @example
 * categoricalDrift(profileA, profileB).bins; // [{ label: 'north', baseline: 0.5, current: 0.4 }, ...]
 */
export function categoricalDrift(baseline: CategoricalProfile, current: CategoricalProfile): DriftResult {
  const cats = [...new Set([...Object.keys(baseline.counts), ...Object.keys(current.counts)])];
  const keys = [...cats, '\u0000other', '\u0000missing'];
  const b = categoricalShares(baseline, keys), c = categoricalShares(current, keys);
  const labels = [...cats, '(other categories)', 'missing'];
  return finish(labels, b, c);
}

function finish(labels: string[], b: number[], c: number[]): DriftResult {
  // Bins empty on both sides add nothing; leave them out of the table.
  const keep = labels.map((_, i) => b[i] > 0 || c[i] > 0);
  const bins = labels.map((label, i) => ({ label, baseline: b[i], current: c[i] })).filter((_, i) => keep[i]);
  const psi = psiFromShares(bins.map((x) => x.baseline), bins.map((x) => x.current));
  return { psi, band: driftBand(psi), bins };
}

/**
 * Drift between two column profiles of compatible kinds, or null when the kinds differ (a schema change).
 * @example
 * columnDrift(before.profiles.distance_km, after.profiles.distance_km)?.band; // 'stable'
 */
export function columnDrift(baseline: ColumnProfile, current: ColumnProfile, k = 10): DriftResult | null {
  if (baseline.kind === 'categorical' && current.kind === 'categorical') return categoricalDrift(baseline, current);
  if (baseline.kind !== 'categorical' && current.kind !== 'categorical' && baseline.kind === current.kind) {
    return numericDrift(baseline, current, k);
  }
  return null;
}
