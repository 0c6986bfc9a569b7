/** Mean, sample standard deviation and standard error of a list of fold scores. */
export interface ScoreSummary {
  readonly mean: number;
  /** Sample standard deviation (denominator n − 1); 0 for a single fold. */
  readonly sd: number;
  /** sd / sqrt(n): the usual, optimistic, standard error of the mean over folds. */
  readonly se: number;
  readonly min: number;
  readonly max: number;
}

/**
 * Summarise fold scores. NaN scores (e.g. R² on a constant fold) make the summary NaN, never hidden.
 * @example
 * summarizeScores([1, 2, 3]); // { mean: 2, sd: 1, se: 0.577, min: 1, max: 3 }
 */
export function summarizeScores(scores: readonly number[]): ScoreSummary {
  const n = scores.length;
  if (n === 0) return { mean: NaN, sd: NaN, se: NaN, min: NaN, max: NaN };
  const mean = scores.reduce((a, b) => a + b, 0) / n;
  const ss = scores.reduce((a, b) => a + (b - mean) ** 2, 0);
  const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
  return { mean, sd, se: sd / Math.sqrt(n), min: Math.min(...scores), max: Math.max(...scores) };
}
