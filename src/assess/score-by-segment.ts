import { errors } from '../errors.js';
import type { Predictions } from '../learn/model.js';
import type { Dataset } from '../table/frame.js';
import { defaultMetrics, findMetric, scoreWhereDefined } from './metrics/registry.js';
import { quantileGroups } from './quantile-groups.js';
import { takePredictions, takeTarget } from './take-rows.js';

/** One segment's scores: `segment` label, row count, total weight, then one column per metric. */
export type SegmentRow = { readonly column: string; readonly segment: string; readonly rows: number; readonly weight: number }
  & Readonly<Record<string, string | number>>;

export interface SegmentOptions {
  /** Metric names. __Default:__ `defaultMetrics(task)`. */
  readonly metrics?: readonly string[];
  /** Number of quantile groups for a numeric column. __Default:__ 4. */
  readonly groups?: number;
}

/**
 * Metrics broken down by a column: one row for all rows (segment "(all)"), then one per category (in
 * dictionary order) or per quantile group of a numeric column (see `quantileGroups`), and "(missing)"
 * for missing values — so it is plain where a model does worse. A metric that cannot be computed in a
 * segment (e.g. ROC AUC where only one class occurs, or zero total weight) is NaN there.
 * Uses the dataset's weights when it has them.
 *
 * @param data - the scored rows (features, target, weights).
 * @param predictions - predictions for those rows, in the same order.
 * @param column - a feature column name of `data`.
 * @example
 * scoreBySegment(test, predictFrame(model, test.features), 'region', { metrics: ['logLoss', 'rocAuc'] });
 * // [{ column: 'region', segment: '(all)', rows: 500, weight: 500, logLoss: 0.41, rocAuc: 0.86 }, ...]
 */
export function scoreBySegment(data: Dataset, predictions: Predictions, column: string, options: SegmentOptions = {}): SegmentRow[] {
  const n = data.features.nRows;
  if (n === 0) throw errors.emptyData('score by segment');
  if (predictions.n !== n) throw errors.lengthMismatch('predictions', n, predictions.n);
  const col = data.features.columns.find((c) => c.name === column);
  if (!col) throw errors.unknownColumn(column, 'the scored data');
  const metrics = (options.metrics ?? defaultMetrics(predictions.task)).map(findMetric);
  let segment: Int32Array, labels: string[];
  if (col.kind === 'categorical') {
    segment = col.codes; labels = [...col.categories];
  } else if (col.kind === 'boolean') {
    segment = Int32Array.from(col.values, (v) => (v !== v ? -1 : v ? 1 : 0)); labels = ['false', 'true'];
  } else {
    const q = quantileGroups(col.values, options.groups ?? 4);
    segment = q.group; labels = [...q.labels];
  }
  const members: number[][] = labels.map(() => []);
  const missing: number[] = [];
  for (let i = 0; i < n; i++) (segment[i] < 0 ? missing : members[segment[i]]).push(i);
  const all = Array.from({ length: n }, (_, i) => i);
  const parts: [string, number[]][] = [['(all)', all], ...labels.map((l, j): [string, number[]] => [l, members[j]])];
  if (missing.length) parts.push(['(missing)', missing]);
  const out: SegmentRow[] = [];
  for (const [label, rows] of parts) {
    if (rows.length === 0) continue;
    const target = takeTarget(data.target, rows);
    const preds = takePredictions(predictions, rows);
    const weights = data.weights ? Float64Array.from(rows, (r) => (data.weights as Float64Array)[r]) : null;
    const weight = weights ? weights.reduce((a, b) => a + b, 0) : rows.length;
    const row: Record<string, string | number> = { column, segment: label, rows: rows.length, weight };
    for (const m of metrics) row[m.name] = weight > 0 ? scoreWhereDefined(m, target, preds, weights) : NaN;
    out.push(row as SegmentRow);
  }
  return out;
}
