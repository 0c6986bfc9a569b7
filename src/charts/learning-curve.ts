/**
 * Learning curve of an iterative fit (boosting rounds): loss on the training rows and on the watched
 * (validation) rows per round, with the best round marked.
 */
import { errors } from '../errors.js';
import { checkFinite } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE, SERIES_COLOURS } from './theme.js';

/** One point of a learning curve. */
export interface LearningCurveRow {
  /** Round (iteration) number; 0 is the starting model before any round, when a fit records it. */
  readonly round: number;
  /** Which rows the loss was measured on. */
  readonly set: 'training' | 'watched';
  /** Loss after this round. */
  readonly loss: number;
}

/** Options for `chartLearningCurve`. */
export interface LearningCurveOptions extends ChartOptions {
  /** Name of the loss, used as the y-axis title (add units if it has any). __Default:__ `'loss'`. */
  readonly lossName?: string;
  /** Round kept by early stopping or chosen by hand; drawn as a vertical marker. __Default:__ none. */
  readonly bestRound?: number;
  /** Draw the loss on a log scale (needs every loss > 0). __Default:__ false. */
  readonly logScale?: boolean;
}

const CHART = 'chartLearningCurve';
const LEGEND = { labelExpr: "datum.label === 'training' ? 'training rows' : 'watched rows'", symbolType: 'stroke' };

/**
 * Loss per round on training and watched rows.
 *
 * @param rows    One row per round and set.
 * @param options `lossName` __Default:__ 'loss'; `bestRound` __Default:__ none; `logScale` __Default:__ false;
 *                plus title, subtitle, width, height.
 * @example
 * chartLearningCurve(
 *   [{ round: 1, set: 'training', loss: 0.61 }, { round: 1, set: 'watched', loss: 0.64 }],
 *   { lossName: 'log loss', bestRound: 1 },
 * );
 */
export function chartLearningCurve(rows: readonly LearningCurveRow[], options: LearningCurveOptions = {}): ChartSpec {
  const sets = new Set(rows.map((r) => r.set));
  const [title, subtitle] = titles(options, 'Learning curve', sets.size === 1 && sets.has('training')
    ? 'Loss per round on the training rows (no watched rows)'
    : sets.size === 1 && sets.has('watched') ? 'Loss per round on the watched rows' : 'Loss per round on the training and watched rows');
  if (rows.length === 0) return chartEmpty(title, 'No rounds were recorded.', options);
  const size = plotSize(options);
  const lossName = options.lossName ?? 'loss';
  const values = rows.map((r, i) => {
    if (r.set !== 'training' && r.set !== 'watched') throw errors.chartInput(CHART, 'set', i, r.set, "'training' or 'watched'");
    const loss = checkFinite(CHART, 'loss', i, r.loss);
    if (options.logScale && !(loss > 0)) throw errors.chartInput(CHART, 'loss', i, loss, 'a positive number (log scale)');
    return { round: checkFinite(CHART, 'round', i, r.round), set: r.set, loss };
  });
  let first = Infinity, last = -Infinity;
  for (const v of values) { first = Math.min(first, v.round); last = Math.max(last, v.round); }
  if (typeof options.bestRound === 'number' && Number.isFinite(options.bestRound)) {
    first = Math.min(first, options.bestRound); last = Math.max(last, options.bestRound);
  }
  // The x-axis stops at the first and last round (no rounding out to a "nice" number).
  const xScale = first < last ? { domain: [first, last], nice: false, zero: false } : { zero: false };
  const layers: Record<string, unknown>[] = [
    {
      mark: { type: 'line', interpolate: 'linear' },
      encoding: {
        x: { field: 'round', type: 'quantitative', title: 'Round', scale: xScale, axis: { format: 'd', tickMinStep: 1 } },
        y: {
          field: 'loss', type: 'quantitative', title: `${lossName[0]?.toUpperCase() ?? ''}${lossName.slice(1)}`,
          scale: options.logScale ? { type: 'log' } : { zero: false },
        },
        color: {
          field: 'set', type: 'nominal', title: null,
          scale: { domain: ['training', 'watched'], range: [SERIES_COLOURS[2], SERIES_COLOURS[0]] },
          legend: LEGEND,
        },
        strokeDash: {
          field: 'set', type: 'nominal', title: null,
          scale: { domain: ['training', 'watched'], range: [[5, 3], [1, 0]] },
          legend: LEGEND,
        },
      },
    },
  ];
  let sub: string | readonly string[] | undefined = subtitle;
  if (options.bestRound !== undefined) {
    const best = checkFinite(CHART, 'bestRound', 0, options.bestRound);
    const atBest = values.find((v) => v.set === 'watched' && v.round === best);
    const label = atBest ? `best round ${best} · ${lossName} ${formatNumber(atBest.loss)}` : `best round ${best}`;
    // In the right third of the plot the label goes to the left of the rule, so it is not cut at the edge.
    const onLeft = last > first && (best - first) / (last - first) > 2 / 3;
    const data = { values: [{ round: best, label }] };
    layers.push(
      { data, mark: { type: 'rule', color: ROLE.reference, strokeWidth: 1.5 }, encoding: { x: { field: 'round', type: 'quantitative' } } },
      {
        data,
        mark: { type: 'text', align: onLeft ? 'right' : 'left', dx: onLeft ? -5 : 5, baseline: 'top', y: 4, color: ROLE.reference },
        encoding: { x: { field: 'round', type: 'quantitative' }, text: { field: 'label' } },
      },
    );
    if (options.subtitle === undefined) sub = [`${subtitle}; the grey line marks the best round`];
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers }, title, sub);
}
