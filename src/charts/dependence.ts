/**
 * Partial dependence of the prediction on one feature (the average over rows as the feature is set to
 * each grid value), optionally with individual curves (one per row, "ICE") behind it. Numeric features
 * draw lines; categorical features draw one point per category.
 */
import { errors } from '../errors.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { withUnit } from './residuals.js';
import { sampleIndices } from './sample-rows.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** Partial dependence (and optional individual curves) for one feature. */
export interface DependenceInput {
  /** Feature name (x-axis title). */
  readonly feature: string;
  /** Unit of the feature. __Default:__ none. */
  readonly unit?: string;
  /** Average prediction at each grid value. */
  readonly points: readonly { readonly value: number | string; readonly average: number }[];
  /** Prediction of single rows at each grid value. __Default:__ none. */
  readonly curves?: readonly { readonly row: number; readonly value: number | string; readonly prediction: number }[];
}

/** Options for `chartDependence`. */
export interface DependenceOptions extends ChartOptions {
  /** What is predicted (y-axis title, with units if any). __Default:__ 'prediction'. */
  readonly predictionName?: string;
  /** Most individual curves drawn (a seeded sample of rows). __Default:__ 60. */
  readonly curveLimit?: number;
  /** Seed of that sample. __Default:__ 1. */
  readonly seed?: number;
}

const CHART = 'chartDependence';

/**
 * Partial dependence on one feature, with individual curves behind it.
 *
 * @param input   Feature name, grid points and optional per-row curves.
 * @param options `predictionName` __Default:__ 'prediction'; `curveLimit` __Default:__ 60; `seed` __Default:__ 1;
 *                plus title, subtitle, width, height.
 * @example
 * chartDependence({ feature: 'storage_hours', unit: 'h', points: [{ value: 0, average: 0.1 }, { value: 48, average: 0.3 }] });
 */
export function chartDependence(input: DependenceInput, options: DependenceOptions = {}): ChartSpec {
  const numeric = input.points.every((p) => typeof p.value === 'number');
  const points = input.points.map((p, i) => ({
    value: numeric ? checkFinite(CHART, 'value', i, p.value) : checkLabel(CHART, 'value', i, p.value),
    average: checkFinite(CHART, 'average', i, p.average),
  }));
  const rowIds = [...new Set((input.curves ?? []).map((c) => c.row))];
  const keep = new Set(Array.from(sampleIndices(rowIds.length, options.curveLimit ?? 60, options.seed ?? 1), (j) => rowIds[j]));
  const curves = (input.curves ?? []).filter((c) => keep.has(c.row)).map((c, i) => {
    if (typeof c.value !== typeof points[0]?.value) throw errors.chartInput(CHART, 'curves.value', i, c.value, numeric ? 'a number like the grid' : 'a label like the grid');
    return { row: c.row, value: c.value, prediction: checkFinite(CHART, 'prediction', i, c.prediction) };
  });
    const rowsNote = `${keep.size}${keep.size < rowIds.length ? ` of ${rowIds.length}` : ''} single rows`;
  const note = curves.length === 0 ? 'Average prediction as the feature is set to each value'
    : numeric ? `Thick line: average over rows · thin lines: ${rowsNote}` : `Dot: average over rows · dashes: ${rowsNote}`;
  const [title, subtitle] = titles(options, `Partial dependence on ${input.feature}`, note);
  if (points.length === 0) return chartEmpty(title, 'No grid points to draw.', options);
  const size = plotSize(options);
  const x = numeric
    ? { field: 'value', type: 'quantitative', title: withUnit(input.feature, input.unit), scale: { zero: false, nice: false } }
    : { field: 'value', type: 'nominal', title: withUnit(input.feature, input.unit), sort: null, axis: { labelAngle: 0 } };
  const yTitle = options.predictionName ?? 'prediction';
  const layers: Record<string, unknown>[] = [];
  if (curves.length > 0) {
    layers.push(numeric
      ? { data: { values: curves }, mark: { type: 'line', strokeWidth: 1, color: ROLE.faint, opacity: 0.45 },
        encoding: { x, y: { field: 'prediction', type: 'quantitative', title: yTitle }, detail: { field: 'row', type: 'nominal' } } }
      : { data: { values: curves }, mark: { type: 'tick', color: ROLE.faint, opacity: 0.5, thickness: 1, size: 40 },
        encoding: { x, y: { field: 'prediction', type: 'quantitative', title: yTitle } } });
  }
  const y = { field: 'average', type: 'quantitative', title: yTitle, scale: { zero: false } };
  layers.push(numeric
    ? { data: { values: points }, mark: { type: 'line', color: ROLE.primary, strokeWidth: 3 }, encoding: { x, y, order: { field: 'value' } } }
    : { data: { values: points }, mark: { type: 'point', filled: true, size: 140, color: ROLE.primary, stroke: '#ffffff', strokeWidth: 1.5 }, encoding: { x, y } });
  return finishChart({ width: size.width, height: size.height, layer: layers }, title, subtitle);
}
