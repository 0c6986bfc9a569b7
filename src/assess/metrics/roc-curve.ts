import { binaryProblems, checkBothClasses, groupScores } from './ranking.js';
import type { Weights } from './check.js';
import { errors } from '../../errors.js';

/** One point of an ROC curve: rows scoring at least `threshold` are called positive. */
export interface RocPoint {
  readonly threshold: number;
  readonly falsePositiveRate: number;
  readonly truePositiveRate: number;
}

/**
 * ROC curve points for a binary problem: one point per distinct score, highest first, starting at
 * (0, 0) with threshold Infinity and ending at (1, 1). Tied scores make one point, so joining points by
 * straight lines gives the expected curve under random tie-breaking (Fawcett 2006, "An introduction to
 * ROC analysis", Pattern Recognition Letters 27:861–874, Algorithm 1).
 *
 * @param actual - actual class codes, 0/1.
 * @param scores - one score per row (higher means class 1), or n × 2 class probabilities.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * rocCurve([0, 1], [0.2, 0.9]);
 * // [{threshold: Infinity, fpr 0, tpr 0}, {0.9, 0, 1}, {0.2, 1, 1}]
 */
export function rocCurve(actual: ArrayLike<number>, scores: ArrayLike<number>, weights?: Weights): RocPoint[] {
  const problems = binaryProblems('rocCurve', actual, scores, weights);
  if (problems.length !== 1) throw errors.notSupported('rocCurve on more than two classes (take one class column)');
  const g = groupScores(problems[0].isPositive, problems[0].scores, problems[0].weights);
  checkBothClasses('rocCurve', g);
  const points: RocPoint[] = [{ threshold: Infinity, falsePositiveRate: 0, truePositiveRate: 0 }];
  let tp = 0, fp = 0;
  for (let j = 0; j < g.score.length; j++) {
    tp += g.positive[j];
    fp += g.negative[j];
    points.push({ threshold: g.score[j], falsePositiveRate: fp / g.totalNegative, truePositiveRate: tp / g.totalPositive });
  }
  return points;
}
