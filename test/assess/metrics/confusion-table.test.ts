import { describe, expect, it } from 'vitest';
import { confusionTable } from '../../../src/assess/metrics/confusion-table.js';
import { calibrationTable } from '../../../src/assess/metrics/calibration-table.js';
import { expectClose } from '../close.js';

describe('confusionTable(actual, predicted, options?)', () => {
  it('K × K cells, zeros included, actual major, with row shares', () => {
    const t = confusionTable([0, 1, 1, 1], [0, 0, 1, 1], { classes: ['stay', 'leave'] });
    expect(t).toEqual([
      { actual: 'stay', predicted: 'stay', count: 1, shareOfActual: 1 },
      { actual: 'stay', predicted: 'leave', count: 0, shareOfActual: 0 },
      { actual: 'leave', predicted: 'stay', count: 1, shareOfActual: 1 / 3 },
      { actual: 'leave', predicted: 'leave', count: 2, shareOfActual: 2 / 3 },
    ]);
  });
  it('weighted counts; a class with no rows keeps share 0', () => {
    const t = confusionTable([0, 0], [0, 1], { classes: ['a', 'b', 'c'], weights: [2, 0.5] });
    expect(t).toHaveLength(9);
    expect(t.find((c) => c.actual === 'a' && c.predicted === 'a')?.count).toBe(2);
    expect(t.find((c) => c.actual === 'a' && c.predicted === 'b')?.shareOfActual).toBe(0.2);
    expect(t.filter((c) => c.actual === 'c').every((c) => c.shareOfActual === 0)).toBe(true);
  });
  it('labels default to codes; too few labels is an error', () => {
    expect(confusionTable([0, 1], [1, 1]).map((c) => c.actual + c.predicted)).toEqual(['00', '01', '10', '11']);
    expect(() => confusionTable([0, 2], [0, 0], { classes: ['a', 'b'] })).toThrow(/classes/);
  });
});

describe('calibrationTable(actual, proba, options?)', () => {
  it('equal-width bins by hand: [0, 0.5) and [0.5, 1]', () => {
    const t = calibrationTable([0, 1, 1, 1], [0.1, 0.3, 0.8, 0.9], { bins: 2 });
    expect(t).toHaveLength(2);
    expectClose(t[0].meanPredicted, 0.2);
    expectClose(t[0].observed, 0.5);
    expectClose(t[1].meanPredicted, 0.85);
    expectClose(t[1].observed, 1);
    expect([t[0].lower, t[0].upper, t[0].rows]).toEqual([0.1, 0.3, 2]);
  });
  it('probability exactly 1 falls in the last bin; empty bins are left out', () => {
    const t = calibrationTable([1, 0], [1, 0], { bins: 10 });
    expect(t.map((b) => b.bin)).toEqual([0, 9]);
  });
  it('quantile bins hold about equal rows; n × K takes the positive column', () => {
    const p: number[] = [], y: number[] = [];
    for (let i = 0; i < 8; i++) { p.push(1 - i / 10, i / 10); y.push(i >= 4 ? 1 : 0); }
    const t = calibrationTable(y, p, { bins: 4, binning: 'quantile' });
    expect(t.map((b) => b.rows)).toEqual([2, 2, 2, 2]);
    expectClose(t[3].meanPredicted, 0.65);
    expect(t[3].observed).toBe(1);
  });
  it('rejects bad options', () => {
    expect(() => calibrationTable([0, 1], [0.2, 0.6], { bins: 0 })).toThrow(/bins/);
    expect(() => calibrationTable([0, 1], [0.2, 0.6], { positive: 0 })).toThrow(/positive/);
    expect(() => calibrationTable([0, 1], [0.2, 1.6])).toThrow(/Probability at row 1/);
  });
});
