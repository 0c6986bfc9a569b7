/**
 * The arithmetic inside the charts: fold summaries, confusion shares, contribution steps, outcome of a
 * metric change, cell edges, binned averages, sampling, number labels, text widths, input checks.
 */
import { describe, expect, it } from 'vitest';
import { checkFinite, checkLabel, checkLength } from '../../src/charts/check-input.js';
import { confusionCells } from '../../src/charts/confusion.js';
import { averageByValue } from '../../src/charts/contribution-summary.js';
import { contributionSteps } from '../../src/charts/contributions.js';
import { cellEdges } from '../../src/charts/dependence-grid.js';
import { formatNumber, formatShare, formatSigned } from '../../src/charts/format-number.js';
import { changeOutcome } from '../../src/charts/metric-deltas.js';
import { computeResiduals, meanAndSd } from '../../src/charts/residuals.js';
import { sampleIndices } from '../../src/charts/sample-rows.js';
import { measureItemText, textWidth } from '../../src/charts/text-width.js';
import { summariseFolds } from '../../src/charts/validation-curve.js';
import { CoppiceError } from '../../src/errors.js';

describe('summariseFolds(rows)', () => {
  it('mean and ±1 sample standard deviation per setting value: [1,2,3,4] → 2.5 ± 1.290994 (common practice)', () => {
    const s = summariseFolds([1, 2, 3, 4].map((score) => ({ value: 'a', score })).concat([{ value: 'b', score: 7 }]));
    expect(s[0].mean).toBe(2.5);
    expect(s[0].high - s[0].mean).toBeCloseTo(1.290994, 6);
    expect(s[1]).toEqual({ value: 'b', mean: 7, low: 7, high: 7, folds: 1 });
  });
});

describe('confusionCells({ classes, counts })', () => {
  it('row-normalises nested and flat counts alike; an empty row gets share 0', () => {
    const nested = confusionCells({ classes: ['a', 'b'], counts: [[3, 1], [0, 0]] });
    const flat = confusionCells({ classes: ['a', 'b'], counts: Float64Array.of(3, 1, 0, 0) });
    expect(nested).toEqual(flat);
    expect(nested.map((c) => c.share)).toEqual([0.75, 0.25, 0, 0]);
  });
  it('rejects counts of the wrong shape and NaN counts', () => {
    expect(() => confusionCells({ classes: ['a', 'b'], counts: [1, 2, 3] })).toThrow(/counts has 3 values; expected 4/);
    expect(() => confusionCells({ classes: ['a', 'b'], counts: [[1, 2], [3]] })).toThrow(CoppiceError);
    expect(() => confusionCells({ classes: ['a', 'b'], counts: [1, NaN, 3, 4] })).toThrow(/count of row 1 is NaN/);
  });
});

describe('contributionSteps(input, limit)', () => {
  const input = { expected: 10, contributions: [
    { feature: 'a', value: 1, contribution: 0.5 }, { feature: 'b', value: 'x', contribution: -3 },
    { feature: 'c', value: null, contribution: 1 }, { feature: 'd', contribution: 0.25 },
  ] };
  it('walks from the expected value, largest contribution first, pooling the rest, to the output', () => {
    const steps = contributionSteps(input, 2);
    expect(steps.map((s) => s.step)).toEqual(['expected value', 'b = x', 'c = missing', '2 other features', 'prediction']);
    expect(steps.map((s) => s.end)).toEqual([10, 7, 8, 8.75, 8.75]);
    expect(steps[1].kind).toBe('down');
    expect(steps[3].start).toBe(8);
    expect(steps.slice(0, -1).every((s, i) => s.next === steps[i + 1].step)).toBe(true);
  });
  it('checks the output equals expected + Σ contributions (local accuracy)', () => {
    expect(() => contributionSteps({ ...input, output: 8.75 }, 10)).not.toThrow();
    expect(() => contributionSteps({ ...input, output: 9 }, 10)).toThrow(/output/);
  });
});

describe('changeOutcome(before, after, higherIsBetter)', () => {
  it('reads direction from the metric', () => {
    expect(changeOutcome(0.8, 0.9, true)).toBe('better');
    expect(changeOutcome(0.8, 0.9, false)).toBe('worse');
    expect(changeOutcome(0.3, 0.3, false)).toBe('unchanged');
  });
});

describe('cellEdges(grid)', () => {
  it('puts edges halfway between grid values and a half step beyond the ends', () => {
    expect([...cellEdges([0, 2, 6]).values()]).toEqual([[-1, 1], [1, 4], [4, 8]]);
    expect([...cellEdges([5]).values()]).toEqual([[4.5, 5.5]]);
  });
});

describe('averageByValue(x, c, groups)', () => {
  it('averages contributions in equal-count groups ordered by x', () => {
    expect(averageByValue([4, 1, 3, 2], [40, 10, 30, 20], 2)).toEqual([{ value: 1.5, mean: 15 }, { value: 3.5, mean: 35 }]);
    expect(averageByValue([1], [2], 12)).toEqual([{ value: 1, mean: 2 }]);
  });
});

describe('sampleIndices(n, limit, seed)', () => {
  it('returns all rows when they fit, else limit distinct sorted indices, the same for the same seed', () => {
    expect(Array.from(sampleIndices(3, 10))).toEqual([0, 1, 2]);
    const a = sampleIndices(10_000, 500, 7), b = sampleIndices(10_000, 500, 7), c = sampleIndices(10_000, 500, 8);
    expect(a).toEqual(b);
    expect(a).not.toEqual(c);
    expect(new Set(a).size).toBe(500);
    for (let i = 1; i < a.length; i++) expect(a[i]).toBeGreaterThan(a[i - 1]);
    expect(a[a.length - 1]).toBeLessThan(10_000);
  });
});

describe('formatNumber(x) / formatSigned(x) / formatShare(x)', () => {
  it('three significant digits, thousands separated, a true minus sign', () => {
    expect(formatNumber(0.012345)).toBe('0.0123');
    expect(formatNumber(12345.6)).toBe('12,346');
    expect(formatNumber(-2.5)).toBe('−2.5');
    expect(formatSigned(0.12)).toBe('+0.12');
    expect(formatSigned(0)).toBe('0');
    expect(formatShare(0.1234)).toBe('12.3%');
  });
});

describe('textWidth(text, fontSize) / measureItemText(item, text)', () => {
  it('uses Helvetica advance widths: a digit is 0.556 em (Adobe Core 14 metrics, from memory)', () => {
    expect(textWidth('0', 10)).toBeCloseTo(5.56, 9);
    expect(textWidth('Wi', 10)).toBeCloseTo(9.44 + 2.22, 9);
    expect(textWidth('0', 10, true)).toBeGreaterThan(5.56);
  });
  it('respects a text limit and trims', () => {
    expect(measureItemText({ fontSize: 10, limit: 20 }, '  0000000000  ')).toBe(20);
    expect(measureItemText({}, null)).toBe(0);
  });
});

describe('checkFinite / checkLabel / checkLength', () => {
  it('names the chart, field and row', () => {
    expect(() => checkFinite('chartX', 'loss', 3, NaN)).toThrow('chartX: loss of row 3 is NaN; expected a finite number.');
    expect(() => checkFinite('chartX', 'loss', 0, Infinity)).toThrow(CoppiceError);
    expect(() => checkFinite('chartX', 'loss', 0, '1')).toThrow(/"1"/);
    expect(checkLabel('chartX', 'f', 0, 3)).toBe('3');
    expect(() => checkLabel('chartX', 'f', 0, null)).toThrow(/expected a label/);
    expect(() => checkLength('chartX', 'fitted', 3, 2)).toThrow('chartX: fitted has 2 values; expected 3.');
  });
});

describe('computeResiduals / meanAndSd', () => {
  it('observed − fitted, checked; mean and sd with n − 1', () => {
    expect(Array.from(computeResiduals('c', { y: [3, 5], fitted: [1, 6] }))).toEqual([2, -1]);
    expect(() => computeResiduals('c', { y: [3, NaN], fitted: [1, 6] })).toThrow(/y of row 1/);
    expect(() => computeResiduals('c', { y: [3], fitted: [1, 6] })).toThrow(/fitted has 2 values/);
    expect(meanAndSd([2, 4, 4, 4, 5, 5, 7, 9])).toEqual({ mean: 5, sd: Math.sqrt(32 / 7) });
    expect(meanAndSd([1])).toEqual({ mean: 1, sd: 0 });
  });
});
