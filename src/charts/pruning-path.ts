/**
 * Pruning chart: error against tree size along a pruning sequence, on held-out rows (and optionally on
 * the training rows), with the chosen size marked.
 */
import { errors } from '../errors.js';
import { checkFinite, checkOptionalFinite } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber } from './format-number.js';
import { markerLayers } from './reference-mark.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { SERIES_COLOURS } from './theme.js';

/** One tree in a pruning sequence. */
export interface PruningPathRow {
  /** Tree size: number of leaves. */
  readonly leaves: number;
  /** Error on held-out rows. */
  readonly heldOutError: number;
  /** Error on the training rows. __Default:__ not drawn. */
  readonly trainingError?: number;
}

/** Options for `chartPruningPath`. */
export interface PruningPathOptions extends ChartOptions {
  /** Tree size (leaves) that was chosen; drawn as a marker. __Default:__ none. */
  readonly chosen?: number;
  /** Name of the error measure (y-axis title). __Default:__ 'error rate'. */
  readonly errorName?: string;
}

const CHART = 'chartPruningPath';

/**
 * Held-out (and training) error against the number of leaves.
 *
 * @param rows    One row per tree in the pruning sequence.
 * @param options `chosen` __Default:__ none; `errorName` __Default:__ 'error rate'; plus title, subtitle, width, height.
 * @example
 * chartPruningPath([{ leaves: 1, heldOutError: 0.4 }, { leaves: 5, heldOutError: 0.2 }], { chosen: 5 });
 */
export function chartPruningPath(rows: readonly PruningPathRow[], options: PruningPathOptions = {}): ChartSpec {
  const [title, subtitle] = titles(options, 'Pruning: error by tree size', 'Each point is one tree of the pruning sequence');
  if (rows.length === 0) return chartEmpty(title, 'The pruning sequence is empty.', options);
  const size = plotSize(options);
  const values: { leaves: number; set: string; error: number }[] = [];
  rows.forEach((r, i) => {
    const leaves = checkFinite(CHART, 'leaves', i, r.leaves);
    values.push({ leaves, set: 'held-out rows', error: checkFinite(CHART, 'heldOutError', i, r.heldOutError) });
    const t = checkOptionalFinite(CHART, 'trainingError', i, r.trainingError);
    if (t !== undefined) values.push({ leaves, set: 'training rows', error: t });
  });
  const domain = ['held-out rows', 'training rows'];
  const enc = {
    x: { field: 'leaves', type: 'quantitative', title: 'Leaves (tree size)', axis: { format: 'd', tickMinStep: 1 } },
    y: { field: 'error', type: 'quantitative', title: options.errorName ?? 'error rate', scale: { zero: false } },
    color: { field: 'set', type: 'nominal', title: null, scale: { domain, range: [SERIES_COLOURS[0], SERIES_COLOURS[2]] }, legend: { symbolType: 'stroke' } },
    strokeDash: { field: 'set', type: 'nominal', title: null, scale: { domain, range: [[1, 0], [5, 3]] }, legend: { symbolType: 'stroke' } },
  };
  const layers: Record<string, unknown>[] = [
    { mark: { type: 'line', point: { size: 36 } }, encoding: { ...enc, order: { field: 'leaves' } } },
  ];
  if (options.chosen !== undefined) {
    const at = values.find((v) => v.leaves === options.chosen && v.set === 'held-out rows');
    if (!at) throw errors.badOption('chosen', options.chosen, 'a tree size (leaves) present in the rows');
    const maxLeaves = Math.max(...values.map((v) => v.leaves));
    const minLeaves = Math.min(...values.map((v) => v.leaves));
    const align = at.leaves > minLeaves + 0.7 * (maxLeaves - minLeaves) ? 'right' : 'left';
    layers.push(...markerLayers(at.leaves, `chosen: ${at.leaves} leaves · error ${formatNumber(at.error)}`, 'quantitative', align));
  }
  return finishChart({ width: size.width, height: size.height, data: { values }, layer: layers }, title, subtitle);
}
