import { afterEach, describe, expect, it } from 'vitest';
import { fitBoosting } from '../../../src/learn/ensemble/boosting.js';
import { boostingScores } from '../../../src/learn/ensemble/predict-boosting.js';
import type { RoundInfo } from '../../../src/learn/ensemble/progress.js';
import { pickLoss } from '../../../src/learn/ensemble/loss/pick.js';
import { setFrameBinner } from '../../../src/learn/hist/hist-build.js';
import { binnedFrameFor, cachedBinnedFrame } from '../../../src/table/bin-cache.js';
import type { Frame } from '../../../src/table/frame.js';
import { classTarget, datasetOf, friedman1, penguins } from './fixtures.js';

const json = (v: unknown) => JSON.stringify(v);

describe('fitBoosting(data, { onRound })', () => {
  it('reports every round: round, total, the recorded losses, best round, last; the model is unchanged', () => {
    const train = friedman1(150, 7, 3), hold = friedman1(300, 8, 3);
    const o = { rounds: 200, depthLimit: 6, learningRate: 0.5, watch: hold, patience: 10 };
    const seen: RoundInfo[] = [];
    const m = fitBoosting(train, { ...o, onRound: (info) => seen.push(info) });
    expect(json(m)).toBe(json(fitBoosting(train, o)));
    expect(seen.length).toBe(m.watchLoss.length - 1); // early stopping ended the fit
    seen.forEach((info, j) => {
      expect(info.round).toBe(j + 1);
      expect(info.total).toBe(200);
      expect(info.trainLoss).toBe(m.trainLoss[j + 1]);
      expect(info.watchLoss).toBe(m.watchLoss[j + 1]);
      expect(info.last).toBe(j === seen.length - 1);
    });
    expect(seen.at(-1)?.bestRound).toBe(m.bestRound);
  });

  it('without a watched set: watchLoss is NaN, bestRound follows the round, the last report has last = true', () => {
    const seen: RoundInfo[] = [];
    fitBoosting(friedman1(60, 2), { rounds: 3, onRound: (i) => seen.push(i) });
    expect(seen.map((i) => [i.round, i.bestRound, i.last, Number.isNaN(i.watchLoss)])).toEqual([[1, 1, false, true], [2, 2, false, true], [3, 3, true, true]]);
  });

  it('an error thrown by the callback stops the fit; a callback that is not a function is rejected', () => {
    let calls = 0;
    expect(() => fitBoosting(friedman1(60, 2), { rounds: 10, onRound: () => { calls++; if (calls === 2) throw new Error('stop here'); } })).toThrow('stop here');
    expect(calls).toBe(2);
    expect(() => fitBoosting(friedman1(60, 2), { onRound: 5 as never })).toThrow(/onRound/);
  });
});

describe('fitBoosting(data, options): the round loop', () => {
  afterEach(() => setFrameBinner(null));

  it('bins the frame once per fit: every round asks for the bins of the same frame, and only the first computes them', () => {
    const d = friedman1(120, 5);
    const frames = new Set<Frame>();
    let asked = 0, computed = 0;
    setFrameBinner((f) => { asked++; frames.add(f); if (!cachedBinnedFrame(f)) computed++; return binnedFrameFor(f); });
    fitBoosting(d, { rounds: 6, engine: 'histogram' });
    expect(asked).toBeGreaterThanOrEqual(6);
    expect(frames.size).toBe(1);
    expect(computed).toBe(1);
  });

  it('scores of training rows (from leafOfRow, left-out rows routed) reproduce the recorded training loss at every round', () => {
    // row subsampling leaves half the rows out of each tree, so both update paths are exercised
    const f1 = friedman1(300, 11);
    const yf = f1.target.kind === 'number' ? f1.target.values : new Float64Array(0);
    const binary = datasetOf(f1.features, classTarget('big', Array.from(yf, (v) => (v > 14 ? 'yes' : 'no'))));
    for (const [data, loss] of [[f1, 'squared'], [binary, 'logistic'], [penguins(), 'multiclass']] as const) {
      const m = fitBoosting(data, { loss, rounds: 12, rowFraction: 0.5, seed: 3, depthLimit: 2 });
      const t = data.target;
      const y = t.kind === 'class' ? Float64Array.from(t.codes) : t.values;
      const w = Float64Array.from(y, (v) => (v === v && v >= 0 ? 1 : 0)); // rows with a missing target are not fitted
      for (const r of [0, 1, 6, 12]) {
        expect(pickLoss(loss, t).value(y, boostingScores(m, data.features, r), w)).toBeCloseTo(m.trainLoss[r], 12);
      }
    }
  });
});
