/**
 * Bias–variance by bootstrap: squared bias, variance and total error of a learner across a range of
 * complexity (e.g. depth limit), each line labelled at its right end instead of a legend.
 */
import { errors } from '../errors.js';
import { checkFinite } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE, SERIES_COLOURS } from './theme.js';

/** One component at one complexity. */
export interface BiasVarianceChartRow {
  /** Complexity setting (numeric, e.g. depth limit or leaves). */
  readonly complexity: number;
  readonly component: 'bias²' | 'variance' | 'error';
  readonly value: number;
}

/** Options for `chartBiasVariance`. */
export interface BiasVarianceChartOptions extends ChartOptions {
  /** Name of the complexity setting (x-axis title). __Default:__ 'complexity'. */
  readonly complexityName?: string;
  /** What the components measure (y-axis title, with units if any). __Default:__ 'squared error'. */
  readonly errorName?: string;
  /** Irreducible noise level, drawn as a dotted line when given. __Default:__ none. */
  readonly noise?: number;
}

const CHART = 'chartBiasVariance';
const COMPONENTS = ['error', 'bias²', 'variance'] as const;
const LABEL = { error: 'expected error', 'bias²': 'bias²', variance: 'variance' } as const;

/**
 * Squared bias, variance and error against complexity.
 *
 * @param rows    One row per complexity and component.
 * @param options `complexityName` __Default:__ 'complexity'; `errorName` __Default:__ 'squared error'; `noise` __Default:__ none; plus title, subtitle, width, height.
 * @example
 * chartBiasVariance([
 *   { complexity: 1, component: 'bias²', value: 0.30 }, { complexity: 1, component: 'variance', value: 0.02 },
 *   { complexity: 1, component: 'error', value: 0.35 },
 * ], { complexityName: 'depth limit' });
 */
export function chartBiasVariance(rows: readonly BiasVarianceChartRow[], options: BiasVarianceChartOptions = {}): ChartSpec {
  const [title, subtitle] = titles(options, 'Bias and variance by complexity', 'Estimated over bootstrap resamples of the training rows');
  if (rows.length === 0) return chartEmpty(title, 'No bias–variance estimates to draw.', options);
  const size = plotSize(options, 500);
  const values = rows.map((r, i) => {
    if (!COMPONENTS.includes(r.component)) throw errors.chartInput(CHART, 'component', i, r.component, "'bias²', 'variance' or 'error'");
    return { complexity: checkFinite(CHART, 'complexity', i, r.complexity), component: LABEL[r.component], value: checkFinite(CHART, 'value', i, r.value) };
  });
  const maxX = Math.max(...values.map((v) => v.complexity));
  const ends = values.filter((v) => v.complexity === maxX);
  const domain = COMPONENTS.map((c) => LABEL[c]);
  const color = { field: 'component', type: 'nominal', legend: null, scale: { domain, range: [ROLE.ink, SERIES_COLOURS[0], SERIES_COLOURS[1]] } };
  const integers = values.every((v) => Number.isInteger(v.complexity));
  const x = { field: 'complexity', type: 'quantitative', title: options.complexityName ?? 'complexity', scale: { zero: false, nice: false },
    ...(integers ? { axis: { format: 'd', tickMinStep: 1 } } : {}) };
  const y = { field: 'value', type: 'quantitative', title: options.errorName ?? 'squared error' };
  const layers: Record<string, unknown>[] = [
    { mark: { type: 'line', point: { size: 30 } }, encoding: { x, y, color, order: { field: 'complexity' },
      strokeWidth: { condition: { test: `datum.component === '${LABEL.error}'`, value: 3.2 }, value: 2 } } },
    { data: { values: ends }, mark: { type: 'text', align: 'left', dx: 8, fontWeight: 'bold' }, encoding: { x, y, color, text: { field: 'component' } } },
  ];
  if (options.noise !== undefined) {
    const noise = checkFinite(CHART, 'noise', 0, options.noise);
    layers.push(
      { data: { values: [{ value: noise }] }, mark: { type: 'rule', strokeDash: [1, 3], color: ROLE.reference }, encoding: { y } },
      { data: { values: [{ value: noise, complexity: maxX, label: 'noise' }] }, mark: { type: 'text', align: 'left', dx: 8, color: ROLE.reference }, encoding: { x, y, text: { field: 'label' } } },
    );
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers, padding: { left: 12, top: 12, bottom: 12, right: 90 } }, title, subtitle);
}
