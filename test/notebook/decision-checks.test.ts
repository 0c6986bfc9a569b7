import { beforeEach, describe, expect, it } from 'vitest';
import { evaluateCheck, normalizeCheck, parseCheck } from '../../src/notebook/decision-checks.js';
import { resetRunState } from '../../src/notebook/record-state.js';
import { noteMetric, noteTable } from '../../src/notebook/record-notes.js';
import { CoppiceError } from '../../src/errors.js';

// Expected values below are worked out by hand from the inline inputs (no outside source is needed: the
// checks are comparisons and rankings defined in this project).

describe('parseCheck(text)', () => {
  it('reads metric bounds', () => {
    expect(parseCheck('holdout auc >= 0.75')).toEqual({ metric: 'holdout auc', atLeast: 0.75 });
    expect(parseCheck('rmse<=12.5')).toEqual({ metric: 'rmse', atMost: 12.5 });
    expect(parseCheck('log loss < 1e-1')).toEqual({ metric: 'log loss', below: 0.1 });
    expect(parseCheck('"r2" > -0.5')).toEqual({ metric: 'r2', above: -0.5 });
  });
  it('reads feature ranks', () => {
    expect(parseCheck('distance_km in top 3 of importance')).toEqual({ feature: 'distance_km', withinTop: 3, table: 'importance' });
  });
  it('rejects text it cannot read', () => {
    expect(() => parseCheck('auc is good')).toThrow(CoppiceError);
    expect(() => parseCheck('x in top 0 of imp')).toThrow(/k >= 1/);
  });
});

describe('normalizeCheck(check)', () => {
  it('rejects a metric check with no bound, NaN bounds and bad shapes', () => {
    expect(() => normalizeCheck({ metric: 'auc' })).toThrow(/atLeast or atMost/);
    expect(() => normalizeCheck({ metric: 'auc', atLeast: NaN })).toThrow(/numbers/);
    expect(() => normalizeCheck({ feature: 'a', withinTop: 1.5, table: 't' })).toThrow(/withinTop/);
    expect(() => normalizeCheck(42)).toThrow(CoppiceError);
    expect(() => normalizeCheck({ something: 1 })).toThrow(CoppiceError);
  });
});

describe('evaluateCheck(check, state)', () => {
  beforeEach(() => { resetRunState(); });

  it('tests a noted metric against its bounds, inclusive', () => {
    const state = resetRunState();
    noteMetric('auc', 0.75);
    expect(evaluateCheck({ metric: 'auc', atLeast: 0.75 }, state).holds).toBe(true); // 0.75 >= 0.75
    expect(evaluateCheck({ metric: 'auc', atLeast: 0.7501 }, state).holds).toBe(false);
    expect(evaluateCheck(parseCheck('auc > 0.75'), state).holds).toBe(false); // strict
    expect(evaluateCheck({ metric: 'auc', atLeast: 0.5, atMost: 0.8 }, state).holds).toBe(true);
    const r = evaluateCheck({ metric: 'auc', atMost: 0.7 }, state);
    expect(r).toMatchObject({ holds: false, observed: 0.75, kind: 'metric', label: 'auc <= 0.7' });
  });

  it('fails a check whose metric was never reported, or is NaN', () => {
    const state = resetRunState();
    expect(evaluateCheck({ metric: 'auc', atLeast: 0.5 }, state)).toMatchObject({ holds: false, observed: null });
    noteMetric('auc', NaN);
    expect(evaluateCheck({ metric: 'auc', atLeast: 0.5 }, state).holds).toBe(false);
    expect(evaluateCheck({ metric: 'auc', atLeast: 0.5, value: 0.9 }, state).holds).toBe(true); // explicit value wins
  });

  it('ranks a feature in a noted table, larger first', () => {
    const state = resetRunState();
    noteTable('importance', [
      { feature: 'weight', value: 0.1 }, { feature: 'distance', value: 0.5 },
      { feature: 'depot', value: 0.3 }, { feature: 'hour', value: NaN },
    ]);
    // order: distance 0.5, depot 0.3, weight 0.1, hour NaN (last)
    expect(evaluateCheck(parseCheck('depot in top 2 of importance'), state)).toMatchObject({ holds: true, observed: 2 });
    expect(evaluateCheck(parseCheck('weight in top 2 of importance'), state)).toMatchObject({ holds: false, observed: 3 });
    expect(evaluateCheck(parseCheck('hour in top 3 of importance'), state)).toMatchObject({ holds: false, observed: 4 });
    expect(evaluateCheck(parseCheck('colour in top 3 of importance'), state).holds).toBe(false);
    expect(evaluateCheck(parseCheck('depot in top 2 of missing_table'), state).detail).toMatch(/not reported/);
  });

  it('ranks by an importance column and rows given directly', () => {
    const state = resetRunState();
    const rows = [{ name: 'a', importance: 1 }, { name: 'b', importance: 3 }];
    expect(evaluateCheck({ feature: 'a', withinTop: 1, table: rows, nameColumn: 'name' }, state).holds).toBe(false);
    expect(evaluateCheck({ feature: 'b', withinTop: 1, table: rows, nameColumn: 'name' }, state).holds).toBe(true);
  });

  it('passes custom checks through', () => {
    const state = resetRunState();
    expect(evaluateCheck({ label: 'no leakage', holds: true }, state)).toMatchObject({ kind: 'custom', holds: true });
  });
});
