import { describe, expect, it } from 'vitest';
import { areaUnderRoc, averagePrecision } from '../../src/charts/area-under-curve.js';

/** ROC points from scores (ties make one point). */
function roc(scores: number[], labels: boolean[]): { fpr: number; tpr: number }[] {
  const P = labels.filter(Boolean).length, N = labels.length - P;
  const order = scores.map((_, i) => i).sort((a, b) => scores[b] - scores[a]);
  const pts = [{ fpr: 0, tpr: 0 }];
  let tp = 0, fp = 0;
  order.forEach((i, k) => {
    if (labels[i]) tp++; else fp++;
    if (k === order.length - 1 || scores[order[k + 1]] !== scores[i]) pts.push({ fpr: fp / N, tpr: tp / P });
  });
  return pts;
}

describe('areaUnderRoc(points)', () => {
  it('is 0.5 on the diagonal and 1 for a perfect ranking (common practice)', () => {
    expect(areaUnderRoc([{ fpr: 0, tpr: 0 }, { fpr: 1, tpr: 1 }])).toBe(0.5);
    expect(areaUnderRoc([{ fpr: 0, tpr: 1 }])).toBe(1);
    expect(areaUnderRoc([])).toBe(0.5);
  });

  it('equals the Mann–Whitney statistic U / (P·N), ties counted one half (Hanley & McNeil 1982, Radiology 143:29–36)', () => {
    const scores = [0.9, 0.8, 0.8, 0.7, 0.6, 0.55, 0.5, 0.4, 0.4, 0.3, 0.2, 0.1];
    const labels = [true, true, false, true, false, true, false, true, false, false, true, false];
    let u = 0, P = 0, N = 0;
    scores.forEach((s, i) => { if (labels[i]) P++; else N++; });
    scores.forEach((s, i) => scores.forEach((t, j) => { if (labels[i] && !labels[j]) u += s > t ? 1 : s === t ? 0.5 : 0; }));
    expect(areaUnderRoc(roc(scores, labels))).toBeCloseTo(u / (P * N), 12);
  });
});

describe('averagePrecision(points)', () => {
  it('sums recall steps times precision: (0.5 − 0)·1 + (1 − 0.5)·0.5 = 0.75 (hand-computed)', () => {
    expect(averagePrecision([{ recall: 1, precision: 0.5 }, { recall: 0.5, precision: 1 }])).toBeCloseTo(0.75, 12);
  });
  it('is 0 with no points', () => {
    expect(averagePrecision([])).toBe(0);
  });
});
