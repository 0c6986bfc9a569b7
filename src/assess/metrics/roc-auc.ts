import { binaryProblems, macroAverage, type ScoreGroups } from './ranking.js';
import type { Weights } from './check.js';

/**
 * Area under the ROC curve, computed as the Mann–Whitney statistic: the (weighted) share of
 * positive–negative pairs in which the positive row scores higher, a tie counting 1/2. This equals the
 * trapezoid area under the ROC curve (Fawcett 2006, "An introduction to ROC analysis", Pattern
 * Recognition Letters 27:861–874, §7 and Algorithm 3; Hanley & McNeil 1982, Radiology 143:29–36).
 *
 * Multiclass (n × K scores, K >= 3): one-vs-rest AUC per class, then the unweighted mean over classes that
 * have both positive and negative rows (macro average).
 *
 * @param actual - actual class codes (0/1 for binary).
 * @param scores - one score per row (higher means class 1), or n × K class scores, row-major.
 * @param weights - per-row weights; a pair weighs the product of its rows' weights. __Default:__ all 1.
 * @example
 * rocAuc([0, 0, 1, 1], [0.1, 0.4, 0.35, 0.8]); // 3 of 4 pairs ordered: 0.75
 */
export function rocAuc(actual: ArrayLike<number>, scores: ArrayLike<number>, weights?: Weights): number {
  return macroAverage('rocAuc', binaryProblems('rocAuc', actual, scores, weights), aucOfGroups);
}

/** Mann–Whitney AUC from score groups (highest score first). */
export function aucOfGroups(g: ScoreGroups): number {
  // Walk from the highest score: every positive row beats the negatives not yet passed,
  // and ties with the negatives at its own score for half.
  let negativeAbove = 0, pairs = 0;
  for (let j = 0; j < g.score.length; j++) {
    pairs += g.positive[j] * (g.totalNegative - negativeAbove - g.negative[j] + 0.5 * g.negative[j]);
    negativeAbove += g.negative[j];
  }
  return pairs / (g.totalPositive * g.totalNegative);
}
