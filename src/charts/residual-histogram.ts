/**
 * Distribution of residuals: a histogram (bins computed here, see `histogram-bins.ts`) with the zero
 * line and the mean marked; mean and standard deviation in the subtitle.
 */
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { binValues } from './histogram-bins.js';
import type { ResidualOptions } from './residual-options.js';
import { computeResiduals, meanAndSd, withUnit, type ResidualInput } from './residuals.js';
import { finishChart, plotSize, titles, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

const CHART = 'chartResidualHistogram';

/**
 * Histogram of residuals (observed − fitted).
 *
 * @param input   `y` and `fitted`, parallel arrays.
 * @param options `targetName` __Default:__ 'target'; `unit` __Default:__ none; plus title, subtitle, width,
 *                height. (`sampleLimit` and `seed` do not apply: every row is counted.)
 * @example
 * chartResidualHistogram({ y: [3, 5, 4, 6], fitted: [2.5, 5.5, 4.1, 5.2] }, { unit: 'days' });
 */
export function chartResidualHistogram(input: ResidualInput, options: ResidualOptions = {}): ChartSpec {
  const residual = computeResiduals(CHART, input);
  const n = residual.length;
  const { mean, sd } = meanAndSd(residual);
  const [title, subtitle] = titles(options, 'Distribution of residuals',
    n === 0 ? undefined : `Residual = observed − fitted · ${formatNumber(n)} rows · mean ${formatNumber(mean)} · sd ${formatNumber(sd)}`);
  if (n === 0) return chartEmpty(title, 'No rows to show residuals for.', options);
  const size = plotSize(options);
  const bins = binValues(residual);
  const unitTitle = withUnit('residual', options.unit);
  return finishChart({
    width: size.width, height: size.height,
    layer: [
      {
        data: { values: bins },
        mark: { type: 'rect', color: ROLE.primary, opacity: 0.5, stroke: '#ffffff', strokeWidth: 0.8 },
        encoding: {
          x: { field: 'start', type: 'quantitative', title: unitTitle, bin: { binned: true } },
          x2: { field: 'end' },
          y: { field: 'count', type: 'quantitative', title: 'rows' },
          tooltip: [{ field: 'start', format: '.4~g' }, { field: 'end', format: '.4~g' }, { field: 'count' }],
        },
      },
      {
        data: { values: [{ x: 0, label: 'zero residual' }, { x: mean, label: `mean ${formatNumber(mean)}` }] },
        mark: { type: 'rule', strokeDash: [5, 3], strokeWidth: 2 },
        encoding: {
          x: { field: 'x', type: 'quantitative' },
          color: { field: 'label', type: 'nominal', title: null, scale: { domain: ['zero residual', `mean ${formatNumber(mean)}`], range: [ROLE.ink, ROLE.accent] }, legend: { symbolType: 'stroke' } },
        },
      },
    ],
  }, title, subtitle);
}
