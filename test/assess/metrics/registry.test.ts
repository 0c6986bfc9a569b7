import { describe, expect, it } from 'vitest';
import { defaultMetrics, findMetric, metricNames, scoreMetric } from '../../../src/assess/metrics/registry.js';
import type { Predictions } from '../../../src/learn/model.js';
import type { Target } from '../../../src/table/frame.js';
import { expectClose } from '../close.js';

const classTarget: Target = { kind: 'class', name: 'y', codes: Int32Array.of(0, 1, 1), classes: ['no', 'yes'] };
const classPred: Predictions = {
  task: 'classification', n: 3, value: Float64Array.of(0, 1, 0), proba: Float64Array.of(0.8, 0.2, 0.3, 0.7, 0.6, 0.4), classes: ['no', 'yes'],
};
const numTarget: Target = { kind: 'number', name: 'y', values: Float64Array.of(1, 2, 3) };
const numPred: Predictions = { task: 'regression', n: 3, value: Float64Array.of(1, 2, 5), proba: new Float64Array(0), classes: [] };

describe('scoreMetric(name, target, predictions, weights?)', () => {
  it('classification metrics read labels or probabilities', () => {
    expectClose(scoreMetric('accuracy', classTarget, classPred), 2 / 3);
    // −(ln 0.8 + ln 0.7 + ln 0.4) / 3
    expectClose(scoreMetric('logLoss', classTarget, classPred), -(Math.log(0.8) + Math.log(0.7) + Math.log(0.4)) / 3);
    // class-1 scores: negative 0.2; positives 0.7, 0.4 → both beat 0.2 → 1
    expect(scoreMetric('rocAuc', classTarget, classPred)).toBe(1);
  });
  it('regression metrics read values; pinballLoss:τ carries its quantile', () => {
    expectClose(scoreMetric('rmse', numTarget, numPred), Math.sqrt(4 / 3));
    expectClose(scoreMetric('pinballLoss:0.9', numTarget, numPred), (0.1 * 2) / 3);
    expectClose(scoreMetric('pinballLoss', numTarget, numPred), (0.5 * 2) / 3);
  });
  it('re-orders classes when the model lists them differently', () => {
    const swapped: Predictions = { ...classPred, classes: ['yes', 'no'], value: Float64Array.of(1, 0, 1), proba: Float64Array.of(0.2, 0.8, 0.7, 0.3, 0.4, 0.6) };
    expectClose(scoreMetric('logLoss', classTarget, swapped), scoreMetric('logLoss', classTarget, classPred));
    expectClose(scoreMetric('accuracy', classTarget, swapped), 2 / 3);
    expect(() => scoreMetric('accuracy', classTarget, { ...classPred, classes: ['no', 'maybe'] })).toThrow(/"maybe" is not a class/);
  });
  it('passes weights through', () => {
    expectClose(scoreMetric('accuracy', classTarget, classPred, Float64Array.of(1, 1, 2)), 0.5);
  });
  it('rejects unknown names and a metric of the other task', () => {
    expect(() => scoreMetric('f1', classTarget, classPred)).toThrow(/Unknown metric "f1"; known metrics: accuracy/);
    expect(() => scoreMetric('rmse', classTarget, classPred)).toThrow(/does not apply to classification/);
    expect(() => scoreMetric('accuracy', numTarget, numPred)).toThrow(/does not apply to regression/);
    expect(() => findMetric('pinballLoss:1.5')).toThrow(/tau/);
  });
});

describe('findMetric(name), metricNames(task?), defaultMetrics(task)', () => {
  it('knows which direction is better', () => {
    expect(findMetric('logLoss').higherIsBetter).toBe(false);
    expect(findMetric('rocAuc').higherIsBetter).toBe(true);
    expect(findMetric('rSquared').higherIsBetter).toBe(true);
    expect(findMetric('poissonDeviance').higherIsBetter).toBe(false);
  });
  it('lists names by task; defaults are registered', () => {
    expect(metricNames('regression')).toEqual(['rmse', 'mae', 'rSquared', 'poissonDeviance', 'pinballLoss']);
    for (const task of ['classification', 'regression'] as const) {
      for (const m of defaultMetrics(task)) expect(findMetric(m).task).toBe(task);
    }
  });
});
