/**
 * Calibration: in bins of predicted probability, the mean prediction against the observed share of
 * positives, with the diagonal of perfect calibration; point area shows how many rows each bin holds.
 */
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { checkRate } from './roc-curve.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE, SERIES_COLOURS } from './theme.js';

/** One bin of predicted probabilities (the assess layer's calibration table rows fit). */
export interface CalibrationChartBin {
  /** Mean predicted probability in the bin. */
  readonly meanPredicted: number;
  /** Observed share of positives in the bin. */
  readonly observed: number;
  /** Rows in the bin. */
  readonly rows: number;
  /** Series (model or class) the bin belongs to. __Default:__ one series. */
  readonly series?: string;
}

const CHART = 'chartCalibration';

/**
 * Calibration curve(s).
 *
 * @param bins    Bins, one or more series.
 * @param options title, subtitle, width, height. __Default:__ a 340 × 340 plot.
 * @example
 * chartCalibration([{ meanPredicted: 0.1, observed: 0.08, rows: 120 }, { meanPredicted: 0.5, observed: 0.56, rows: 40 }]);
 */
export function chartCalibration(bins: readonly CalibrationChartBin[], options: ChartOptions = {}): ChartSpec {
  const [title, subtitle] = titles(options, 'Calibration', 'Above the dashed diagonal: more positives than predicted · point area: rows in the bin');
  if (bins.length === 0) return chartEmpty(title, 'No bins to draw.', options);
  const size = plotSize(options, 340, 340);
  const values = bins.map((b, i) => ({
    predicted: checkRate(CHART, 'meanPredicted', i, b.meanPredicted),
    observed: checkRate(CHART, 'observed', i, b.observed),
    rows: checkFinite(CHART, 'rows', i, b.rows),
    series: b.series === undefined ? 'model' : checkLabel(CHART, 'series', i, b.series),
  }));
  const single = new Set(values.map((v) => v.series)).size === 1;
  const rate = (field: string, t: string) => ({ field, type: 'quantitative', title: t, scale: { domain: [0, 1] }, axis: { format: '.0%', tickCount: 5, grid: true } });
  const color = { field: 'series', type: 'nominal', title: null, scale: { range: [...SERIES_COLOURS] }, legend: single ? null : { orient: 'top-left', direction: 'vertical', fillColor: '#ffffffdd', padding: 6 } };
  return finishChart({
    width: size.width, height: size.height,
    layer: [
      { data: { values: [{ a: 0, b: 1 }] }, mark: { type: 'rule', strokeDash: [4, 3], color: ROLE.reference },
        encoding: { x: { field: 'a', type: 'quantitative' }, y: { field: 'a', type: 'quantitative' }, x2: { field: 'b' }, y2: { field: 'b' } } },
      { data: { values }, mark: { type: 'line', strokeWidth: 1.6 },
        encoding: { x: rate('predicted', 'Mean predicted probability'), y: rate('observed', 'Observed share of positives'), order: { field: 'predicted' }, color } },
      { data: { values }, mark: { type: 'point', filled: true, opacity: 0.9, stroke: '#ffffff', strokeWidth: 1 },
        encoding: {
          x: rate('predicted', 'Mean predicted probability'), y: rate('observed', 'Observed share of positives'), color,
          size: { field: 'rows', type: 'quantitative', title: 'rows', scale: { range: [20, 320], zero: true }, legend: single ? { orient: 'top-left', direction: 'vertical', tickCount: 3, symbolFillColor: ROLE.primary, symbolStrokeWidth: 0 } : null },
        } },
    ],
  }, title, subtitle);
}
