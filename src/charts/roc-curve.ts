/**
 * ROC curves: true positive rate against false positive rate, one curve per class (one-vs-rest) or a
 * single curve, with the area under each curve in the legend and the chance diagonal.
 */
import { areaUnderRoc } from './area-under-curve.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE, SERIES_COLOURS } from './theme.js';
import { errors } from '../errors.js';

/** One ROC curve. */
export interface RocCurveInput {
  /** Class (one-vs-rest) or model name. */
  readonly label: string;
  /** Points of the curve (rates in 0..1), in any order (the assess layer's ROC points fit). */
  readonly points: readonly { readonly falsePositiveRate: number; readonly truePositiveRate: number }[];
  /** Area under the curve. __Default:__ computed by the trapezoid rule. */
  readonly auc?: number;
}

const CHART = 'chartRoc';

/** Check a rate in [0, 1]. */
export function checkRate(chart: string, field: string, row: number, value: unknown): number {
  const v = checkFinite(chart, field, row, value);
  if (v < 0 || v > 1) throw errors.chartInput(chart, field, row, v, 'a rate between 0 and 1');
  return v;
}

/**
 * ROC curves with their AUC.
 *
 * @param curves  One or more curves.
 * @param options title, subtitle, width, height. __Default:__ a 340 × 340 plot.
 * @example
 * chartRoc([{ label: 'rejected', points: [{ falsePositiveRate: 0.1, truePositiveRate: 0.7 }] }]);
 */
export function chartRoc(curves: readonly RocCurveInput[], options: ChartOptions = {}): ChartSpec {
  const values: { series: string; fpr: number; tpr: number; order: number }[] = [];
  const names: string[] = [];
  curves.forEach((c, k) => {
    const label = checkLabel(CHART, 'label', k, c.label);
    const pts = c.points.map((p, i) => ({ fpr: checkRate(CHART, `${label}: falsePositiveRate`, i, p.falsePositiveRate), tpr: checkRate(CHART, `${label}: truePositiveRate`, i, p.truePositiveRate) }));
    const auc = c.auc !== undefined ? checkFinite(CHART, 'auc', k, c.auc) : areaUnderRoc(pts);
    const series = `${label} (AUC ${formatNumber(auc)})`;
    names.push(series);
    const closed = [{ fpr: 0, tpr: 0 }, ...pts, { fpr: 1, tpr: 1 }].sort((a, b) => a.fpr - b.fpr || a.tpr - b.tpr);
    closed.forEach((p, order) => values.push({ series, ...p, order }));
  });
  const single = names.length === 1;
  const [title, subtitle] = titles(options, single ? `ROC curve · ${names[0]}` : 'ROC curves',
    'Dashed diagonal: a model that ranks at random (AUC 0.5)');
  if (curves.length === 0 || curves.every((c) => c.points.length === 0)) return chartEmpty(title, 'No curve points to draw.', options);
  const size = plotSize(options, 340, 340);
  const rate = (field: string, t: string) => ({ field, type: 'quantitative', title: t, scale: { domain: [0, 1] }, axis: { format: '.0%', tickCount: 5, grid: true } });
  return finishChart({
    width: size.width, height: size.height,
    layer: [
      { data: { values: [{ a: 0, b: 1 }] }, mark: { type: 'rule', strokeDash: [4, 3], color: ROLE.reference },
        encoding: { x: { field: 'a', type: 'quantitative' }, y: { field: 'a', type: 'quantitative' }, x2: { field: 'b' }, y2: { field: 'b' } } },
      { data: { values }, mark: { type: 'line', strokeWidth: 2.2, interpolate: 'linear' },
        encoding: {
          x: rate('fpr', 'False positive rate'), y: rate('tpr', 'True positive rate'), order: { field: 'order' },
          color: { field: 'series', type: 'nominal', title: null, sort: names, scale: { range: [...SERIES_COLOURS] },
            legend: single ? null : { orient: 'bottom-right', direction: 'vertical', fillColor: '#ffffffdd', padding: 6 } },
        } },
    ],
  }, title, subtitle);
}
