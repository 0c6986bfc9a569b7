/**
 * Residual against one feature: for a numeric feature, points with a local average (loess); for a
 * categorical feature, the spread of residuals in each category (box: quartiles; whiskers: 1.5 IQR).
 */
import { checkLength } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import type { ResidualOptions } from './residual-options.js';
import { computeResiduals, withUnit, type ResidualInput } from './residuals.js';
import { sampleIndices } from './sample-rows.js';
import { finishChart, plotSize, titles, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** Residual input plus one feature's values. */
export interface ResidualFeatureInput extends ResidualInput {
  /** Feature values per row: numbers (NaN = missing) or category labels (null = missing). */
  readonly feature: ArrayLike<number> | readonly (string | null)[];
  /** Feature name (x-axis title). */
  readonly featureName: string;
  /** Unit of the feature, appended to the axis title. __Default:__ none. */
  readonly featureUnit?: string;
}

const CHART = 'chartResidualsByFeature';
const MISSING = '(missing)';

/**
 * Residual against the values of one feature.
 *
 * @param input   `y`, `fitted`, `feature` (parallel) and `featureName`.
 * @param options `targetName` __Default:__ 'target'; `unit` __Default:__ none; `sampleLimit` __Default:__ 4000;
 *                `seed` __Default:__ 1; plus title, subtitle, width, height.
 * @example
 * chartResidualsByFeature({ y: [3, 5, 4], fitted: [2.5, 5.5, 4.1], feature: ['a', 'b', 'a'], featureName: 'variety' });
 */
export function chartResidualsByFeature(input: ResidualFeatureInput, options: ResidualOptions = {}): ChartSpec {
  const residual = computeResiduals(CHART, input);
  checkLength(CHART, 'feature', residual.length, input.feature.length);
  const n = residual.length;
  const categorical = Array.from(input.feature as ArrayLike<unknown>).some((v) => typeof v === 'string');
  const [title0] = titles(options, `Residuals by ${input.featureName}`);
  if (n === 0) return chartEmpty(title0, 'No rows to show residuals for.', options);
  const size = plotSize(options);
  const xTitle = withUnit(input.featureName, input.featureUnit);
  const y = { field: 'residual', type: 'quantitative', title: withUnit('residual', options.unit) };
  const zero = { data: { values: [{ zero: 0 }] }, mark: { type: 'rule', color: ROLE.reference, strokeDash: [4, 3] }, encoding: { y: { field: 'zero', type: 'quantitative' } } };
  if (categorical) {
    const values = Array.from({ length: n }, (_, i) => {
      const v = (input.feature as readonly (string | null)[])[i];
      return { category: typeof v === 'string' ? v : MISSING, residual: residual[i] };
    });
    const counts = new Map<string, number>();
    for (const v of values) counts.set(v.category, (counts.get(v.category) ?? 0) + 1);
    const [title, subtitle] = titles(options, title0, `Residual = observed − fitted · box: middle half of rows, line: median · dots: beyond 1.5 box-heights · ${formatNumber(n)} rows`);
    const labels = Object.fromEntries([...counts].map(([c, k]) => [c, `${c} (${formatNumber(k)})`]));
    return finishChart({
      width: size.width, height: size.height,
      data: { values },
      layer: [
        zero,
        {
          mark: { type: 'boxplot', extent: 1.5, size: 26, color: ROLE.primary, opacity: 0.85,
            median: { color: '#ffffff', strokeWidth: 2 }, rule: { color: ROLE.primary }, ticks: false,
            outliers: { size: 10, opacity: 0.4, color: ROLE.faint } },
          encoding: {
            x: { field: 'category', type: 'nominal', title: xTitle, sort: [...counts.keys()].filter((c) => c !== MISSING).sort().concat(counts.has(MISSING) ? [MISSING] : []),
              axis: { labelAngle: 0, labelExpr: `${JSON.stringify(labels)}[datum.value] || datum.value` } },
            y,
          },
        },
      ],
    }, title, subtitle);
  }
  const feature = input.feature as ArrayLike<number>;
  const present: number[] = [];
  for (let i = 0; i < n; i++) if (Number.isFinite(feature[i])) present.push(i);
  const shown = sampleIndices(present.length, options.sampleLimit ?? 4000, options.seed ?? 1);
  const dropped = n - present.length;
  const notes = ['Residual = observed − fitted · amber line: local average (loess)'];
  if (shown.length < present.length) notes.push(`${formatNumber(shown.length)} of ${formatNumber(present.length)} rows drawn (seeded sample)`);
  if (dropped > 0) notes.push(`${formatNumber(dropped)} rows with ${input.featureName} missing not drawn`);
  const [title, subtitle] = titles(options, title0, notes.join(' · '));
  if (present.length === 0) return chartEmpty(title, `No row has a value for ${input.featureName}.`, options);
  const values = Array.from(shown, (j) => ({ value: feature[present[j]], residual: residual[present[j]] }));
  const x = { field: 'value', type: 'quantitative', title: xTitle, scale: { zero: false } };
  const layers: Record<string, unknown>[] = [
    { mark: { type: 'point', filled: true, size: 14, opacity: 0.45, color: ROLE.primary }, encoding: { x, y } },
    zero,
  ];
  if (values.length >= 10) {
    layers.push({ transform: [{ loess: 'residual', on: 'value', bandwidth: 0.4 }], mark: { type: 'line', color: ROLE.accent, strokeWidth: 2.5 }, encoding: { x, y } });
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers }, title, subtitle);
}
