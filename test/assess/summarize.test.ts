import { describe, expect, it } from 'vitest';
import { summarizeScores } from '../../src/assess/summarize.js';
import { takePredictions, takeTarget } from '../../src/assess/take-rows.js';
import { expectClose } from './close.js';

describe('summarizeScores(scores)', () => {
  it('mean, sample sd (n − 1), se = sd/√n, min, max: by hand for 1, 2, 3', () => {
    const s = summarizeScores([1, 2, 3]);
    expect([s.mean, s.sd, s.min, s.max]).toEqual([2, 1, 1, 3]);
    expectClose(s.se, 1 / Math.sqrt(3));
  });
  it('one score: sd 0; no scores: NaN; a NaN score is not hidden', () => {
    expect(summarizeScores([4]).sd).toBe(0);
    expect(summarizeScores([]).mean).toBeNaN();
    expect(summarizeScores([1, NaN]).mean).toBeNaN();
  });
});

describe('takePredictions(predictions, rows) and takeTarget(target, rows)', () => {
  it('copies values and probability rows; indices may repeat', () => {
    const p = takePredictions({ task: 'classification', n: 3, value: Float64Array.of(0, 1, 1), proba: Float64Array.of(0.9, 0.1, 0.4, 0.6, 0.2, 0.8), classes: ['a', 'b'] }, [2, 0, 2]);
    expect(p.n).toBe(3);
    expect([...p.value]).toEqual([1, 0, 1]);
    expect([...p.proba]).toEqual([0.2, 0.8, 0.9, 0.1, 0.2, 0.8]);
    const t = takeTarget({ kind: 'number', name: 'y', values: Float64Array.of(5, 6, 7) }, [1]);
    expect(t.kind === 'number' && [...t.values]).toEqual([6]);
  });
});
