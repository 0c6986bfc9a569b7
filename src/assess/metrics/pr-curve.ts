import { binaryProblems, checkBothClasses, groupScores } from './ranking.js';
import type { Weights } from './check.js';
import { errors } from '../../errors.js';

/** One point of a precision–recall curve: rows scoring at least `threshold` are called positive. */
export interface PrPoint {
  readonly threshold: number;
  readonly recall: number;
  readonly precision: number;
}

/**
 * Precision–recall curve points for a binary problem: one point per distinct score, highest first,
 * preceded by the point (recall 0, precision 1) at threshold Infinity (common practice for drawing).
 * Draw it as steps, not straight lines (Davis & Goadrich 2006, "The relationship between
 * precision-recall and ROC curves", ICML); `averagePrecision` is the area under these steps.
 *
 * @param actual - actual class codes, 0/1.
 * @param scores - one score per row (higher means class 1), or n × 2 class probabilities.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * prCurve([1, 0, 1], [0.9, 0.8, 0.7]);
 * // recall/precision: (0, 1), (0.5, 1), (0.5, 0.5), (1, 0.667)
 */
export function prCurve(actual: ArrayLike<number>, scores: ArrayLike<number>, weights?: Weights): PrPoint[] {
  const problems = binaryProblems('prCurve', actual, scores, weights);
  if (problems.length !== 1) throw errors.notSupported('prCurve on more than two classes (take one class column)');
  const g = groupScores(problems[0].isPositive, problems[0].scores, problems[0].weights);
  checkBothClasses('prCurve', g);
  const points: PrPoint[] = [{ threshold: Infinity, recall: 0, precision: 1 }];
  let tp = 0, fp = 0;
  for (let j = 0; j < g.score.length; j++) {
    tp += g.positive[j];
    fp += g.negative[j];
    points.push({ threshold: g.score[j], recall: tp / g.totalPositive, precision: tp / (tp + fp) });
  }
  return points;
}
