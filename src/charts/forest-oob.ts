/**
 * The out-of-bag curve of a forest (or bagged trees) straight from the model, as the error-by-ensemble-size
 * chart; several forests (e.g. different features per split) become one line each.
 */
import { errors } from '../errors.js';
import type { ForestModel } from '../learn/ensemble/models.js';
import type { EnsembleSizeOptions, EnsembleSizeRow } from './ensemble-size.js';
import { chartEnsembleSizeError } from './ensemble-size.js';
import type { ChartSpec } from './spec.js';

/** One forest, or several by series name. */
export type ForestCurves = ForestModel | Readonly<Record<string, ForestModel>>;

function isForest(input: ForestCurves): input is ForestModel {
  return Array.isArray((input as ForestModel).oobCurve);
}

/**
 * Rows of the error-by-ensemble-size chart from forests' out-of-bag curves. Points recorded before any row
 * was out-of-bag (error NaN) are left out.
 *
 * @param input A `ForestModel`, or `{ seriesName: ForestModel, ... }` for one line per forest.
 * @example
 * outOfBagRows({ '2 features': fitForest(train, { featuresPerSplit: 2 }), 'all 4': fitForest(train, { featuresPerSplit: 4 }) });
 */
export function outOfBagRows(input: ForestCurves): EnsembleSizeRow[] {
  const named: [string | undefined, ForestModel][] = isForest(input) ? [[undefined, input]] : Object.entries(input);
  const rows: EnsembleSizeRow[] = [];
  for (const [series, model] of named) {
    for (const p of model.oobCurve) {
      if (Number.isNaN(p.error)) continue;
      rows.push(series === undefined ? { size: p.size, error: p.error } : { size: p.size, error: p.error, series });
    }
  }
  return rows;
}

/**
 * Out-of-bag error by number of trees for one forest or several.
 *
 * @param input   A `ForestModel`, or `{ seriesName: ForestModel, ... }`.
 * @param options As `chartEnsembleSizeError`. `errorName` __Default:__ 'out-of-bag error rate' (classes) or
 *                'out-of-bag mean squared error' (numbers), from the first forest's task.
 * @example
 * chartOutOfBag(fitForest(train, { size: 300 }));
 */
export function chartOutOfBag(input: ForestCurves, options: EnsembleSizeOptions = {}): ChartSpec {
  const all = isForest(input) ? [input] : Object.values(input);
  const first = all[0];
  if (all.some((m) => m.task !== first.task)) throw errors.badOption('input', Object.keys(input), 'forests of one task (all classification or all regression)');
  const errorName = first?.task === 'regression' ? 'out-of-bag mean squared error' : 'out-of-bag error rate';
  return chartEnsembleSizeError(outOfBagRows(input), { errorName, ...options });
}
