/**
 * Predictions for a table of any shape: the table is aligned to the model's feature schema first, so
 * missing columns, changed types and unseen categories are reported instead of crashing.
 */
import { alignFrame, type AlignReport } from '../table/align-frame.js';
import type { TableInput } from '../table/raw-table.js';
import type { ModelHeader, Predictions } from '../learn/model.js';
import { predictFrame } from '../learn/predict.js';

export interface TablePredictions extends Predictions {
  /** What had to be done to read the table with the model's schema (clean when nothing). */
  readonly report: AlignReport;
}

/**
 * Predict every row of `input` (an arquero table, row objects or a Frame) with `model`.
 * Columns are matched by name; a missing column counts as all missing, an unseen category as missing,
 * and `report` says which rows were affected. Extra columns are ignored.
 * @example
 * const p = predict(model, aq.table({ outlook: ['sunny'], humidity: ['high'], wind: ['weak'] }));
 * p.classes[p.value[0]]; // 'no'
 * p.report.clean;        // true
 */
export function predict(model: ModelHeader, input: TableInput): TablePredictions {
  const { frame, report } = alignFrame(input, model.features);
  return { ...predictFrame(model, frame), report };
}

/**
 * Predicted labels (classification) or values (regression) as a plain array, one per row.
 * @example
 * predictedLabels(predict(model, table)); // ['no', 'yes', ...]
 */
export function predictedLabels(p: Predictions): (string | number)[] {
  const out: (string | number)[] = new Array(p.n);
  for (let i = 0; i < p.n; i++) out[i] = p.task === 'classification' ? p.classes[p.value[i]] : p.value[i];
  return out;
}
