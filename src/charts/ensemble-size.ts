/**
 * Error by ensemble size (e.g. out-of-bag error of a forest as trees are added), one line per series.
 */
import { errors } from '../errors.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { SERIES_COLOURS } from './theme.js';

/** Error of an ensemble of `size` members. */
export interface EnsembleSizeRow {
  /** Members (trees) in the ensemble. */
  readonly size: number;
  /** Error at that size. */
  readonly error: number;
  /** Which ensemble or setting the row belongs to. __Default:__ one series. */
  readonly series?: string;
}

/** Options for `chartEnsembleSizeError`. */
export interface EnsembleSizeOptions extends ChartOptions {
  /** Name of the error (y-axis title). __Default:__ 'out-of-bag error rate'. */
  readonly errorName?: string;
  /** Title of the series legend (e.g. 'features tried per split'). __Default:__ none. */
  readonly seriesName?: string;
  /**
   * Ensembles of at most this many trees are drawn faint, and the y-axis is fitted to the larger ones (the
   * faint line may leave the plot at the top): with few trees few rows are out-of-bag, so the first points
   * are noisy and would otherwise dominate the scale. 0 draws every point alike. __Default:__ 10.
   */
  readonly earlyTrees?: number;
}

const CHART = 'chartEnsembleSizeError';

/**
 * Error against the number of trees.
 *
 * @param rows    One row per ensemble size and series.
 * @param options `errorName` __Default:__ 'out-of-bag error rate'; `seriesName` __Default:__ none; `earlyTrees`
 *                __Default:__ 10; plus title, subtitle, width, height.
 * @example
 * chartEnsembleSizeError([{ size: 10, error: 0.2 }, { size: 50, error: 0.15 }, { size: 100, error: 0.14 }]);
 */
export function chartEnsembleSizeError(rows: readonly EnsembleSizeRow[], options: EnsembleSizeOptions = {}): ChartSpec {
  const errorName = options.errorName ?? 'out-of-bag error rate';
  const [title, subtitle] = titles(options, `${errorName[0].toUpperCase()}${errorName.slice(1)} by ensemble size`);
  if (rows.length === 0) return chartEmpty(title, 'No ensemble sizes were recorded.', options);
  const size = plotSize(options);
  const values = rows.map((r, i) => ({
    size: checkFinite(CHART, 'size', i, r.size),
    error: checkFinite(CHART, 'error', i, r.error),
    series: r.series === undefined ? 'ensemble' : checkLabel(CHART, 'series', i, r.series),
  }));
  const single = new Set(values.map((v) => v.series)).size === 1;
  const earlyTrees = options.earlyTrees ?? 10;
  if (!(Number.isFinite(earlyTrees) && earlyTrees >= 0)) throw errors.badOption('earlyTrees', earlyTrees, 'a number of trees >= 0');
  const later = values.filter((v) => v.size > earlyTrees);
  const fade = later.length > 0 && later.length < values.length;
  let lo = Infinity, hi = -Infinity;
  for (const v of later) { lo = Math.min(lo, v.error); hi = Math.max(hi, v.error); }
  const clipped = fade && values.some((v) => v.error < lo || v.error > hi);
  const yTitle = `${errorName[0].toUpperCase()}${errorName.slice(1)}`;
  const point = values.length <= 60 ? { size: 24 } : false;
  const encoding = {
    x: { field: 'size', type: 'quantitative', title: 'Trees in the ensemble', axis: { format: 'd', tickMinStep: 1 } },
    y: { field: 'error', type: 'quantitative', title: yTitle, scale: clipped ? { domain: [lo, hi], nice: true, zero: false } : { zero: false } },
    order: { field: 'size' },
    color: { field: 'series', type: 'nominal', title: options.seriesName ?? null, scale: { range: [...SERIES_COLOURS] }, legend: single ? null : { symbolOpacity: 1 } },
  };
  const line = { type: 'line', interpolate: 'linear', clip: true };
  const layer = fade
    ? [
      { mark: { ...line, opacity: 0.3, point: point && { ...point, opacity: 0.3 } } },
      { transform: [{ filter: `datum.size > ${earlyTrees}` }], mark: { ...line, point } },
    ]
    : [{ mark: { ...line, point } }];
  const note = fade ? `Ensembles of ${earlyTrees} trees or fewer drawn faint (few trees: a noisy estimate)${clipped ? '; the y-axis fits the larger ones' : ''}` : undefined;
  return finishChart({ width: size.width, height: size.height, data: { values }, encoding, layer }, title, subtitle ?? note);
}
