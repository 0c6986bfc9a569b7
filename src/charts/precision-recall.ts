/**
 * Precision–recall curves, drawn as steps (precision holds until the next recall point), with average
 * precision in the legend and, when given, the no-skill level (the share of positives).
 */
import { averagePrecision } from './area-under-curve.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { checkRate } from './roc-curve.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { SERIES_COLOURS } from './theme.js';

/** One precision–recall curve. */
export interface PrecisionRecallInput {
  /** Class (one-vs-rest) or model name. */
  readonly label: string;
  /** Points of the curve (values in 0..1), in any order (the assess layer's PR points fit). */
  readonly points: readonly { readonly recall: number; readonly precision: number }[];
  /** Average precision. __Default:__ computed from the points (step-wise). */
  readonly averagePrecision?: number;
  /** Share of positives: the precision of a model that ranks at random. __Default:__ not drawn. */
  readonly baseline?: number;
}

const CHART = 'chartPrecisionRecall';

/**
 * Precision–recall curves with average precision (AP).
 *
 * @param curves  One or more curves.
 * @param options title, subtitle, width, height. __Default:__ a 340 × 340 plot.
 * @example
 * chartPrecisionRecall([{ label: 'rejected', baseline: 0.2,
 *   points: [{ recall: 0.3, precision: 0.9 }, { recall: 0.8, precision: 0.6 }, { recall: 1, precision: 0.2 }] }]);
 */
export function chartPrecisionRecall(curves: readonly PrecisionRecallInput[], options: ChartOptions = {}): ChartSpec {
  const values: { series: string; recall: number; precision: number }[] = [];
  const baselines: { series: string; baseline: number }[] = [];
  const names: string[] = [];
  curves.forEach((c, k) => {
    const label = checkLabel(CHART, 'label', k, c.label);
    const pts = c.points.map((p, i) => ({
      recall: checkRate(CHART, `${label}: recall`, i, p.recall), precision: checkRate(CHART, `${label}: precision`, i, p.precision),
    })).sort((a, b) => a.recall - b.recall || b.precision - a.precision);
    const ap = c.averagePrecision !== undefined ? checkFinite(CHART, 'averagePrecision', k, c.averagePrecision) : averagePrecision(pts);
    const series = `${label} (AP ${formatNumber(ap)})`;
    names.push(series);
    if (pts.length > 0 && pts[0].recall > 0) values.push({ series, recall: 0, precision: pts[0].precision });
    for (const p of pts) values.push({ series, ...p });
    if (c.baseline !== undefined) baselines.push({ series, baseline: checkRate(CHART, 'baseline', k, c.baseline) });
  });
  const single = names.length === 1;
  const [title, subtitle] = titles(options, single ? `Precision–recall · ${names[0]}` : 'Precision–recall curves',
    baselines.length > 0 ? 'Dotted lines: share of positives (a model that ranks at random)' : undefined);
  if (values.length === 0) return chartEmpty(title, 'No curve points to draw.', options);
  const size = plotSize(options, 340, 340);
  const color = { field: 'series', type: 'nominal', title: null, sort: names, scale: { domain: names, range: [...SERIES_COLOURS] },
    legend: single ? null : { orient: 'bottom-left', direction: 'vertical', fillColor: '#ffffffdd', padding: 6 } };
  const rate = (field: string, t: string) => ({ field, type: 'quantitative', title: t, scale: { domain: [0, 1] }, axis: { format: '.0%', tickCount: 5, grid: true } });
  const layers: Record<string, unknown>[] = [
    { data: { values }, mark: { type: 'line', interpolate: 'step-before', strokeWidth: 2.2 },
      encoding: { x: rate('recall', 'Recall (true positive rate)'), y: rate('precision', 'Precision'), order: { field: 'recall' }, color } },
  ];
  if (baselines.length > 0) {
    layers.push({ data: { values: baselines }, mark: { type: 'rule', strokeDash: [1, 3], strokeWidth: 1.6 },
      encoding: { y: { field: 'baseline', type: 'quantitative' }, color } });
  }
  return finishChart({ width: size.width, height: size.height, layer: layers }, title, subtitle);
}
