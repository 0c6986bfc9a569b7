import { describe, expect, it } from 'vitest';
import { averagePrecision } from '../../../src/assess/metrics/average-precision.js';
import { prCurve } from '../../../src/assess/metrics/pr-curve.js';
import { expectClose } from '../close.js';

describe('averagePrecision(actual, scores, weights?)', () => {
  it('without ties equals mean precision at each positive (Manning, Raghavan & Schütze 2008, §8.4)', () => {
    // ranking: + − + − +; precision at the positives: 1, 2/3, 3/5 → mean 34/45
    expectClose(averagePrecision([1, 0, 1, 0, 1], [0.9, 0.8, 0.7, 0.6, 0.5]), 34 / 45);
  });
  it('step-wise with ties: tied scores form one threshold', () => {
    // threshold 0.5: tp 1, fp 1 → R 0.5, P 0.5 → 0.25; threshold 0.2: R 1, P 2/3 → 0.5·2/3; total 7/12
    expectClose(averagePrecision([1, 0, 1], [0.5, 0.5, 0.2]), 7 / 12);
  });
  it('is the area under the prCurve steps', () => {
    const y = [1, 0, 1, 1, 0, 0, 1], s = [0.9, 0.9, 0.7, 0.4, 0.4, 0.2, 0.1];
    const pts = prCurve(y, s);
    let area = 0;
    for (let i = 1; i < pts.length; i++) area += (pts[i].recall - pts[i - 1].recall) * pts[i].precision;
    expectClose(averagePrecision(y, s), area);
  });
  it('perfect ranking gives 1', () => {
    expect(averagePrecision([0, 1, 1], [0.1, 0.8, 0.9])).toBe(1);
  });
  it('throws with one class only', () => {
    expect(() => averagePrecision([0, 0], [0.1, 0.2])).toThrow(/only negative rows/);
  });
});

describe('prCurve(actual, scores, weights?)', () => {
  it('starts at recall 0, precision 1, then one point per distinct score', () => {
    const pts = prCurve([1, 0, 1], [0.9, 0.8, 0.7]);
    expect(pts.map((p) => [p.recall, p.precision])).toEqual([[0, 1], [0.5, 1], [0.5, 0.5], [1, 2 / 3]]);
    expect(pts[0].threshold).toBe(Infinity);
  });
});
