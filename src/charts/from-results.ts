/**
 * Charts straight from assessment results: a settings search as a validation curve, and a bias–variance
 * table as the bias–variance chart. Thin mappings from `src/assess` result shapes to chart inputs.
 */
import type { BiasVarianceRow } from '../assess/bias-variance.js';
import type { SearchResult } from '../assess/search-settings.js';
import { errors } from '../errors.js';
import { chartBiasVariance, type BiasVarianceChartOptions, type BiasVarianceChartRow } from './bias-variance.js';
import type { ChartSpec } from './spec.js';
import { chartValidationCurve, type ValidationCurveOptions } from './validation-curve.js';

/**
 * The validation curve of a settings search: the score of each fold by the value of `setting`, the
 * mean across folds, and the chosen value marked.
 * @param setting the searched setting to put on the x-axis (one of the search space's names).
 * @param options.pick which choice to mark: 'best' mean or 'withinOneSe' (falls back to best). __Default:__ 'best'.
 * @example
 * const found = searchGrid(data, (train, s) => fitTree(train, s), { depthLimit: [1, 2, 4, 8] });
 * const spec = chartSearch(found, 'depthLimit');
 */
export function chartSearch(
  result: SearchResult,
  setting: string,
  options: ValidationCurveOptions & { readonly pick?: 'best' | 'withinOneSe' } = {},
): ChartSpec {
  if (result.table.length > 0 && !(setting in result.table[0])) {
    throw errors.badOption('setting', setting, `one of the searched settings (${Object.keys(result.best.values).join(', ')})`);
  }
  const rows = result.table.map((r) => ({ value: r[setting] as number | string, fold: r.fold, score: r.score }));
  const choice = options.pick === 'withinOneSe' ? result.withinOneSe ?? result.best : result.best;
  const chosen = choice.values[setting];
  return chartValidationCurve(rows, {
    setting,
    scoreName: result.metric,
    ...(typeof chosen === 'number' || typeof chosen === 'string' ? { chosen } : {}),
    ...options,
  });
}

/**
 * The bias–variance chart of a `biasVariance` result (regression rows: mse, biasSquared, variance; zero-one rows:
 * loss, bias and net variance, which add up to the loss), with `complexity` naming the setting on the x-axis.
 * @example
 * const parts = biasVariance(train, test, (d, s) => fitTree(d, s), [{ depthLimit: 1 }, { depthLimit: 4 }]);
 * const spec = chartBiasVarianceResult(parts, 'depthLimit');
 */
export function chartBiasVarianceResult(
  rows: readonly BiasVarianceRow[],
  complexity: string,
  options: BiasVarianceChartOptions = {},
): ChartSpec {
  const out: BiasVarianceChartRow[] = [];
  let noise: number | undefined;
  let zeroOne = false;
  for (const r of rows) {
    const x = r[complexity];
    if (typeof x !== 'number') throw errors.badOption('complexity', complexity, 'a numeric setting present in every row');
    if (typeof r.mse === 'number') {
      out.push({ complexity: x, component: 'error', value: r.mse });
      out.push({ complexity: x, component: 'bias²', value: r.biasSquared as number });
      out.push({ complexity: x, component: 'variance', value: r.variance as number });
      if (r.noiseInBias === false && typeof r.noise === 'number') noise = r.noise;
    } else {
      zeroOne = true;
      out.push({ complexity: x, component: 'error', value: r.loss as number });
      // Domingos (2000): loss = bias + net variance. Bias is 0 or 1 per row, so its square is itself.
      out.push({ complexity: x, component: 'bias²', value: r.bias as number });
      out.push({ complexity: x, component: 'variance', value: r.netVariance as number });
    }
  }
  return chartBiasVariance(out, {
    complexityName: complexity,
    errorName: zeroOne ? 'zero-one loss (share of rows)' : 'squared error',
    ...(noise !== undefined ? { noise } : {}),
    ...options,
  });
}
