/**
 * Contributions over many rows: one small panel per feature (largest mean absolute contribution
 * first), the contribution of each row against its feature value, with the average contribution
 * across the feature's range drawn on top. Panels share the contribution axis so sizes compare.
 */
import { errors } from '../errors.js';
import { checkFinite, checkLength } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { sampleIndices } from './sample-rows.js';
import { finishChart, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** Contributions of every feature for many rows. */
export interface ContributionSummaryInput {
  /** Feature names, p of them. */
  readonly features: readonly string[];
  /** n × p contributions, row-major (row i, feature j at i·p + j). */
  readonly contributions: ArrayLike<number>;
  /** Per feature, the n feature values: numbers (NaN = missing) or labels (null = missing). */
  readonly values: readonly (ArrayLike<number> | readonly (string | null)[])[];
}

/** Options for `chartContributionSummary`. */
export interface ContributionSummaryOptions extends ChartOptions {
  /** Most feature panels (largest mean |contribution| first). __Default:__ 9. */
  readonly limit?: number;
  /** Panels per row. __Default:__ 3. */
  readonly columns?: number;
  /** Most rows drawn as points (seeded sample; averages use every row). __Default:__ 1500. */
  readonly sampleLimit?: number;
  /** Seed of the sample. __Default:__ 1. */
  readonly seed?: number;
}

const CHART = 'chartContributionSummary';

/** Mean contribution in up to `groups` equal-count groups of rows ordered by feature value. */
export function averageByValue(x: readonly number[], c: readonly number[], groups: number): { value: number; mean: number }[] {
  const order = x.map((_, i) => i).sort((a, b) => x[a] - x[b]);
  const out: { value: number; mean: number }[] = [];
  const g = Math.min(groups, order.length);
  for (let k = 0; k < g; k++) {
    const from = Math.floor((k * order.length) / g), to = Math.floor(((k + 1) * order.length) / g);
    let sx = 0, sc = 0;
    for (let j = from; j < to; j++) { sx += x[order[j]]; sc += c[order[j]]; }
    out.push({ value: sx / (to - from), mean: sc / (to - from) });
  }
  return out;
}

/**
 * One panel per feature: contribution against feature value.
 *
 * @param input   Feature names, n × p contributions and the feature values.
 * @param options `limit` __Default:__ 9; `columns` __Default:__ 3; `sampleLimit` __Default:__ 1500; `seed` __Default:__ 1;
 *                plus title, subtitle, width and height (of each panel; __Default:__ 170 × 120).
 * @example
 * chartContributionSummary({ features: ['a', 'b'], contributions: [0.1, -0.2, 0.3, 0.05], values: [[1, 2], ['x', 'y']] });
 */
export function chartContributionSummary(input: ContributionSummaryInput, options: ContributionSummaryOptions = {}): ChartSpec {
  const p = input.features.length;
  checkLength(CHART, 'values (feature columns)', p, input.values.length);
  const n = p === 0 ? 0 : input.contributions.length / p;
  if (!Number.isInteger(n)) throw errors.chartLengths(CHART, 'contributions', p * Math.ceil(n), input.contributions.length);
  input.values.forEach((v, j) => checkLength(CHART, `values of ${input.features[j]}`, n, v.length));
  for (let i = 0; i < input.contributions.length; i++) checkFinite(CHART, 'contribution', i, input.contributions[i]);
  const limit = options.limit ?? 9;
  if (!(Number.isInteger(limit) && limit >= 1)) throw errors.badOption('limit', limit, 'an integer >= 1');
  const strength = input.features.map((name, j) => {
    let s = 0;
    for (let i = 0; i < n; i++) s += Math.abs(input.contributions[i * p + j]);
    return { name, j, meanAbs: n > 0 ? s / n : 0 };
  }).sort((a, b) => b.meanAbs - a.meanAbs || a.name.localeCompare(b.name)).slice(0, limit);
  const shown = sampleIndices(n, options.sampleLimit ?? 1500, options.seed ?? 1);
  const notes = [`Each dot is a row · amber: average contribution along the feature's values`];
  if (shown.length < n) notes.push(`${formatNumber(shown.length)} of ${formatNumber(n)} rows drawn`);
  if (p > limit) notes.push(`top ${limit} of ${p} features`);
  const [title, subtitle] = titles(options, 'Contributions by feature value', notes.join(' · '));
  if (n === 0) return chartEmpty(title, 'No rows with contributions to show.', options);
  const width = options.width ?? 170, height = options.height ?? 120;
  const yEnc = { field: 'c', type: 'quantitative', title: 'contribution' };
  const zero = { data: { values: [{ zero: 0 }] }, mark: { type: 'rule', color: ROLE.reference, strokeDash: [3, 3] }, encoding: { y: { field: 'zero', type: 'quantitative' } } };
  const columns = options.columns ?? 3;
  if (!(Number.isInteger(columns) && columns >= 1)) throw errors.badOption('columns', columns, 'an integer >= 1');
  const panels = strength.map(({ name, j, meanAbs }, k) => {
    const y = k % columns === 0 ? yEnc : { ...yEnc, title: null };
    const col = input.values[j];
    const categorical = Array.from(col as ArrayLike<unknown>).some((v) => typeof v === 'string');
    const panelTitle = { text: name, subtitle: `mean |contribution| ${formatNumber(meanAbs)}`, fontSize: 12, subtitleFontSize: 10, anchor: 'start' };
    if (categorical) {
      const label = (i: number): string => (col as readonly (string | null)[])[i] ?? '(missing)';
      const dots = Array.from(shown, (i) => ({ x: label(i), c: input.contributions[i * p + j] }));
      const sums = new Map<string, [number, number]>();
      for (let i = 0; i < n; i++) { const s = sums.get(label(i)) ?? [0, 0]; s[0] += input.contributions[i * p + j]; s[1]++; sums.set(label(i), s); }
      const means = [...sums].map(([x, [s, k]]) => ({ x, c: s / k }));
      const many = sums.size > 3;
      const x = { field: 'x', type: 'nominal', title: null, sort: [...sums.keys()].sort(), axis: many ? { labelAngle: -45, labelAlign: 'right', labelLimit: 70, labelOverlap: false } : { labelAngle: 0, labelLimit: 70 } };
      return { title: panelTitle, width, height, layer: [
        zero,
        { data: { values: dots }, mark: { type: 'tick', color: ROLE.primary, opacity: 0.25, thickness: 1 }, encoding: { x, y } },
        { data: { values: means }, mark: { type: 'tick', color: ROLE.accent, thickness: 3, size: 22 }, encoding: { x, y } },
      ] };
    }
    const nums = col as ArrayLike<number>;
    const xs: number[] = [], cs: number[] = [];
    for (let i = 0; i < n; i++) if (Number.isFinite(nums[i])) { xs.push(nums[i]); cs.push(input.contributions[i * p + j]); }
    const dots = Array.from(shown, (i) => ({ x: nums[i], c: input.contributions[i * p + j] })).filter((d) => Number.isFinite(d.x));
    const x = { field: 'x', type: 'quantitative', title: null, scale: { zero: false, nice: false }, axis: { tickCount: 4 } };
    return { title: panelTitle, width, height, layer: [
      zero,
      { data: { values: dots }, mark: { type: 'point', filled: true, size: 9, color: ROLE.primary, opacity: 0.3 }, encoding: { x, y } },
      { data: { values: averageByValue(xs, cs, 12).map((a) => ({ x: a.value, c: a.mean })) }, mark: { type: 'line', color: ROLE.accent, strokeWidth: 2.5 }, encoding: { x, y } },
    ] };
  });
  return finishChart({ columns, concat: panels, resolve: { scale: { y: 'shared' } } }, title, subtitle);
}
