/**
 * Error by ensemble size (e.g. out-of-bag error of a forest as trees are added), one line per series.
 */
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
}

const CHART = 'chartEnsembleSizeError';

/**
 * Error against the number of trees.
 *
 * @param rows    One row per ensemble size and series.
 * @param options `errorName` __Default:__ 'out-of-bag error rate'; `seriesName` __Default:__ none; plus title,
 *                subtitle, width, height.
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
  return finishChart({
    width: size.width, height: size.height,
    data: { values },
    mark: { type: 'line', interpolate: 'linear', point: values.length <= 60 ? { size: 24 } : false },
    encoding: {
      x: { field: 'size', type: 'quantitative', title: 'Trees in the ensemble', axis: { format: 'd', tickMinStep: 1 } },
      y: { field: 'error', type: 'quantitative', title: errorName, scale: { zero: false } },
      order: { field: 'size' },
      color: { field: 'series', type: 'nominal', title: options.seriesName ?? null, scale: { range: [...SERIES_COLOURS] }, legend: single ? null : {} },
    },
  }, title, subtitle);
}
