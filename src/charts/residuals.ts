/**
 * Residuals (observed − fitted) from parallel arrays, checked: shared by the residual charts.
 */
import { checkFinite, checkLength } from './check-input.js';

/** Observed and fitted values of a regression, row by row. */
export interface ResidualInput {
  /** Observed target values. */
  readonly y: ArrayLike<number>;
  /** Fitted (predicted) values, same length as `y`. */
  readonly fitted: ArrayLike<number>;
}

/** `y − fitted` for every row, after checking both are finite and the same length. */
export function computeResiduals(chart: string, input: ResidualInput): Float64Array {
  checkLength(chart, 'fitted', input.y.length, input.fitted.length);
  const out = new Float64Array(input.y.length);
  for (let i = 0; i < out.length; i++) {
    out[i] = checkFinite(chart, 'y', i, input.y[i]) - checkFinite(chart, 'fitted', i, input.fitted[i]);
  }
  return out;
}

/** Mean and standard deviation (n − 1 denominator; 0 for one value). */
export function meanAndSd(values: ArrayLike<number>): { mean: number; sd: number } {
  const n = values.length;
  let s = 0;
  for (let i = 0; i < n; i++) s += values[i];
  const mean = n > 0 ? s / n : NaN;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (values[i] - mean) ** 2;
  return { mean, sd: n > 1 ? Math.sqrt(ss / (n - 1)) : 0 };
}

/** Axis title for a target: "name (unit)" or "name". */
export function withUnit(name: string, unit: string | undefined): string {
  return unit ? `${name} (${unit})` : name;
}
