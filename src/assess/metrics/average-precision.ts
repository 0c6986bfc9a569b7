import { binaryProblems, macroAverage, type ScoreGroups } from './ranking.js';
import type { Weights } from './check.js';

/**
 * Area under the precision–recall curve as average precision, step-wise (no interpolation):
 * AP = Σ_t (R_t − R_{t−1}) · P_t over distinct score thresholds t from high to low, where R_t and P_t are
 * recall and precision when rows scoring >= t are called positive, and R_0 = 0. Tied scores form one
 * threshold. Straight-line interpolation between PR points is avoided because it overstates the area
 * (Davis & Goadrich 2006, "The relationship between precision-recall and ROC curves", ICML, §4).
 * With no ties this is the non-interpolated average precision of information retrieval
 * (Manning, Raghavan & Schütze 2008, Introduction to Information Retrieval, §8.4).
 *
 * Multiclass (n × K scores, K >= 3): one-vs-rest, unweighted mean over classes with positive rows.
 *
 * @param actual - actual class codes (0/1 for binary).
 * @param scores - one score per row (higher means class 1), or n × K class scores.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * averagePrecision([1, 0, 1], [0.9, 0.8, 0.7]); // 0.5·1 + 0.5·(2/3) = 0.8333
 */
export function averagePrecision(actual: ArrayLike<number>, scores: ArrayLike<number>, weights?: Weights): number {
  return macroAverage('averagePrecision', binaryProblems('averagePrecision', actual, scores, weights), apOfGroups);
}

/** Step-wise average precision from score groups (highest score first). */
export function apOfGroups(g: ScoreGroups): number {
  let tp = 0, fp = 0, ap = 0, lastRecall = 0;
  for (let j = 0; j < g.score.length; j++) {
    tp += g.positive[j];
    fp += g.negative[j];
    const recall = tp / g.totalPositive;
    ap += (recall - lastRecall) * (tp / (tp + fp));
    lastRecall = recall;
  }
  return ap;
}
