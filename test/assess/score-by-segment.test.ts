import { describe, expect, it } from 'vitest';
import { scoreBySegment } from '../../src/assess/score-by-segment.js';
import type { Predictions } from '../../src/learn/model.js';
import type { Dataset } from '../../src/table/frame.js';
import { expectClose } from './close.js';

const data: Dataset = {
  features: {
    nRows: 6,
    columns: [
      { name: 'region', kind: 'categorical', codes: Int32Array.of(0, 0, 1, 1, 1, -1), categories: ['north', 'south'] },
      { name: 'age', kind: 'numeric', values: Float64Array.of(20, 30, 40, 50, 60, 70) },
    ],
    schema: { columns: [], fingerprint: '' },
  },
  target: { kind: 'number', name: 'cost', values: Float64Array.of(1, 2, 3, 4, 5, 6) },
  weights: null,
};
const pred: Predictions = { task: 'regression', n: 6, value: Float64Array.of(1, 2, 5, 4, 5, 9), proba: new Float64Array(0), classes: [] };

describe('scoreBySegment(data, predictions, column, options?)', () => {
  it('categorical: (all), each category, then (missing), with per-segment metrics', () => {
    const t = scoreBySegment(data, pred, 'region', { metrics: ['mae'] });
    expect(t.map((r) => [r.segment, r.rows])).toEqual([['(all)', 6], ['north', 2], ['south', 3], ['(missing)', 1]]);
    // errors 0, 0, 2, 0, 0, 3: all 5/6; north 0; south 2/3; missing 3
    expect(t.map((r) => r.mae)).toEqual([5 / 6, 0, 2 / 3, 3]);
    expect(t[0].column).toBe('region');
  });
  it('numeric: quantile groups', () => {
    const t = scoreBySegment(data, pred, 'age', { metrics: ['mae'], groups: 3 });
    expect(t.map((r) => r.segment)).toEqual(['(all)', '[20, 30]', '(30, 50]', '(50, 70]']);
    expectClose(t[3].mae as number, 1.5);
  });
  it('uses data weights; NaN where a metric cannot be computed (one class in a segment)', () => {
    const cls: Dataset = {
      features: data.features,
      target: { kind: 'class', name: 'churn', codes: Int32Array.of(0, 0, 0, 1, 1, 0), classes: ['stay', 'leave'] },
      weights: Float64Array.of(1, 1, 1, 1, 2, 1),
    };
    const p: Predictions = {
      task: 'classification', n: 6, value: Float64Array.of(0, 0, 1, 1, 1, 0),
      proba: Float64Array.of(0.9, 0.1, 0.8, 0.2, 0.4, 0.6, 0.3, 0.7, 0.2, 0.8, 0.6, 0.4), classes: ['stay', 'leave'],
    };
    const t = scoreBySegment(cls, p, 'region', { metrics: ['accuracy', 'rocAuc'] });
    expect(t[1].segment).toBe('north');
    expect(t[1].rocAuc).toBeNaN();
    expect(t[1].accuracy).toBe(1);
    // south rows 2, 3, 4 with weights 1, 1, 2: predictions 1, 1, 1 vs actual 0, 1, 1 → 3/4
    expect(t[2].weight).toBe(4);
    expectClose(t[2].accuracy as number, 0.75);
  });
  it('rejects an unknown column, mismatched predictions and empty data', () => {
    expect(() => scoreBySegment(data, pred, 'zip')).toThrow(/Unknown column "zip"/);
    expect(() => scoreBySegment(data, { ...pred, n: 5 }, 'age')).toThrow(/predictions has length 5/);
    const empty: Dataset = { ...data, features: { ...data.features, nRows: 0 } };
    expect(() => scoreBySegment(empty, { ...pred, n: 0 }, 'age')).toThrow(/No rows/);
  });
});
