/**
 * Metric deltas between two runs: one row per metric on its own scale, an arrow from the previous value
 * (hollow) to the new one (filled), coloured by whether the change is for the better.
 */
import { checkFinite, checkLabel } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber, formatSigned } from './format-number.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** A metric in the previous and the new run. */
export interface MetricDeltaRow {
  readonly metric: string;
  readonly before: number;
  readonly after: number;
  /** Whether larger values are better (accuracy) or worse (error, loss). __Default:__ true. */
  readonly higherIsBetter?: boolean;
}

/** Options for `chartMetricDeltas`. */
export interface MetricDeltaOptions extends ChartOptions {
  /** Names of the two runs, for the subtitle. __Default:__ ['previous run', 'this run']. */
  readonly runs?: readonly [string, string];
}

const CHART = 'chartMetricDeltas';

/** Outcome of a change given the metric's direction (exact equality counts as unchanged). */
export function changeOutcome(before: number, after: number, higherIsBetter: boolean): 'better' | 'worse' | 'unchanged' {
  if (after === before) return 'unchanged';
  return (after > before) === higherIsBetter ? 'better' : 'worse';
}

/**
 * Each metric's move from one run to the next.
 *
 * @param rows    One row per metric.
 * @param options `runs` __Default:__ ['previous run', 'this run']; plus title, subtitle, width, height (__Default:__ 34 px per metric).
 * @example
 * chartMetricDeltas([{ metric: 'accuracy', before: 0.81, after: 0.79 }, { metric: 'log loss', before: 0.42, after: 0.45, higherIsBetter: false }]);
 */
export function chartMetricDeltas(rows: readonly MetricDeltaRow[], options: MetricDeltaOptions = {}): ChartSpec {
  const [a, b] = options.runs ?? ['previous run', 'this run'];
  const [title, subtitle] = titles(options, 'Metrics: what changed', `Hollow: ${a} · filled: ${b} · each metric on its own scale`);
  if (rows.length === 0) return chartEmpty(title, 'No metrics to compare.', options);
  const size = plotSize(options, 380, 18);
  const values = rows.map((r, i) => {
    const before = checkFinite(CHART, 'before', i, r.before), after = checkFinite(CHART, 'after', i, r.after);
    const outcome = changeOutcome(before, after, r.higherIsBetter ?? true);
    const rel = before !== 0 ? ` (${formatSigned(((after - before) / Math.abs(before)) * 100)}%)` : '';
    return { metric: checkLabel(CHART, 'metric', i, r.metric), before, after, outcome,
      label: `${formatNumber(before)} → ${formatNumber(after)} · ${formatSigned(after - before)}${rel}` };
  });
  const colour = { field: 'outcome', type: 'nominal', title: null, scale: { domain: ['better', 'worse', 'unchanged'], range: [ROLE.better, ROLE.worse, ROLE.reference] } };
  const x = { type: 'quantitative', title: null, scale: { zero: false, padding: 14 }, axis: { tickCount: 3, grid: false, labelFontSize: 9 } };
  return finishChart({
    data: { values },
    facet: { row: { field: 'metric', type: 'nominal', title: null, sort: values.map((v) => v.metric), header: { labelAngle: 0, labelAlign: 'left', labelOrient: 'left', labelLimit: 160, labelFontWeight: 'bold' } } },
    spec: {
      width: size.width, height: size.height,
      layer: [
        { mark: { type: 'rule', strokeWidth: 2.5 }, encoding: { x: { ...x, field: 'before' }, x2: { field: 'after' }, color: colour } },
        { mark: { type: 'point', filled: false, size: 70, strokeWidth: 2 }, encoding: { x: { ...x, field: 'before' }, color: colour } },
        { mark: { type: 'point', filled: true, size: 70 }, encoding: { x: { ...x, field: 'after' }, color: colour } },
        { mark: { type: 'text', align: 'left', x: size.width + 12, fontSize: 11 },
          encoding: { text: { field: 'label' }, color: { condition: [{ test: "datum.outcome === 'worse'", value: ROLE.accentText }, { test: "datum.outcome === 'better'", value: ROLE.better }], value: ROLE.muted } } },
      ],
    },
    resolve: { scale: { x: 'independent' } },
    spacing: 10,
  }, title, subtitle);
}
