/**
 * Residual against fitted value: points, the zero line, and a local average (loess) of the residuals
 * so a trend — a model that is biased for high or low predictions — stands out.
 */
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import type { ResidualOptions } from './residual-options.js';
import { computeResiduals, withUnit, type ResidualInput } from './residuals.js';
import { sampleIndices } from './sample-rows.js';
import { finishChart, plotSize, titles, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

const CHART = 'chartResidualsByFitted';

/**
 * Residual (observed − fitted) against fitted value.
 *
 * @param input   `y` and `fitted`, parallel arrays.
 * @param options `targetName` __Default:__ 'target'; `unit` __Default:__ none; `sampleLimit` __Default:__ 4000;
 *                `seed` __Default:__ 1; plus title, subtitle, width, height.
 * @example
 * chartResidualsByFitted({ y: [3, 5, 4], fitted: [2.5, 5.5, 4.1] }, { targetName: 'shelf life', unit: 'days' });
 */
export function chartResidualsByFitted(input: ResidualInput, options: ResidualOptions = {}): ChartSpec {
  const residual = computeResiduals(CHART, input);
  const n = residual.length;
  const shown = sampleIndices(n, options.sampleLimit ?? 4000, options.seed ?? 1);
  const [title, subtitle] = titles(options, 'Residuals against fitted values', [
    `Residual = observed − fitted · amber line: local average (loess)${shown.length < n ? ` · ${formatNumber(shown.length)} of ${formatNumber(n)} rows drawn (seeded sample)` : ` · ${formatNumber(n)} rows`}`,
  ]);
  if (n === 0) return chartEmpty(title, 'No rows to show residuals for.', options);
  const size = plotSize(options);
  const target = options.targetName ?? 'target';
  const values = Array.from(shown, (i) => ({ fitted: input.fitted[i], residual: residual[i] }));
  const x = { field: 'fitted', type: 'quantitative', title: withUnit(`fitted ${target}`, options.unit), scale: { zero: false } };
  const y = { field: 'residual', type: 'quantitative', title: withUnit('residual', options.unit) };
  const layers: Record<string, unknown>[] = [
    { mark: { type: 'point', filled: true, size: 14, opacity: 0.45, color: ROLE.primary }, encoding: { x, y } },
    { data: { values: [{ zero: 0 }] }, mark: { type: 'rule', color: ROLE.reference, strokeDash: [4, 3] }, encoding: { y: { field: 'zero', type: 'quantitative' } } },
  ];
  if (values.length >= 10) {
    layers.push({
      transform: [{ loess: 'residual', on: 'fitted', bandwidth: 0.4 }],
      mark: { type: 'line', color: ROLE.accent, strokeWidth: 2.5 },
      encoding: { x, y },
    });
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers }, title, subtitle);
}
