import { describe, expect, it } from 'vitest';
import { rocAuc } from '../../../src/assess/metrics/roc-auc.js';
import { rocCurve } from '../../../src/assess/metrics/roc-curve.js';
import { createRng } from '../../../src/util/rng.js';
import { expectClose } from '../close.js';

/** Brute force over all positive–negative pairs, ties 1/2: the Mann–Whitney definition itself. */
function pairCount(actual: number[], scores: number[]): number {
  let s = 0, pairs = 0;
  for (let i = 0; i < actual.length; i++) {
    for (let j = 0; j < actual.length; j++) {
      if (actual[i] !== 1 || actual[j] !== 0) continue;
      pairs++;
      s += scores[i] > scores[j] ? 1 : scores[i] === scores[j] ? 0.5 : 0;
    }
  }
  return s / pairs;
}

/** Trapezoid area under ROC points (Fawcett 2006, Algorithm 3). */
function trapezoid(points: { falsePositiveRate: number; truePositiveRate: number }[]): number {
  let a = 0;
  for (let i = 1; i < points.length; i++) {
    a += (points[i].falsePositiveRate - points[i - 1].falsePositiveRate)
      * (points[i].truePositiveRate + points[i - 1].truePositiveRate) / 2;
  }
  return a;
}

describe('rocAuc(actual, scores, weights?)', () => {
  // Definition: Fawcett, T. (2006) "An introduction to ROC analysis", Pattern Recognition Letters
  // 27:861–874 — AUC is the probability a random positive outranks a random negative, ties counting 1/2.
  const actual = [0, 0, 1, 1, 0, 1];
  const scores = [0.1, 0.5, 0.5, 0.8, 0.3, 0.3];

  it('small example with ties, by hand: 7/9', () => {
    // positives 0.5, 0.8, 0.3; negatives 0.1, 0.5, 0.3
    // 0.5 beats 0.1 and 0.3, ties 0.5 → 2.5; 0.8 beats all → 3; 0.3 beats 0.1, ties 0.3 → 1.5; (2.5+3+1.5)/9
    expectClose(rocAuc(actual, scores), 7 / 9);
  });

  it('equals the trapezoid area under rocCurve (Fawcett 2006, §7, Algorithms 1 and 3)', () => {
    expectClose(trapezoid(rocCurve(actual, scores)), 7 / 9);
  });

  it('Fawcett 2006 Fig. 3 scores (20 instances; data from memory) agree with brute-force pair counting', () => {
    const s = [0.9, 0.8, 0.7, 0.6, 0.55, 0.54, 0.53, 0.52, 0.51, 0.505, 0.4, 0.39, 0.38, 0.37, 0.36, 0.35, 0.34, 0.33, 0.3, 0.1];
    const y = [1, 1, 0, 1, 1, 1, 0, 0, 1, 0, 1, 0, 1, 0, 0, 0, 1, 0, 1, 0];
    expectClose(rocAuc(y, s), pairCount(y, s));
    expectClose(trapezoid(rocCurve(y, s)), pairCount(y, s));
  });

  it('matches brute force on random data with many ties (seeded)', () => {
    const rng = createRng(5);
    const y: number[] = [], s: number[] = [];
    for (let i = 0; i < 200; i++) { y.push(rng.int(2)); s.push(rng.int(7) / 7); }
    expectClose(rocAuc(y, s), pairCount(y, s));
  });

  it('perfect ranking 1, reversed 0, all tied 1/2', () => {
    expect(rocAuc([0, 0, 1], [0.1, 0.2, 0.9])).toBe(1);
    expect(rocAuc([0, 0, 1], [0.9, 0.8, 0.1])).toBe(0);
    expect(rocAuc([0, 1, 0, 1], [0.5, 0.5, 0.5, 0.5])).toBe(0.5);
  });

  it('weights: weight 2 on a row equals the row twice', () => {
    expectClose(rocAuc([0, 1, 0, 1], [0.3, 0.2, 0.1, 0.9], [2, 1, 1, 3]),
      rocAuc([0, 0, 1, 0, 1, 1, 1], [0.3, 0.3, 0.2, 0.1, 0.9, 0.9, 0.9]));
  });

  it('n × 2 probabilities use the class-1 column', () => {
    expectClose(rocAuc([0, 1, 1], [0.8, 0.2, 0.3, 0.7, 0.6, 0.4]), 1);
  });

  it('multiclass: one-vs-rest AUCs averaged over classes (macro), by hand', () => {
    // class 0 column (0.6, 0.2, 0.3, 0.1): positive row 0 beats all → 1
    // class 1 column (0.3, 0.5, 0.3, 0.6): positive row 1 (0.5) beats 0.3, 0.3, loses to 0.6 → 2/3
    // class 2 column (0.1, 0.3, 0.4, 0.3): positives rows 2, 3 (0.4, 0.3) vs negatives (0.1, 0.3):
    //   0.4 → 2; 0.3 → 1 + 0.5 → 3.5 / 4 = 0.875
    const y = [0, 1, 2, 2];
    const p = [0.6, 0.3, 0.1, 0.2, 0.5, 0.3, 0.3, 0.3, 0.4, 0.1, 0.6, 0.3];
    expectClose(rocAuc(y, p), (1 + 2 / 3 + 0.875) / 3);
  });

  it('throws when one class only is present', () => {
    expect(() => rocAuc([1, 1, 1], [0.2, 0.4, 0.9])).toThrow(/only positive rows are present/);
    expect(() => rocAuc([0, 0], [0.2, 0.4])).toThrow(/only negative rows are present/);
    expect(() => rocAuc([2, 2], [0.2, 0.4, 0.4, 0.1, 0.3, 0.6])).toThrow(/only one class is present/);
  });

  it('rejects NaN or infinite scores, a length mismatch and empty input', () => {
    expect(() => rocAuc([0, 1], [NaN, 0.5])).toThrow(/scores/);
    expect(() => rocAuc([0, 1], [Infinity, 0.5])).toThrow(/scores/);
    expect(() => rocAuc([0, 1], [0.5, 0.2, 0.1])).toThrow(/length 3; expected 2/);
    expect(() => rocAuc([], [])).toThrow(/No rows/);
  });
});

describe('rocCurve(actual, scores, weights?)', () => {
  it('one point per distinct score from (0, 0) to (1, 1), ties merged', () => {
    const pts = rocCurve([0, 0, 1, 1, 0, 1], [0.1, 0.5, 0.5, 0.8, 0.3, 0.3]);
    expect(pts.map((p) => p.threshold)).toEqual([Infinity, 0.8, 0.5, 0.3, 0.1]);
    expect(pts.map((p) => [p.falsePositiveRate, p.truePositiveRate])).toEqual([
      [0, 0], [0, 1 / 3], [1 / 3, 2 / 3], [2 / 3, 1], [1, 1],
    ]);
  });
  it('refuses more than two classes', () => {
    expect(() => rocCurve([0, 1, 2], [1, 0, 0, 0, 1, 0, 0, 0, 1])).toThrow(/not supported/);
  });
});
