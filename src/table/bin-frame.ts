/**
 * BinnedFrame: every feature of a Frame coded as one byte per row, for the histogram grower.
 *
 * Layout: `codes` is column-major — feature f, row r at `codes[f * nRows + r]`. Codes 0..nBins-1 are bins;
 * MISSING_BIN (255) is the missing bin (NaN, or categorical code -1).
 * - numeric / boolean: bin b holds upper[b-1] < x <= upper[b] (see bin-edges.ts);
 * - categorical: with at most `limit` categories, category code c is bin c. With more, the limit-1 most
 *   frequent categories (ties: smaller code) keep a bin each, in code order, and all other categories share
 *   the last bin; a subset split then sends all of them the same way.
 */
import { errors } from '../errors.js';
import { numericBins } from './bin-edges.js';
import type { CategoricalColumn, Column, Frame } from './frame.js';

export const MISSING_BIN = 255;

export interface BinnedFeature {
  readonly name: string;
  readonly kind: 'numeric' | 'categorical';
  /** Number of bins, 1..255, not counting the missing bin. */
  readonly nBins: number;
  /** Numeric: upper bound of each bin (last = +Infinity). Categorical: empty. */
  readonly upper: Float64Array;
  /** Numeric: the single value of each bin when every bin is one distinct value, else null. */
  readonly binValues: Float64Array | null;
  /** Categorical: bin of each category code (length = dictionary size). Numeric: null. */
  readonly binOfCode: Uint8Array | null;
}

export interface BinnedFrame {
  readonly nRows: number;
  readonly features: readonly BinnedFeature[];
  /** Column-major bin codes, nRows × features.length. */
  readonly codes: Uint8Array;
}

/** Options of `binFrame`. */
export interface BinOptions {
  /** Most bins per feature, 2..255 (the missing bin comes on top). __Default:__ 255. */
  readonly binLimit?: number;
  /** Numeric columns with more non-missing rows than this are cut from a quantile sketch. __Default:__ 1048576. */
  readonly exactRows?: number;
  /** Accuracy parameter of that sketch (see bin-sketch.ts). __Default:__ 800. */
  readonly sketchK?: number;
}

export interface ResolvedBinOptions {
  readonly binLimit: number;
  readonly exactRows: number;
  readonly sketchK: number;
}

/**
 * Fill in and check bin options.
 * @example
 * resolveBinOptions({ binLimit: 63 }); // { binLimit: 63, exactRows: 1048576, sketchK: 800 }
 */
export function resolveBinOptions(opts: BinOptions = {}): ResolvedBinOptions {
  const binLimit = opts.binLimit ?? 255;
  const exactRows = opts.exactRows ?? 1 << 20;
  const sketchK = opts.sketchK ?? 800;
  if (!(Number.isInteger(binLimit) && binLimit >= 2 && binLimit <= 255)) throw errors.badOption('binLimit', binLimit, 'an integer from 2 to 255');
  if (!(exactRows >= 0)) throw errors.badOption('exactRows', exactRows, 'a number >= 0');
  if (!(Number.isInteger(sketchK) && sketchK >= 8)) throw errors.badOption('sketchK', sketchK, 'an integer >= 8');
  return { binLimit, exactRows, sketchK };
}

/**
 * Bin code of x given upper bounds (binary search for the first bound >= x); NaN -> MISSING_BIN.
 * @example
 * binOfValue(Float64Array.of(1.5, Infinity), 2); // 1
 */
export function binOfValue(upper: Float64Array, x: number): number {
  if (x !== x) return MISSING_BIN;
  let lo = 0, hi = upper.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (x <= upper[mid]) hi = mid; else lo = mid + 1;
  }
  return lo;
}

/** Buckets of the lookup table `codeNumeric` uses to start its search near the right bin. */
const BUCKETS = 4096;

/**
 * Write the codes of a numeric column into `out` (same length as `values`): the same codes as
 * `binOfValue`, found by a bucket table over [upper[0], last finite bound] that gives a bin at or below
 * the answer, then a short forward scan.
 * @example
 * codeNumeric(Float64Array.of(1, NaN), Float64Array.of(1.5, Infinity), out); // out = [0, 255]
 */
export function codeNumeric(values: Float64Array, upper: Float64Array, out: Uint8Array): void {
  const nb = upper.length;
  const lo = upper[0], hi = upper[nb - 2];
  if (nb < 8 || !(hi > lo) || !Number.isFinite(hi - lo)) {
    for (let i = 0; i < values.length; i++) out[i] = binOfValue(upper, values[i]);
    return;
  }
  const scale = BUCKETS / (hi - lo);
  // start[g]: bin of the lower edge of bucket g - 1 (one bucket of margin for rounding)
  const start = new Uint8Array(BUCKETS + 1);
  for (let g = 2; g <= BUCKETS; g++) start[g] = binOfValue(upper, lo + (g - 1) / scale);
  for (let i = 0; i < values.length; i++) {
    const x = values[i];
    if (x !== x) { out[i] = MISSING_BIN; continue; }
    if (x <= lo) { out[i] = 0; continue; }
    if (x > hi) { out[i] = nb - 1; continue; }
    let b = start[Math.min(BUCKETS, Math.floor((x - lo) * scale))];
    while (x > upper[b]) b++;
    out[i] = b;
  }
}

/**
 * Bin of each category code: identity up to `limit` categories, else the most frequent keep their own bin.
 * @example
 * categoryBins(column, 255).binOfCode; // [0, 1, 2, ...]
 */
export function categoryBins(col: CategoricalColumn, limit: number): { binOfCode: Uint8Array; nBins: number } {
  const k = col.categories.length;
  const binOfCode = new Uint8Array(k);
  if (k <= limit) {
    for (let c = 0; c < k; c++) binOfCode[c] = c;
    return { binOfCode, nBins: Math.max(k, 1) };
  }
  const freq = new Float64Array(k);
  for (let i = 0; i < col.codes.length; i++) if (col.codes[i] >= 0) freq[col.codes[i]]++;
  const byFreq = Array.from({ length: k }, (_, c) => c).sort((a, b) => freq[b] - freq[a] || a - b);
  const kept = byFreq.slice(0, limit - 1).sort((a, b) => a - b);
  binOfCode.fill(limit - 1);
  kept.forEach((c, b) => { binOfCode[c] = b; });
  return { binOfCode, nBins: limit };
}

/**
 * Bin one column, writing its codes into `out` (length = rows); returns the column's bin description.
 * @example
 * const out = new Uint8Array(frame.nRows);
 * const feature = binColumn(frame.columns[0], resolveBinOptions(), out);
 */
export function binColumn(col: Column, opts: ResolvedBinOptions, out: Uint8Array): BinnedFeature {
  const n = out.length;
  if (col.kind === 'categorical') {
    const { binOfCode, nBins } = categoryBins(col, opts.binLimit);
    for (let i = 0; i < n; i++) {
      const c = col.codes[i];
      out[i] = c >= 0 && c < binOfCode.length ? binOfCode[c] : MISSING_BIN;
    }
    return { name: col.name, kind: 'categorical', nBins, upper: new Float64Array(0), binValues: null, binOfCode };
  }
  const { upper, binValues } = numericBins(col.values, { limit: opts.binLimit, exactRows: opts.exactRows, sketchK: opts.sketchK });
  codeNumeric(col.values, upper, out);
  return { name: col.name, kind: 'numeric', nBins: upper.length, upper, binValues, binOfCode: null };
}

/**
 * Bin every feature of a frame (see the layout above). Prefer `binnedFrameFor`, which caches the result.
 * @example
 * const binned = binFrame(frame, { binLimit: 63 });
 * binned.codes[2 * binned.nRows + 10]; // bin of row 10 in feature 2
 */
export function binFrame(frame: Frame, options: BinOptions = {}): BinnedFrame {
  const opts = resolveBinOptions(options);
  const n = frame.nRows;
  const codes = new Uint8Array(n * frame.columns.length);
  const features = frame.columns.map((col, f) => binColumn(col, opts, codes.subarray(f * n, (f + 1) * n)));
  return { nRows: n, features, codes };
}
