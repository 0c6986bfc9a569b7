/**
 * Validation curve from a search over one setting: the score of every fold at every setting value,
 * the mean across folds with a ±1 standard deviation band, and the chosen value marked.
 */
import { errors } from '../errors.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { markerLayers } from './reference-mark.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** Score of one fold at one setting value. */
export interface ValidationCurveRow {
  /** Value of the setting (numbers draw a numeric axis; strings a category axis). */
  readonly value: number | string;
  /** Fold id. */
  readonly fold: number | string;
  /** Score on the fold's held-out rows. */
  readonly score: number;
}

/** Options for `chartValidationCurve`. */
export interface ValidationCurveOptions extends ChartOptions {
  /** Name of the setting searched (x-axis title). __Default:__ 'setting'. */
  readonly setting?: string;
  /** Name of the score (y-axis title; add units if any). __Default:__ 'score'. */
  readonly scoreName?: string;
  /** The value chosen by the search; drawn as a marker. __Default:__ none. */
  readonly chosen?: number | string;
  /** Log scale for a numeric setting: true, false or 'auto' (positive values spanning ≥ 100×). __Default:__ 'auto'. */
  readonly logScale?: boolean | 'auto';
}

const CHART = 'chartValidationCurve';

interface Summary { value: number | string; mean: number; low: number; high: number; folds: number }

/** Mean and mean ± 1 standard deviation (n − 1 denominator) of the scores at each setting value, in first-seen order. */
export function summariseFolds(rows: readonly { value: number | string; score: number }[]): Summary[] {
  const groups = new Map<number | string, number[]>();
  for (const r of rows) {
    const g = groups.get(r.value);
    if (g) g.push(r.score); else groups.set(r.value, [r.score]);
  }
  return [...groups].map(([value, scores]) => {
    const n = scores.length;
    const mean = scores.reduce((a, b) => a + b, 0) / n;
    const sd = n > 1 ? Math.sqrt(scores.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1)) : 0;
    return { value, mean, low: mean - sd, high: mean + sd, folds: n };
  });
}

/**
 * Fold scores, their mean and spread across the values of one setting.
 *
 * @param rows    One row per setting value and fold.
 * @param options `setting` __Default:__ 'setting'; `scoreName` __Default:__ 'score'; `chosen` __Default:__ none;
 *                `logScale` __Default:__ 'auto'; plus title, subtitle, width, height.
 * @example
 * chartValidationCurve(
 *   [{ value: 2, fold: 1, score: 0.71 }, { value: 2, fold: 2, score: 0.69 }, { value: 4, fold: 1, score: 0.78 }],
 *   { setting: 'depth limit', scoreName: 'accuracy', chosen: 4 },
 * );
 */
export function chartValidationCurve(rows: readonly ValidationCurveRow[], options: ValidationCurveOptions = {}): ChartSpec {
  const setting = options.setting ?? 'setting';
  const scoreName = options.scoreName ?? 'score';
  const [title, subtitle] = titles(options, `Validation curve: ${setting}`,
    'Dots: each fold · line: mean across folds · band: ±1 standard deviation');
  if (rows.length === 0) return chartEmpty(title, 'The search recorded no scores.', options);
  const size = plotSize(options);
  const numeric = rows.every((r) => typeof r.value === 'number');
  const values = rows.map((r, i) => ({
    value: numeric ? checkFinite(CHART, 'value', i, r.value) : checkLabel(CHART, 'value', i, r.value),
    fold: checkLabel(CHART, 'fold', i, r.fold),
    score: checkFinite(CHART, 'score', i, r.score),
  }));
  const positive = numeric && values.every((v) => (v.value as number) > 0);
  const nums = values.map((v) => v.value as number);
  const span = positive ? Math.max(...nums) / Math.min(...nums) : 1;
  const log = options.logScale === 'auto' || options.logScale === undefined ? positive && span >= 100 : options.logScale;
  if (log && !positive) throw errors.badOption('logScale', true, 'positive setting values');
  const type = numeric ? 'quantitative' : 'ordinal';
  const x = {
    field: 'value', type, title: setting,
    ...(numeric ? { scale: log ? { type: 'log', nice: false, padding: 14 } : { zero: false, nice: false, padding: 10 } } : { sort: null, axis: { labelAngle: 0 } }),
  };
  const y = { field: 'score', type: 'quantitative', title: scoreName, scale: { zero: false } };
  const summary = summariseFolds(values);
  const layers: Record<string, unknown>[] = [];
  if (summary.some((s) => s.folds > 1)) {
    layers.push(numeric
      ? { data: { values: summary }, mark: { type: 'area', color: ROLE.primary, opacity: 0.12 },
        encoding: { x, y: { ...y, field: 'low' }, y2: { field: 'high' } } }
      : { data: { values: summary }, mark: { type: 'rule', color: ROLE.primary, strokeWidth: 6, opacity: 0.18 },
        encoding: { x, y: { ...y, field: 'low' }, y2: { field: 'high' } } });
  }
  layers.push(
    { mark: { type: 'point', filled: true, size: 22, color: ROLE.faint, opacity: 0.8 }, encoding: { x, y } },
    { data: { values: summary }, mark: { type: 'line', color: ROLE.primary, point: { size: 46, color: ROLE.primary } },
      encoding: { x, y: { ...y, field: 'mean' }, tooltip: [{ field: 'value' }, { field: 'mean', format: '.4~g' }] } },
  );
  if (options.chosen !== undefined) {
    const at = summary.find((s) => s.value === options.chosen);
    if (!at) throw errors.badOption('chosen', options.chosen, 'one of the setting values in the rows');
    layers.push(...markerLayers(at.value, `chosen ${at.value} · mean ${formatNumber(at.mean)}`, numeric ? 'quantitative' : 'ordinal'));
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers }, title, subtitle);
}
