/**
 * Shared core of the ranking metrics (ROC, precision–recall): rows sorted by score, highest first,
 * walked one group of tied scores at a time, with the weight of positive and negative rows per group.
 */
import { errors } from '../../errors.js';
import { checkCodes, checkFinite, checkLength, checkNotEmpty, checkWeights, probaColumns, type Weights } from './check.js';

/** Per distinct score, highest first: the score and the positive and negative weight at it. */
export interface ScoreGroups {
  readonly score: Float64Array;
  readonly positive: Float64Array;
  readonly negative: Float64Array;
  readonly totalPositive: number;
  readonly totalNegative: number;
}

/** Group rows by distinct score (descending); `isPositive[i]` is 1 for a positive row. */
export function groupScores(isPositive: Uint8Array, scores: ArrayLike<number>, w: Float64Array): ScoreGroups {
  const n = isPositive.length;
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  order.sort((a, b) => scores[b] - scores[a] || a - b);
  const score: number[] = [], pos: number[] = [], neg: number[] = [];
  let totalPositive = 0, totalNegative = 0;
  for (let j = 0; j < n; j++) {
    const i = order[j];
    if (j === 0 || scores[i] !== score[score.length - 1]) { score.push(scores[i]); pos.push(0); neg.push(0); }
    const g = score.length - 1;
    if (isPositive[i]) { pos[g] += w[i]; totalPositive += w[i]; } else { neg[g] += w[i]; totalNegative += w[i]; }
  }
  return {
    score: Float64Array.from(score), positive: Float64Array.from(pos), negative: Float64Array.from(neg),
    totalPositive, totalNegative,
  };
}

/** A binary ranking problem: which rows are positive, their scores and weights. */
export interface BinaryRanking {
  readonly isPositive: Uint8Array;
  readonly scores: ArrayLike<number>;
  readonly weights: Float64Array;
}

/**
 * Validate (actual, scores, weights) and split into one-vs-rest binary problems: one problem when scores
 * hold one value per row (class 1 is positive) or two columns (column 1 is the positive class score);
 * one problem per class when scores hold n × K columns with K >= 3.
 */
export function binaryProblems(
  metric: string, actual: ArrayLike<number>, scores: ArrayLike<number>, weights: Weights,
): BinaryRanking[] {
  const n = actual.length;
  checkNotEmpty(n, metric);
  const k = probaColumns(n, scores);
  const classes = checkCodes('actual', actual);
  if (classes > Math.max(k, 2)) checkLength('scores', n * classes, scores);
  checkFinite('scores', scores);
  const w = checkWeights(weights, n);
  const column = (c: number): Float64Array => {
    const s = new Float64Array(n);
    for (let i = 0; i < n; i++) s[i] = scores[i * k + c];
    return s;
  };
  const mark = (c: number): Uint8Array => {
    const m = new Uint8Array(n);
    for (let i = 0; i < n; i++) m[i] = actual[i] === c ? 1 : 0;
    return m;
  };
  if (k <= 2) return [{ isPositive: mark(1), scores: k === 1 ? scores : column(1), weights: w }];
  const out: BinaryRanking[] = [];
  for (let c = 0; c < k; c++) out.push({ isPositive: mark(c), scores: column(c), weights: w });
  return out;
}

/** Throw unless a binary problem has positive and negative weight. */
export function checkBothClasses(metric: string, g: ScoreGroups): void {
  if (g.totalPositive > 0 && g.totalNegative > 0) return;
  throw errors.oneClassOnly(metric, g.totalPositive > 0 ? 'positive rows are' : 'negative rows are');
}

/** Macro average over one-vs-rest problems, skipping classes with no positive (or no negative) rows. */
export function macroAverage(metric: string, problems: readonly BinaryRanking[], score: (g: ScoreGroups) => number): number {
  if (problems.length === 1) {
    const g = groupScores(problems[0].isPositive, problems[0].scores, problems[0].weights);
    checkBothClasses(metric, g);
    return score(g);
  }
  let sum = 0, used = 0;
  for (const p of problems) {
    const g = groupScores(p.isPositive, p.scores, p.weights);
    if (g.totalPositive > 0 && g.totalNegative > 0) { sum += score(g); used++; }
  }
  if (used === 0) throw errors.oneClassOnly(metric, 'one class is');
  return sum / used;
}
