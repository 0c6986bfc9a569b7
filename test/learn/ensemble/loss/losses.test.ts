import { describe, expect, it } from 'vitest';
import { squaredLoss } from '../../../../src/learn/ensemble/loss/squared.js';
import { absoluteLoss } from '../../../../src/learn/ensemble/loss/absolute.js';
import { huberLoss } from '../../../../src/learn/ensemble/loss/huber.js';
import { quantileLoss } from '../../../../src/learn/ensemble/loss/quantile.js';
import { logisticLoss, sigmoid } from '../../../../src/learn/ensemble/loss/logistic.js';
import { multiclassLoss } from '../../../../src/learn/ensemble/loss/multiclass.js';
import { poissonLoss } from '../../../../src/learn/ensemble/loss/poisson.js';
import { pickLoss } from '../../../../src/learn/ensemble/loss/pick.js';
import { allRows } from '../../../../src/learn/ensemble/weighted-quantile.js';

const f64 = (...v: number[]) => Float64Array.from(v);
const ones = (n: number) => new Float64Array(n).fill(1);
const res = (loss: { residuals(y: Float64Array, F: Float64Array, k: number, out: Float64Array): void }, y: Float64Array, F: Float64Array, k = 0) => {
  const out = new Float64Array(y.length);
  loss.residuals(y, F, k, out);
  return Array.from(out);
};

// Pseudo-residuals −∂L/∂F in closed form: Friedman, J. (2001) "Greedy function approximation: a gradient
// boosting machine", Annals of Statistics 29(5), §4 (Algorithms 2–6); Hastie, Tibshirani & Friedman (2009),
// ESL 2nd ed., Table 10.2.
describe('pseudo-residuals vs closed form (Friedman 2001; ESL Table 10.2)', () => {
  const y = f64(3, -1, 2, 0.5);
  const F = f64(1, 1, 2, 2);
  it('squaredLoss(): y − F', () => {
    expect(res(squaredLoss(), y, F)).toEqual([2, -2, 0, -1.5]);
  });
  it('absoluteLoss(): sign(y − F)', () => {
    expect(res(absoluteLoss(), y, F)).toEqual([1, -1, 0, -1]);
  });
  it('quantileLoss(τ): τ above, τ − 1 below', () => {
    expect(res(quantileLoss(0.9), y, F)).toEqual([0.9, expect.closeTo(-0.1, 12), 0, expect.closeTo(-0.1, 12)]);
  });
  it('logisticLoss(): y − p with p = 1/(1 + e^−F)', () => {
    const yb = f64(1, 0, 1), Fb = f64(0, Math.log(3), -Math.log(3));
    expect(res(logisticLoss(), yb, Fb)).toEqual([0.5, expect.closeTo(-0.75, 12), expect.closeTo(0.75, 12)]);
  });
  it('poissonLoss(): y − exp(F)', () => {
    expect(res(poissonLoss(), f64(0, 2, 5), f64(0, Math.log(2), Math.log(4)))).toEqual([-1, expect.closeTo(0, 12), expect.closeTo(1, 12)]);
  });
  it('multiclassLoss(K): 1{y = k} − softmax_k(F)', () => {
    const loss = multiclassLoss(3);
    const yk = f64(0, 2);
    const Fk = f64(0, 0, 0, Math.log(1), Math.log(2), Math.log(1)); // row 1: p = [1/4, 1/2, 1/4]
    loss.startRound(yk, Fk, ones(2));
    expect(res(loss, yk, Fk, 0)).toEqual([expect.closeTo(2 / 3, 12), expect.closeTo(-1 / 4, 12)]);
    expect(res(loss, yk, Fk, 1)).toEqual([expect.closeTo(-1 / 3, 12), expect.closeTo(-1 / 2, 12)]);
    expect(res(loss, yk, Fk, 2)).toEqual([expect.closeTo(-1 / 3, 12), expect.closeTo(3 / 4, 12)]);
  });
  it('huberLoss(α): r inside δ, δ·sign(r) outside; δ = α-quantile of |r| (Friedman 2001 Algorithm 4)', () => {
    // r = y − F = [−10, −1, 0, 1, 2, 3, 4, 5, 6, 100]; sorted |r| = 0,1,1,2,3,4,5,6,10,100
    const yh = f64(-10, -1, 0, 1, 2, 3, 4, 5, 6, 100), Fh = new Float64Array(10);
    const h8 = huberLoss(0.8);
    h8.startRound(yh, Fh, ones(10));
    expect(h8.delta()).toBe(6); // 8th of 10 sorted |r| (lower weighted quantile)
    expect(res(h8, yh, Fh)).toEqual([-6, -1, 0, 1, 2, 3, 4, 5, 6, 6]);
    const h9 = huberLoss(0.9);
    h9.startRound(yh, Fh, ones(10));
    expect(h9.delta()).toBe(10);
    expect(res(h9, yh, Fh)).toEqual([-10, -1, 0, 1, 2, 3, 4, 5, 6, 10]);
  });
});

describe('leaf values and initial models', () => {
  it('huberLoss(α).leafValue: r̃ + mean(sign(r − r̃)·min(δ, |r − r̃|)) (Friedman 2001 Algorithm 4)', () => {
    // median r̃ = 2 (lower median of 10 values); r − r̃ clipped at δ = 6: −6,−3,−2,−1,0,1,2,3,4,6 → mean 0.4 → 2.4
    const yh = f64(-10, -1, 0, 1, 2, 3, 4, 5, 6, 100), Fh = new Float64Array(10);
    const h = huberLoss(0.8);
    h.startRound(yh, Fh, ones(10));
    expect(h.leafValue(yh, Fh, ones(10), allRows(10), 0, 10)).toBeCloseTo(2.4, 12);
  });
  it('absoluteLoss().leafValue is the weighted median of y − F; initial the median of y', () => {
    const l = absoluteLoss();
    const y = f64(1, 5, 9, 100), F = f64(0, 0, 0, 0);
    expect(l.leafValue(y, F, f64(1, 1, 3, 1), allRows(4), 0, 4)).toBe(9); // weight 3 on 9 holds the middle
    expect(l.initial(f64(4, 1, 3), ones(3))[0]).toBe(3);
  });
  it('quantileLoss(0.9).initial is the lower 0.9-quantile of y', () => {
    expect(quantileLoss(0.9).initial(f64(1, 2, 3, 4, 5, 6, 7, 8, 9, 10), ones(10))[0]).toBe(9);
  });
  it('logisticLoss(): initial log-odds; Newton leaf Σr / Σp(1 − p)', () => {
    const l = logisticLoss();
    expect(l.initial(f64(1, 1, 1, 0), ones(4))[0]).toBeCloseTo(Math.log(3), 12);
    const y = f64(1, 1, 0), F = new Float64Array(3), r = new Float64Array(3), num = new Float64Array(3), den = new Float64Array(3);
    l.residuals(y, F, 0, r);
    l.leafTerms(y, F, 0, r, num, den);
    // at F = 0: p = ½, r = [½, ½, −½], p(1 − p) = ¼ each → γ = ½ / ¾ = 2/3
    expect(num.reduce((a, b) => a + b) / den.reduce((a, b) => a + b)).toBeCloseTo(2 / 3, 12);
    expect(sigmoid(-800)).toBe(0);
    expect(sigmoid(800)).toBe(1);
  });
  it('multiclassLoss(K) scales Newton leaves by (K − 1)/K (Friedman 2001 Algorithm 6)', () => {
    expect(multiclassLoss(3).ratioScale).toBeCloseTo(2 / 3, 12);
    expect(multiclassLoss(4).ratioScale).toBeCloseTo(3 / 4, 12);
    // initial model: centred log class shares; softmax of it gives back the shares
    const F0 = multiclassLoss(3).initial(f64(0, 0, 1, 2), ones(4));
    const e = Array.from(F0, Math.exp), s = e.reduce((a, b) => a + b);
    expect(e.map((v) => v / s)).toEqual([0.5, 0.25, 0.25].map((v) => expect.closeTo(v, 12)));
    expect(F0.reduce((a, b) => a + b)).toBeCloseTo(0, 12);
  });
  it('poissonLoss(): initial log(mean y); Newton leaf Σ(y − μ) / Σμ', () => {
    const l = poissonLoss();
    expect(l.initial(f64(1, 2, 3), ones(3))[0]).toBeCloseTo(Math.log(2), 12);
    expect(l.initial(f64(0, 0), ones(2))[0]).toBeCloseTo(Math.log(1e-15), 9); // all-zero counts: clamped
    const y = f64(3, 5), F = f64(0, 0), r = new Float64Array(2), num = new Float64Array(2), den = new Float64Array(2);
    l.residuals(y, F, 0, r);
    l.leafTerms(y, F, 0, r, num, den);
    expect((num[0] + num[1]) / (den[0] + den[1])).toBeCloseTo(3, 12); // (2 + 4) / (1 + 1); exp(F + 3) overshoots: one Newton step
  });
  it('squaredLoss().value is the weighted mean squared error', () => {
    expect(squaredLoss().value(f64(1, 3), f64(0, 0), f64(1, 3))).toBeCloseTo((1 + 27) / 4, 12);
  });
});

describe('pickLoss(name, target)', () => {
  const num = { kind: 'number' as const, name: 'y', values: f64(1) };
  const two = { kind: 'class' as const, name: 'c', codes: Int32Array.of(0), classes: ['a', 'b'] };
  const three = { kind: 'class' as const, name: 'c', codes: Int32Array.of(0), classes: ['a', 'b', 'c'] };
  it('rejects a loss that does not fit the target', () => {
    expect(() => pickLoss('logistic', num)).toThrow(/Loss "logistic" does not fit a numeric target/);
    expect(() => pickLoss('squared', two)).toThrow(/class target/);
    expect(() => pickLoss('logistic', three)).toThrow(/3-class/);
    expect(() => pickLoss('hinge' as never, num)).toThrow(/Option loss/);
    expect(() => pickLoss('quantile', num, { quantileLevel: 1 })).toThrow(/quantileLevel/);
  });
  it('builds the K-output multiclass loss', () => {
    expect(pickLoss('multiclass', three).nOutputs).toBe(3);
  });
});

describe('fusedTerms(y, F, w, r, den): one pass, the same numbers as residuals + leafTerms + value', () => {
  // extreme scores (±40) and zero weights included; equality is exact (same arithmetic, shared exponentials)
  const F = f64(-40, -3, -0.5, 0, 0.25, 2, 40, 1);
  const w = f64(1, 0, 2, 1, 0.5, 3, 1, 1);
  const cases = [
    ['squaredLoss()', squaredLoss(), f64(3, -1, 2, 0.5, 0, 7, -2, 1)],
    ['logisticLoss()', logisticLoss(), f64(1, 0, 1, 1, 0, 0, 0, 1)],
    ['poissonLoss()', poissonLoss(), f64(0, 2, 5, 1, 0, 9, 3, 0)],
  ] as const;
  for (const [name, loss, y] of cases) {
    it(`${name}`, () => {
      const n = y.length, r1 = new Float64Array(n), num = new Float64Array(n), den1 = new Float64Array(n);
      const Fi = name === 'poissonLoss()' ? F.map((v) => v / 10) : F;
      loss.residuals(y, Fi, 0, r1);
      loss.leafTerms(y, Fi, 0, r1, num, den1);
      const r2 = new Float64Array(n), den2 = new Float64Array(n);
      const v = loss.fusedTerms?.(y, Fi, w, r2, den2);
      expect(Array.from(r2)).toEqual(Array.from(r1));
      expect(Array.from(den2)).toEqual(Array.from(den1));
      if (name === 'logisticLoss()') {
        // logistic sums log(1 + e^−|F|) of weight-1 rows as the log of a product: equal up to rounding
        expect(Math.abs((v as number) - loss.value(y, Fi, w))).toBeLessThan(1e-13 * Math.abs(loss.value(y, Fi, w)));
      } else {
        expect(v).toBe(loss.value(y, Fi, w));
      }
    });
  }

  it('logisticLoss(): the product form of the loss agrees with log1p row by row over many blocks of 64 rows', () => {
    const n = 1000, y = new Float64Array(n), Fi = new Float64Array(n), w = new Float64Array(n);
    for (let i = 0; i < n; i++) { y[i] = i % 3 === 0 ? 1 : 0; Fi[i] = Math.sin(i) * 8; w[i] = i % 7 === 0 ? 0.5 : i % 11 === 0 ? 0 : 1; }
    const loss = logisticLoss();
    const v = loss.fusedTerms?.(y, Fi, w, new Float64Array(n), new Float64Array(n)) as number;
    expect(Math.abs(v - loss.value(y, Fi, w))).toBeLessThan(1e-13 * loss.value(y, Fi, w));
  });
});
