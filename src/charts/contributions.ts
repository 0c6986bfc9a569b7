/**
 * Per-prediction contributions as a "walk": starting at the expected value, each feature moves the
 * prediction by its contribution — a short arrow from the running total to the next — ending at the
 * model's output. Features are taken largest effect first; the rest are pooled into one step.
 */
import { errors } from '../errors.js';
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber, formatSigned } from './format-number.js';
import { withUnit } from './residuals.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** Contributions of each feature to one prediction. */
export interface ContributionInput {
  /** Expected value: the average output over the reference rows, where the walk starts. */
  readonly expected: number;
  /** One entry per feature. `value` is the row's value of that feature (shown in the label). */
  readonly contributions: readonly { readonly feature: string; readonly value?: number | string | null; readonly contribution: number }[];
  /** The model's output for the row; must equal expected + Σ contributions. __Default:__ that sum. */
  readonly output?: number;
}

/** Options for `chartContributions`. */
export interface ContributionOptions extends ChartOptions {
  /** Most features shown individually (the rest are pooled). __Default:__ 10. */
  readonly limit?: number;
  /** What the output is (x-axis title). __Default:__ 'prediction'. */
  readonly outputName?: string;
  /** Unit of the output. __Default:__ none. */
  readonly unit?: string;
}

/** One step of the walk. */
export interface ContributionStep { step: string; start: number; end: number; kind: 'start' | 'up' | 'down' | 'end'; label: string; next: string | null }

const CHART = 'chartContributions';

/** The steps of the walk: start, the `limit` largest contributions, the pooled rest, the output. */
export function contributionSteps(input: ContributionInput, limit: number): ContributionStep[] {
  const expected = checkFinite(CHART, 'expected', 0, input.expected);
  const items = input.contributions.map((c, i) => ({
    feature: checkLabel(CHART, 'feature', i, c.feature),
    value: c.value,
    contribution: checkFinite(CHART, 'contribution', i, c.contribution),
  }));
  const total = expected + items.reduce((s, c) => s + c.contribution, 0);
  if (input.output !== undefined) {
    const out = checkFinite(CHART, 'output', 0, input.output);
    if (Math.abs(out - total) > 1e-6 * Math.max(1, Math.abs(out))) {
      throw errors.chartInput(CHART, 'output', 0, out, `expected + sum of contributions = ${total}`);
    }
  }
  items.sort((a, b) => Math.abs(b.contribution) - Math.abs(a.contribution) || a.feature.localeCompare(b.feature));
  const shown = items.slice(0, limit);
  const rest = items.slice(limit);
  const steps: ContributionStep[] = [{ step: 'expected value', start: expected, end: expected, kind: 'start', label: formatNumber(expected), next: null }];
  let at = expected;
  const push = (step: string, c: number): void => {
    steps.push({ step, start: at, end: at + c, kind: c >= 0 ? 'up' : 'down', label: formatSigned(c), next: null });
    at += c;
  };
  for (const c of shown) {
    const v = c.value === undefined || c.value === null || (typeof c.value === 'number' && Number.isNaN(c.value)) ? 'missing'
      : typeof c.value === 'number' ? formatNumber(c.value) : c.value;
    push(`${c.feature} = ${v}`, c.contribution);
  }
  if (rest.length > 0) push(`${rest.length} other feature${rest.length > 1 ? 's' : ''}`, rest.reduce((s, c) => s + c.contribution, 0));
  steps.push({ step: 'prediction', start: at, end: at, kind: 'end', label: formatNumber(at), next: null });
  for (let i = 0; i + 1 < steps.length; i++) steps[i].next = steps[i + 1].step;
  return steps;
}

/**
 * How one prediction is built from the expected value by each feature's contribution.
 *
 * @param input   Expected value, contributions and (optionally) the output to check against.
 * @param options `limit` __Default:__ 10; `outputName` __Default:__ 'prediction'; `unit` __Default:__ none;
 *                plus title, subtitle, width, height (__Default:__ 28 px per step).
 * @example
 * chartContributions({ expected: 0.2, contributions: [
 *   { feature: 'storage_hours', value: 52, contribution: 0.31 }, { feature: 'variety', value: 'Elstar', contribution: -0.05 }] });
 */
export function chartContributions(input: ContributionInput, options: ContributionOptions = {}): ChartSpec {
  const limit = options.limit ?? 10;
  if (!(Number.isInteger(limit) && limit >= 1)) throw errors.badOption('limit', limit, 'an integer >= 1');
  const outputName = options.outputName ?? 'prediction';
  const [title, subtitle] = titles(options, `Why this ${outputName}`,
    ['Starting from the expected value, each feature moves the prediction by its contribution', 'Largest first · amber: raises it · indigo: lowers it']);
  if (input.contributions.length === 0) return chartEmpty(title, 'No feature contributions to show.', options);
  const steps = contributionSteps(input, limit);
  const size = plotSize(options, 440, steps.length * 28);
  const order = steps.map((s) => s.step);
  const y = { field: 'step', type: 'ordinal', title: null, sort: order, scale: { type: 'point', padding: 0.6 }, axis: { labelLimit: 230, grid: false, domain: false } };
  const x = { type: 'quantitative', title: withUnit(outputName, options.unit), scale: { zero: false, padding: 24 } };
  const colour = { field: 'kind', type: 'nominal', legend: null, scale: { domain: ['up', 'down', 'start', 'end'], range: [ROLE.up, ROLE.down, ROLE.reference, ROLE.ink] } };
  const moves = { filter: "datum.kind === 'up' || datum.kind === 'down'" };
  return finishChart({
    width: size.width, height: size.height,
    data: { values: steps },
    layer: [
      { data: { values: [{ x: steps[0].start }] }, mark: { type: 'rule', color: ROLE.faint, strokeDash: [2, 2] }, encoding: { x: { ...x, field: 'x' } } },
      { transform: [{ filter: 'datum.next !== null' }], mark: { type: 'rule', color: ROLE.faint, strokeWidth: 1 },
        encoding: { y, x: { ...x, field: 'end' }, y2: { field: 'next' } } },
      { transform: [moves], mark: { type: 'rule', strokeWidth: 4, strokeCap: 'butt' }, encoding: { y, x: { ...x, field: 'start' }, x2: { field: 'end' }, color: colour } },
      { transform: [moves, { filter: "datum.kind === 'up'" }], mark: { type: 'point', shape: 'triangle-right', filled: true, size: 90, opacity: 1 }, encoding: { y, x: { ...x, field: 'end' }, color: colour } },
      { transform: [moves, { filter: "datum.kind === 'down'" }], mark: { type: 'point', shape: 'triangle-left', filled: true, size: 90, opacity: 1 }, encoding: { y, x: { ...x, field: 'end' }, color: colour } },
      { transform: [{ filter: "datum.kind === 'start'" }], mark: { type: 'point', shape: 'circle', size: 110, strokeWidth: 2.5, opacity: 1, filled: false, color: ROLE.reference },
        encoding: { y, x: { ...x, field: 'end' } } },
      { transform: [{ filter: "datum.kind === 'end'" }], mark: { type: 'point', shape: 'circle', size: 120, opacity: 1, filled: true, color: ROLE.ink },
        encoding: { y, x: { ...x, field: 'end' } } },
      { transform: [{ calculate: 'max(datum.start, datum.end)', as: 'right' }], mark: { type: 'text', align: 'left', dx: 10, fontSize: 11 },
        encoding: { y, x: { ...x, field: 'right' }, text: { field: 'label' },
          color: { condition: [{ test: "datum.kind === 'up'", value: ROLE.accentText }, { test: "datum.kind === 'down'", value: ROLE.down }], value: ROLE.ink } } },
    ],
  }, title, subtitle);
}
